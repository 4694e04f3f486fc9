import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

describe('Sign in', () => {
  it('shows the shared validation messages under each field and sends nothing', async () => {
    let calls = 0;
    server.use(
      http.post('/api/auth/login', () => {
        calls += 1;
        return HttpResponse.json({});
      }),
    );
    const { user } = renderApp('/sign-in');

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(calls).toBe(0);

    await user.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(
      await screen.findByText('Enter an e-mail address like name@example.com.'),
    ).toBeInTheDocument();
    expect(calls).toBe(0);
  });

  it('signs in and lands on My events, then the header shows the name', async () => {
    server.use(
      http.post('/api/auth/login', async ({ request }) => {
        const body = (await request.json()) as { email: string; password: string };
        expect(body).toEqual({ email: clientUser.email, password: 'a long passphrase' });
        return HttpResponse.json(sessionFor(clientUser));
      }),
    );
    const { user, router } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'My events', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/my-events');
    const header = screen.getByRole('banner');
    expect(await within(header).findByRole('button', { name: 'Sign out' })).toBeInTheDocument();
    expect(within(header).getByText(clientUser.name)).toBeInTheDocument();
  });

  it('goes back to the page the person was heading for', async () => {
    server.use(http.post('/api/auth/login', () => HttpResponse.json(sessionFor(clientUser))));
    const { user, router } = renderApp('/sign-in?redirectTo=%2Fhow-booking-works');

    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/how-booking-works'));
  });

  it('never follows a redirect off the site', async () => {
    server.use(http.post('/api/auth/login', () => HttpResponse.json(sessionFor(clientUser))));
    const { user, router } = renderApp('/sign-in?redirectTo=%2F%2Felsewhere.example');

    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/my-events'));
  });

  it('shows the server message on a 401 and stays on the page', async () => {
    server.use(
      http.post('/api/auth/login', () =>
        HttpResponse.json(
          { statusCode: 401, message: 'Wrong e-mail or password.', error: 'Unauthorized' },
          { status: 401 },
        ),
      ),
    );
    const { user, router } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'not the right one');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Wrong e-mail or password.')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    // A wrong password is an answer, not an expired session: no refresh is attempted.
  });

  it('tells how long to wait on a 429 and holds the button until then', async () => {
    server.use(
      http.post('/api/auth/login', () =>
        HttpResponse.json(
          { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
          { status: 429, headers: { 'Retry-After': '90' } },
        ),
      ),
    );
    const { user } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), clientUser.email);
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Too many attempts')).toBeInTheDocument();
    expect(within(alert).getByText(/try again in 1 minute 30 seconds/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeDisabled();
  });

  it('toggles the password between hidden and shown', async () => {
    const { user } = renderApp('/sign-in');
    const password = await screen.findByLabelText('Password');
    const toggle = screen.getByRole('button', { name: 'Show password' });

    expect(password).toHaveAttribute('type', 'password');
    expect(toggle).toHaveAttribute('aria-pressed', 'false');
    await user.click(toggle);
    expect(password).toHaveAttribute('type', 'text');
    expect(toggle).toHaveAttribute('aria-pressed', 'true');
  });

  it('links to Create account, keeping the destination', async () => {
    renderApp('/sign-in?redirectTo=%2Fmy-events');
    const link = await screen.findByRole('link', { name: 'Create an account' });
    expect(link).toHaveAttribute('href', '/create-account?redirectTo=%2Fmy-events');
    expect(document.title).toBe('Sign in · Nappe');
  });
});
