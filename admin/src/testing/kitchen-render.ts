import type { AuthUser } from '@nappe/shared';
import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { chefUser, sessionFor } from './fixtures';
import { createKitchenApi } from './kitchen-api';
import { renderApp } from './render-app';
import { server } from './server';

/** Signs `user` in, serves the fixture kitchen, and renders the app at `url`. */
export function renderKitchen(url: string, user: AuthUser = chefUser) {
  const api = createKitchenApi({ chef: user.role === 'chef' });
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    ...api.handlers,
  );
  return { ...renderApp(url), api };
}

/** The editor's section with this heading. */
export async function section(name: string | RegExp) {
  const heading = await screen.findByRole('heading', { level: 2, name });
  return within(heading.closest('section')!);
}
