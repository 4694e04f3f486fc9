import type { OrderDetail } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { browser } from '../../lib/browser';
import { makeOrder } from '../../testing/booking-fixtures';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

const TOKEN = `token-for-${clientUser.id}`;

/** Signed in through the refresh cookie until the account is deleted. */
let signedIn = true;
beforeEach(() => {
  signedIn = true;
  server.use(
    http.post('/api/auth/refresh', () =>
      signedIn
        ? HttpResponse.json(sessionFor(clientUser))
        : HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
    ),
  );
});
afterEach(() => vi.restoreAllMocks());

async function openDeleteDialog(user: ReturnType<typeof renderApp>['user']) {
  const section = await screen.findByRole('region', { name: 'Your data' });
  await user.click(within(section).getByRole('button', { name: 'Delete my account' }));
  return screen.findByRole('alertdialog', { name: 'Delete your account?' });
}

describe('My events: your data', () => {
  it('downloads everything held about the client, fetched with the session token, as a JSON file', async () => {
    const exported = {
      format: 'nappe-personal-data-export',
      account: { email: clientUser.email, name: clientUser.name },
      orders: [{ reference: 'N-2026-0042', guests: [{ label: 'Léon', allergens: ['nuts'] }] }],
    };
    const auth: Array<string | null> = [];
    server.use(
      http.get('/api/me/export', ({ request }) => {
        auth.push(request.headers.get('Authorization'));
        return HttpResponse.json(exported, {
          headers: {
            'Content-Disposition': 'attachment; filename="nappe-my-data-2026-06-01.json"',
          },
        });
      }),
    );
    const saved: Array<{ name: string; text: string }> = [];
    vi.spyOn(browser, 'save').mockImplementation((file, fallback) => {
      void file.blob.text().then((text) => saved.push({ name: file.fileName ?? fallback, text }));
    });
    const { user } = renderApp('/my-events');
    const section = await screen.findByRole('region', { name: 'Your data' });
    await user.click(within(section).getByRole('button', { name: 'Download my data' }));

    await waitFor(() => expect(saved).toHaveLength(1));
    expect(auth).toEqual([`Bearer ${TOKEN}`]);
    expect(saved[0]!.name).toBe('nappe-my-data-2026-06-01.json');
    expect(JSON.parse(saved[0]!.text)).toEqual(exported);
  });

  it('says so when the download fails', async () => {
    server.use(
      http.get('/api/me/export', () =>
        HttpResponse.json({ statusCode: 503, message: 'Try again in a moment.' }, { status: 503 }),
      ),
    );
    const { user } = renderApp('/my-events');
    const section = await screen.findByRole('region', { name: 'Your data' });
    await user.click(within(section).getByRole('button', { name: 'Download my data' }));
    const alert = await within(section).findByRole('alert');
    expect(alert).toHaveTextContent('Your data could not be downloaded');
    expect(alert).toHaveTextContent('Try again in a moment.');
  });

  it('the deletion dialog says what is erased and what is kept, and why, before anything happens', async () => {
    const calls: unknown[] = [];
    server.use(
      http.delete('/api/me', async ({ request }) => {
        calls.push(await request.json());
        return HttpResponse.json({ statusCode: 500 }, { status: 500 });
      }),
    );
    const { user } = renderApp('/my-events');
    const dialog = await openDeleteDialog(user);
    expect(within(dialog).getByRole('heading', { name: 'What is erased' })).toBeInTheDocument();
    expect(dialog).toHaveTextContent('Your guests’ names, tables, allergies, diets and notes.');
    expect(
      within(dialog).getByRole('heading', { name: 'What the studio keeps, and why' }),
    ).toBeInTheDocument();
    expect(dialog).toHaveTextContent(
      /payments and refunds .* anonymous reference instead of your name\. The studio must keep its bookkeeping records/,
    );
    expect(dialog).toHaveTextContent('cancel the booking first');

    // Without the password nothing is sent.
    await user.click(within(dialog).getByRole('button', { name: 'Delete my account' }));
    expect(
      within(dialog).getByText('Enter your current password to delete your account.'),
    ).toBeInTheDocument();
    expect(calls).toEqual([]);

    // Keeping the account closes the dialog and sends nothing.
    await user.click(within(dialog).getByRole('button', { name: 'Keep my account' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(calls).toEqual([]);
  });

  it('shows the server’s explanation when an upcoming booking blocks it, or the password is wrong', async () => {
    const blocked =
      'Your account cannot be deleted while you have an upcoming booking: N-2026-0042 on Saturday 18 July 2026. Cancel it first in My events (any refund follows the cancellation policy), then delete your account.';
    server.use(
      http.delete('/api/me', async ({ request }) => {
        const body = (await request.json()) as { password: string };
        return body.password === 'a long passphrase'
          ? HttpResponse.json(
              { statusCode: 409, error: 'Conflict', message: blocked, upcoming: [] },
              { status: 409 },
            )
          : HttpResponse.json(
              {
                statusCode: 403,
                message: 'That is not your current password. Your account was not deleted.',
              },
              { status: 403 },
            );
      }),
    );
    const { user, router } = renderApp('/my-events');
    const dialog = await openDeleteDialog(user);
    const password = within(dialog).getByLabelText(/Your current password/);

    await user.type(password, 'a wrong guess');
    await user.click(within(dialog).getByRole('button', { name: 'Delete my account' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'That is not your current password. Your account was not deleted.',
    );
    // Still signed in, still here: a refused confirmation is not a lost session.
    expect(router.state.location.pathname).toBe('/my-events');
    expect(screen.getByRole('button', { name: 'Sign out', hidden: true })).toBeInTheDocument();

    await user.clear(password);
    await user.type(password, 'a long passphrase');
    await user.click(within(dialog).getByRole('button', { name: 'Delete my account' }));
    await waitFor(() =>
      expect(within(dialog).getByRole('alert')).toHaveTextContent(
        `Your account was not deleted${blocked}`,
      ),
    );
  });

  it('deletes with the password, then signs the client out and says what happened', async () => {
    const received: Array<{ auth: string | null; body: unknown }> = [];
    server.use(
      http.delete('/api/me', async ({ request }) => {
        received.push({ auth: request.headers.get('Authorization'), body: await request.json() });
        signedIn = false;
        return HttpResponse.json({
          deleted: true,
          erased: ['Your name, e-mail address and password'],
          kept: ['Your payments and refunds'],
          ordersAnonymised: 1,
          guestEntriesRemoved: 3,
          paymentRecordsKept: 2,
        });
      }),
    );
    window.sessionStorage.setItem('nappe.booking-draft', '{"guests":[{"label":"Léon"}]}');
    const { user, router } = renderApp('/my-events');
    const dialog = await openDeleteDialog(user);
    await user.type(within(dialog).getByLabelText(/Your current password/), 'a long passphrase');
    await user.click(within(dialog).getByRole('button', { name: 'Delete my account' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
    expect(received).toEqual([
      { auth: `Bearer ${TOKEN}`, body: { password: 'a long passphrase' } },
    ]);
    const done = (await screen.findByText('Your account is deleted')).closest('[role="status"]');
    expect(done).not.toBeNull();
    expect(done).toHaveTextContent('keeps your payment records without your name');
    const header = within(screen.getByRole('banner'));
    expect(await header.findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.sessionStorage.length).toBe(0);
  });
});

describe('an event whose guest details were erased', () => {
  it('says why instead of listing the guests', async () => {
    const order = Object.assign(makeOrder({ guests: [] }), {
      guestDetailsRemoved: {
        removed: true,
        reason: 'retention',
        retentionDays: 30,
        removedFrom: '2026-08-18',
        message:
          'Guest details removed after 30 days: the studio keeps guests’ allergies and diets until 30 days after the event, so they were removed on Tuesday 18 August 2026.',
      },
    }) as OrderDetail;
    server.use(http.get('/api/orders/:id', () => HttpResponse.json(order)));
    renderApp(`/my-events/${order.id}?tab=guests`);
    const panel = await screen.findByRole('tabpanel', { name: 'Guests and diets' });
    expect(panel).toHaveTextContent(/Guest details removed after 30 days/);
    expect(panel).not.toHaveTextContent('no allergies or diets listed');
  });
});
