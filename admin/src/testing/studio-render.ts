import type { AuthUser } from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import { chefUser, sessionFor } from './fixtures';
import { renderApp } from './render-app';
import { server } from './server';
import { createStudioApi, type StudioApiOptions } from './studio-api';

/** Signs `user` in (the chef by default), serves the studio stand-in, and renders the app at `url`. */
export function renderStudio(
  url: string,
  user: AuthUser = chefUser,
  options: StudioApiOptions = {},
) {
  const api = createStudioApi({ actor: user, ...options });
  server.use(
    http.post('/api/auth/refresh', () => HttpResponse.json(sessionFor(user))),
    ...api.handlers,
  );
  return { ...renderApp(url), api };
}
