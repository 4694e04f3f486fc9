import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import {
  emptyDraft,
  readBookingDraft,
  writeBookingDraft,
} from '../../features/booking/draft/booking-draft';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

describe('My events', () => {
  it('sends a signed-out visitor to Sign in, then back to My events', async () => {
    server.use(http.post('/api/auth/login', () => HttpResponse.json(sessionFor(clientUser))));
    const { user, router } = renderApp('/my-events');

    expect(await screen.findByRole('heading', { name: 'Sign in', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?redirectTo=%2Fmy-events');

    await user.type(screen.getByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'My events', level: 1 })).toBeInTheDocument();
  });

  it('restores the session from the cookie and shows the empty state', async () => {
    server.use(http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))));
    renderApp('/my-events');

    expect(await screen.findByRole('heading', { name: 'No events yet' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See how booking works' })).toHaveAttribute(
      'href',
      '/how-booking-works',
    );
    expect(screen.getByRole('link', { name: 'See the menus' })).toHaveAttribute('href', '/menus');
    expect(document.title).toBe('My events · Nappe');
  });

  it('signing out leaves the protected page for the home page and forgets any booking draft', async () => {
    server.use(
      http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(clientUser))),
      http.post('/api/auth/logout', ({ request }) => {
        expect(request.headers.get('Authorization')).toBe(`Bearer token-for-${clientUser.id}`);
        return new HttpResponse(null, { status: 204 });
      }),
    );
    // A booking in progress, with a guest's allergies, in this tab's session.
    writeBookingDraft({
      ...emptyDraft('menu-summer'),
      guests: {
        guestCount: 12,
        guestRequirements: [{ label: 'Léon', allergens: ['nuts'], diets: [] }],
        guestDataConsent: true,
      },
    });
    const { user, router } = renderApp('/my-events');
    const header = within(await screen.findByRole('banner'));

    await user.click(await header.findByRole('button', { name: 'Sign out' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
    expect(await header.findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(readBookingDraft()).toBeNull();
    expect(window.sessionStorage.length).toBe(0);
  });

  it('explains a throttled session check instead of pretending nobody is signed in', async () => {
    server.use(
      http.post('/api/auth/refresh', () =>
        HttpResponse.json(
          { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
          { status: 429, headers: { 'Retry-After': '30' } },
        ),
      ),
    );
    renderApp('/my-events');
    expect(await screen.findByRole('heading', { name: 'Too many requests' })).toBeInTheDocument();
    expect(screen.getByText(/try again in 30 seconds/)).toBeInTheDocument();
  });

  it('says the server cannot be reached when the API is down', async () => {
    server.use(http.post('/api/auth/refresh', () => HttpResponse.error()));
    renderApp('/my-events');
    expect(
      await screen.findByRole('heading', { name: 'Something went wrong' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/could not reach Nappe/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
