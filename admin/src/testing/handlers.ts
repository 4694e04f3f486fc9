import { http, HttpResponse } from 'msw';
import { studioCard } from './fixtures';

/** What every test starts from: nobody signed in, the studio's card available. */
export const defaultHandlers = [
  http.post('/api/auth/refresh', () =>
    HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
  ),
  http.get('/api/studio', () => HttpResponse.json(studioCard)),
];
