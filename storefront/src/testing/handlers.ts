import { http, HttpResponse } from 'msw';
import { menuHandlers, pageOf } from './booking-fixtures';
import { studioCard } from './fixtures';

/**
 * What every test starts from: nobody signed in, the studio's card and its menus available, and
 * no events booked by whoever signs in.
 */
export const defaultHandlers = [
  http.post('/api/auth/refresh', () =>
    HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
  ),
  http.get('/api/studio', () => HttpResponse.json(studioCard)),
  ...menuHandlers,
  http.get('/api/orders', ({ request }) =>
    request.headers.get('Authorization')
      ? HttpResponse.json(pageOf([]))
      : HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
  ),
];
