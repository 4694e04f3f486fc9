import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { MENUS, orchardMenu, pageOf, summerMenu } from '../../testing/booking-fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

describe('Menus', () => {
  it('lists each menu photo first, with price, party size, notice and allergens as words', async () => {
    renderApp('/menus');
    const card = (await screen.findByRole('article', { name: summerMenu.name })) as HTMLElement;
    const inCard = within(card);

    // The photo comes first in the card, sized before it loads so nothing shifts.
    const photo = card.querySelector('img')!;
    expect(card.firstElementChild?.contains(photo)).toBe(true);
    expect(photo).toHaveAttribute('width', '1200');
    expect(photo).toHaveAttribute('height', '900');
    expect(photo).toHaveAttribute('loading', 'eager');

    expect(inCard.getByText('€58.00')).toBeInTheDocument();
    expect(inCard.getByText('10 to 120 guests')).toBeInTheDocument();
    // 14 lead days are written in weeks.
    expect(inCard.getByText('Book at least 2 weeks ahead')).toBeInTheDocument();
    expect(inCard.getByText('2 plated desserts for each guest')).toBeInTheDocument();
    // Allergens are words: "contains" and "may contain" each under their own label.
    expect(inCard.getByText('Contains:')).toBeInTheDocument();
    for (const word of ['Eggs,', 'Milk,', 'Nuts'])
      expect(inCard.getByText(word)).toBeInTheDocument();
    expect(inCard.getByText('May contain:').parentElement).toHaveTextContent(
      'May contain: Peanuts',
    );
    expect(
      inCard.getByRole('list', { name: `Dietary facts of ${summerMenu.name}` }),
    ).toHaveTextContent('Contains alcohol');
    expect(
      inCard.getByRole('link', { name: `Book this menu: ${summerMenu.name}` }),
    ).toHaveAttribute('href', '/book/menu-summer/event');

    // Later photos wait until they come near the screen; a menu without one shows our drawing.
    const orchard = await screen.findByRole('article', { name: orchardMenu.name });
    expect(orchard.querySelector('img')).toBeNull();
    expect(within(orchard).getByText('none of the 14 major allergens')).toBeInTheDocument();
    expect(within(orchard).getByText('Vegan')).toBeInTheDocument();
    expect(document.title).toBe('Menus · Nappe');
  });

  it('lazy-loads every photo but the first', async () => {
    const later = { ...summerMenu, id: 'menu-late', name: 'Late Harvest' };
    server.use(http.get('/api/menus', () => HttpResponse.json(pageOf([summerMenu, later]))));
    renderApp('/menus');
    const card = await screen.findByRole('article', { name: 'Late Harvest' });
    expect(card.querySelector('img')).toHaveAttribute('loading', 'lazy');
  });

  it('says so when there is no menu to book', async () => {
    server.use(http.get('/api/menus', () => HttpResponse.json(pageOf([]))));
    renderApp('/menus');
    expect(
      await screen.findByRole('heading', { name: 'No menus to book just now' }),
    ).toBeInTheDocument();
  });

  it('shows a failed load with a button that loads again', async () => {
    let calls = 0;
    server.use(
      http.get('/api/menus', () => {
        calls += 1;
        return calls <= 2
          ? HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            )
          : HttpResponse.json(pageOf(MENUS));
      }),
    );
    const { user } = renderApp('/menus');
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The menus could not be loaded');
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('article', { name: summerMenu.name })).toBeInTheDocument();
  });
});

describe('A menu', () => {
  it('shows each dessert, its components, and what it contains apart from what it may contain', async () => {
    renderApp('/menus/menu-summer');
    expect(
      await screen.findByRole('heading', { level: 1, name: summerMenu.name }),
    ).toBeInTheDocument();
    expect(document.title).toBe(`${summerMenu.name} · Nappe`);

    const hero = screen.getByRole('img', { name: `${summerMenu.name}, as plated` });
    expect(hero).toHaveAttribute('loading', 'eager');
    expect(hero).toHaveAttribute('fetchpriority', 'high');

    const apricot = screen.getByRole('article', { name: 'Roasted apricot, pistachio mousse' });
    const inApricot = within(apricot);
    expect(
      inApricot.getByRole('img', { name: 'Roasted apricot, pistachio mousse, as plated' }),
    ).toHaveAttribute('loading', 'lazy');
    expect(inApricot.getByText('Pistachio mousse').parentElement).toHaveTextContent('45 g');
    expect(inApricot.getByText('Roasted apricots').parentElement).toHaveTextContent(
      '2 pieces, 60 g',
    );

    const contains = inApricot.getByRole('region', { name: 'Contains' });
    expect(contains).toHaveTextContent('Milk');
    expect(contains).toHaveTextContent('Nuts (pistachios, almonds)');
    expect(contains).not.toHaveTextContent('Peanuts');
    const mayContain = inApricot.getByRole('region', { name: 'May contain' });
    expect(mayContain).toHaveTextContent('Peanuts');
    expect(mayContain).not.toHaveTextContent('Milk');
    expect(inApricot.getByText('Contains gelatin (beef)')).toBeInTheDocument();

    const cream = screen.getByRole('article', { name: 'Elderflower cream, cherry and kirsch' });
    expect(within(cream).getByText('Vegetarian')).toBeInTheDocument();
    expect(within(cream).getByText('Contains alcohol')).toBeInTheDocument();
    expect(within(cream).getByRole('region', { name: 'May contain' })).toHaveTextContent(
      'No traces declared.',
    );

    // The whole menu's declaration, and the US list for visitors used to it.
    const menuAllergens = screen.getByRole('region', { name: 'Allergens in this menu' });
    expect(menuAllergens).toHaveTextContent(
      'Under US labelling (the 9 major food allergens): contains milk, egg, tree nuts.',
    );
    expect(screen.getAllByRole('link', { name: 'Book this menu' })[0]).toHaveAttribute(
      'href',
      '/book/menu-summer/event',
    );
  });

  it('an unknown or withdrawn menu gets its own not-found page', async () => {
    renderApp('/menus/menu-gone');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This menu is not on offer' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See the menus' })).toHaveAttribute('href', '/menus');
  });
});
