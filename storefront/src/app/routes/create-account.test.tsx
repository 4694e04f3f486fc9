import { screen, waitFor } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { EMAIL_TAKEN_MESSAGE } from '../../features/auth/components/create-account-form';
import { clientUser, sessionFor } from '../../testing/fixtures';
import { renderApp } from '../../testing/render-app';
import { server } from '../../testing/server';

async function fillIn(user: ReturnType<typeof renderApp>['user'], password = 'three quiet spoons') {
  await user.type(await screen.findByLabelText('Your name'), clientUser.name);
  await user.type(screen.getByLabelText('E-mail'), clientUser.email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('Create account', () => {
  it('checks the form with the shared rules before sending', async () => {
    const { user } = renderApp('/create-account');
    await fillIn(user, 'short');
    expect(await screen.findByText(/Use at least 12 characters/)).toBeInTheDocument();
    expect(screen.getByLabelText('Password')).toHaveAttribute('aria-invalid', 'true');
  });

  it('says under the e-mail field when the address already has an account (409)', async () => {
    server.use(
      http.post('/api/auth/register', () =>
        HttpResponse.json(
          { statusCode: 409, message: 'This e-mail is already registered.', error: 'Conflict' },
          { status: 409 },
        ),
      ),
    );
    const { user, router } = renderApp('/create-account');
    await fillIn(user);

    expect(await screen.findByText(EMAIL_TAKEN_MESSAGE)).toBeInTheDocument();
    const email = screen.getByLabelText('E-mail');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    await waitFor(() => expect(email).toHaveFocus());
    expect(router.state.location.pathname).toBe('/create-account');
  });

  it('creates the account, signs in and lands on My events', async () => {
    server.use(
      http.post('/api/auth/register', async ({ request }) => {
        expect(await request.json()).toEqual({
          name: clientUser.name,
          email: clientUser.email,
          password: 'three quiet spoons',
        });
        return HttpResponse.json(sessionFor(clientUser), { status: 201 });
      }),
    );
    const { user, router } = renderApp('/create-account');
    await fillIn(user);

    expect(await screen.findByRole('heading', { name: 'My events', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/my-events');
  });

  it('shows validation messages sent by the server (400)', async () => {
    server.use(
      http.post('/api/auth/register', () =>
        HttpResponse.json(
          { statusCode: 400, message: ['email must be an email'], error: 'Bad Request' },
          { status: 400 },
        ),
      ),
    );
    const { user } = renderApp('/create-account');
    await fillIn(user);
    expect(await screen.findByRole('alert')).toHaveTextContent('email must be an email');
  });
});
