import { configure, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import { chefUser, makeAccounts, pageOf, sessionFor, staffUser } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

/** jsdom has no media queries, so the app renders at phone width: the menu is a drawer. */
async function openMenu(user: ReturnType<typeof renderApp>['user']) {
  await user.click(await screen.findByRole('button', { name: 'Open menu' }));
  const drawer = await screen.findByRole('dialog');
  return within(within(drawer).getByRole('navigation', { name: 'Sections' }));
}

function signedInAs(user: typeof chefUser) {
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    // The Team screen also lists pending invitations (team-invitations.test.tsx tests them).
    http.get('/api/studio/invitations', () => HttpResponse.json([])),
  );
}

// Whole-route tests on a busy 2-core machine: screens can take longer than the default wait.
beforeAll(() => configure({ asyncUtilTimeout: 15_000 }));

describe('Studio → Team', () => {
  it('lists accounts in a table and pages through them', async () => {
    signedInAs(chefUser);
    const accounts = makeAccounts(45);
    const requested: string[] = [];
    server.use(
      http.get('/api/users', ({ request }) => {
        const url = new URL(request.url);
        expect(request.headers.get('Authorization')).toBe(`Bearer token-for-${chefUser.id}`);
        requested.push(url.search);
        const page = Number(url.searchParams.get('page'));
        const pageSize = Number(url.searchParams.get('pageSize'));
        return HttpResponse.json(pageOf(accounts, page, pageSize));
      }),
    );
    const { user, router } = renderApp('/studio/team');

    const table = await screen.findByRole('table', { name: 'Accounts at the studio' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(21); // header + 20
    expect(within(rows[1]!).getByText('Account 1')).toBeInTheDocument();
    expect(within(rows[1]!).getByText('Chef')).toBeInTheDocument();
    expect(screen.getByText('Showing 1–20 of 45 accounts')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Next page' }));

    expect(await screen.findByText('Showing 21–40 of 45 accounts')).toBeInTheDocument();
    expect(screen.getByText('Account 21')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?page=2');
    expect(requested).toEqual(['?page=1&pageSize=20', '?page=2&pageSize=20']);
  }, 60_000);

  it('shows a loading skeleton, then an error with a retry that works', async () => {
    signedInAs(chefUser);
    let serverFixed = false;
    server.use(
      http.get('/api/users', async () => {
        await new Promise((resolve) => setTimeout(resolve, 50));
        return serverFixed
          ? HttpResponse.json(pageOf(makeAccounts(3), 1, 20))
          : HttpResponse.json(
              { statusCode: 500, message: 'Internal server error' },
              { status: 500 },
            );
      }),
    );
    const { user } = renderApp('/studio/team');

    expect(await screen.findByText('Loading accounts…')).toBeInTheDocument();
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The list of accounts could not be loaded')).toBeInTheDocument();

    serverFixed = true;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Showing 1–3 of 3 accounts')).toBeInTheDocument();
  });

  it('says so when there are no accounts', async () => {
    signedInAs(chefUser);
    server.use(
      http.get('/api/users', () =>
        HttpResponse.json({ items: [], total: 0, page: 1, pageSize: 20 }),
      ),
    );
    renderApp('/studio/team');
    expect(await screen.findByText('No accounts yet')).toBeInTheDocument();
  });

  it('is hidden from staff, and its address explains instead of crashing', async () => {
    signedInAs(staffUser);
    // No /api/users handler: an unexpected request would fail the test (onUnhandledRequest).
    const { user } = renderApp('/studio/team');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not available for your role' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to Today' })).toHaveAttribute('href', '/');
    const nav = await openMenu(user);
    expect(nav.getByRole('link', { name: 'Today' })).toBeInTheDocument();
    expect(nav.queryByRole('link', { name: 'Team' })).not.toBeInTheDocument();
    expect(nav.queryByText('Studio')).not.toBeInTheDocument();
  });

  it('shows the chef every section, Studio → Settings and Team and Insights included', async () => {
    signedInAs(chefUser);
    server.use(
      http.get('/api/users', () =>
        HttpResponse.json({ items: [], total: 0, page: 1, pageSize: 20 }),
      ),
    );
    // Opened on Team rather than Today, whose panels fetch data this test is not about.
    const { user } = renderApp('/studio/team');
    const nav = await openMenu(user);
    expect(nav.getByRole('link', { name: 'Team' })).toHaveAttribute('aria-current', 'page');
    expect(nav.getByText('Studio')).toBeInTheDocument();
    expect(nav.getByRole('link', { name: 'Team' })).toHaveAttribute('href', '/studio/team');
    expect(nav.getByText('Kitchen')).toBeInTheDocument();
    expect(nav.getAllByRole('link').map((a) => a.getAttribute('href'))).toEqual([
      '/',
      '/orders',
      '/calendar',
      '/kitchen/ingredients',
      '/kitchen/recipes',
      '/kitchen/desserts',
      '/kitchen/menus',
      '/prep/plan',
      '/prep/schedule',
      '/prep/labels',
      '/allergy-notes',
      '/studio/settings',
      '/studio/team',
      '/insights',
    ]);
  });

  it('shows staff the Kitchen section too (read-only screens)', async () => {
    signedInAs(staffUser);
    const { user } = renderApp('/studio/team');
    const nav = await openMenu(user);
    expect(nav.getByRole('link', { name: 'Recipes' })).toHaveAttribute('href', '/kitchen/recipes');
    // Today, four Kitchen screens, three Prep screens, Allergy notes: no Orders, Studio or Insights.
    expect(nav.getAllByRole('link').map((a) => a.getAttribute('href'))).toEqual([
      '/',
      '/kitchen/ingredients',
      '/kitchen/recipes',
      '/kitchen/desserts',
      '/kitchen/menus',
      '/prep/plan',
      '/prep/schedule',
      '/prep/labels',
      '/allergy-notes',
    ]);
  });
});

describe('shell', () => {
  it('an unknown address shows the 404 page inside the app', async () => {
    signedInAs(chefUser);
    renderApp('/no-such-screen');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'This page does not exist' }),
    ).toBeInTheDocument();
    expect(document.title).toBe('Page not found · Nappe kitchen');
  });

  it('signing out returns to Sign in', async () => {
    signedInAs(chefUser);
    server.use(http.post('/api/auth/logout', () => new HttpResponse(null, { status: 204 })));
    server.use(
      http.get('/api/users', () =>
        HttpResponse.json({ items: [], total: 0, page: 1, pageSize: 20 }),
      ),
    );
    const { user, router } = renderApp('/studio/team');
    await openMenu(user);
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Sign out' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });
});
