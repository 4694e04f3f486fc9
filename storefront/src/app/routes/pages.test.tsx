import { screen, within } from '@testing-library/react';
import { delay, http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { studioCard } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

describe('public pages', () => {
  it('Home shows the studio card, the offer and the three steps', async () => {
    renderApp('/');
    expect(
      await screen.findByRole('heading', { level: 1, name: /Plated desserts for the evenings/ }),
    ).toBeInTheDocument();
    expect(await screen.findByText(`${studioCard.name} · ${studioCard.city}`)).toBeInTheDocument();
    for (const occasion of ['Dinner parties', 'Weddings', 'Company dinners', 'Private tastings']) {
      expect(screen.getByRole('heading', { name: occasion })).toBeInTheDocument();
    }
    const steps = within(screen.getByRole('region', { name: /Three steps/ })).getAllByRole(
      'listitem',
    );
    expect(steps).toHaveLength(3);
    // This season's menus, photo first, each with a way to book it.
    const menus = screen.getByRole('region', { name: 'Menus to book' });
    expect(
      await within(menus).findByRole('article', { name: 'Midsummer Garden' }),
    ).toBeInTheDocument();
    expect(
      within(menus).getByRole('link', { name: 'Book this menu: Orchard Table' }),
    ).toHaveAttribute('href', '/book/menu-orchard/event');
  });

  it('Home keeps the tagline’s place while the studio card loads, so nothing below it moves', async () => {
    // Core Web Vitals, CLS (web.dev): content that replaces a placeholder of another size moves
    // what follows it. The generic line is longer than a tagline; it is only for a failed load.
    server.use(http.get('/api/studio', () => delay('infinite')));
    renderApp('/');
    const hero = within(
      await screen.findByRole('region', { name: /Plated desserts for the evenings/ }),
    );
    const sentence = hero.getByText(/Every guest’s allergies reach the kitchen/);
    // A placeholder (hidden from screen readers) holds the tagline's line.
    expect(sentence.querySelector('[aria-hidden="true"]')).not.toBeNull();
    expect(hero.queryByText(/A pastry studio that brings/)).toBeNull();
    expect(hero.getByText('A dessert studio')).toBeInTheDocument();
  });

  it('Home still reads well when the studio card cannot be loaded', async () => {
    server.use(
      http.get('/api/studio', () =>
        HttpResponse.json({ statusCode: 500, message: 'Internal server error' }, { status: 500 }),
      ),
    );
    renderApp('/');
    // While the card is on its way the tagline is a placeholder; once the API has failed, the
    // generic line takes its place.
    expect(
      await screen.findByText(/A pastry studio that brings a finished, plated dessert/),
    ).toBeInTheDocument();
    expect(screen.getByText('A dessert studio')).toBeInTheDocument();
  });

  it('the header offers Sign in and Create account to a visitor, with a skip link', async () => {
    renderApp('/how-booking-works');
    const header = within(await screen.findByRole('banner'));
    expect(await header.findByRole('link', { name: 'Sign in' })).toHaveAttribute(
      'href',
      '/sign-in?redirectTo=%2Fhow-booking-works',
    );
    expect(header.getByRole('link', { name: 'Create account' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveAttribute(
      'href',
      '#main-content',
    );
    const nav = within(screen.getByRole('navigation', { name: 'Main' }));
    expect(nav.getByRole('link', { name: 'How booking works' })).toHaveAttribute(
      'aria-current',
      'page',
    );
  });

  it('How booking works explains the four steps and leads to the menus and dates', async () => {
    renderApp('/how-booking-works');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'How booking works' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See the menus' })).toHaveAttribute('href', '/menus');
    expect(screen.getByRole('link', { name: 'See open dates' })).toHaveAttribute('href', '/dates');
    for (const step of [
      'Choose a menu',
      'Tell us the date and your guests',
      'Pay a deposit',
      'The chef confirms',
    ]) {
      expect(screen.getByRole('heading', { name: new RegExp(step) })).toBeInTheDocument();
    }
    expect(screen.getByRole('heading', { name: 'If your plans change' })).toBeInTheDocument();
  });

  it('an unknown address shows the 404 page inside the layout', async () => {
    renderApp('/this-page-does-not-exist');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This page is not on the menu' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the home page' })).toHaveAttribute(
      'href',
      '/',
    );
    expect(screen.getByRole('banner')).toBeInTheDocument();
    expect(document.title).toBe('Page not found · Nappe');
  });
});
