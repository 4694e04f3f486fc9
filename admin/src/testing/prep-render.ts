import type { AuthUser } from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import { chefUser, sessionFor } from './fixtures';
import { createPrepApi, type PrepApiOptions } from './prep-api';
import { renderApp } from './render-app';
import { server } from './server';

/** Signs `user` in, serves the prep stand-in over `events`, and renders the app at `url`. */
export function renderPrep(
  url: string,
  options: Omit<PrepApiOptions, 'user'> & { user?: AuthUser },
) {
  const user = options.user ?? chefUser;
  const api = createPrepApi({ ...options, user });
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    ...api.handlers,
  );
  return { ...renderApp(url), api };
}
