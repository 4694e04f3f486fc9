import type { AuthUser } from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import { createAllergyNotesApi, type AllergyApiOptions } from './allergy-notes-api';
import { chefUser, sessionFor } from './fixtures';
import { renderApp } from './render-app';
import { server } from './server';

/** Signs `user` in, serves the fixture allergy notes, and renders the app at `url`. */
export function renderAllergyNotes(
  url: string,
  user: AuthUser = chefUser,
  options: Omit<AllergyApiOptions, 'role'> & { orders: AllergyApiOptions['orders'] },
) {
  const api = createAllergyNotesApi({ ...options, role: user.role === 'chef' ? 'chef' : 'staff' });
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    ...api.handlers,
  );
  return { ...renderApp(url), api };
}
