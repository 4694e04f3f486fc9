import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { afterAll, afterEach, beforeAll } from 'vitest';

/**
 * The API as the account screens' tests see it: nobody signed in (the refresh cookie is refused),
 * and any request a test did not expect fails the test. Importing this starts it for that file.
 */
export const server = setupServer(
  http.post('/api/auth/refresh', () =>
    HttpResponse.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 }),
  ),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => server.resetHandlers());
afterAll(() => server.close());

/** Records the JSON bodies sent to `POST /api<path>` and answers with `answer()`. */
export function recordPosts(path: string, answer: () => Response): unknown[] {
  const sent: unknown[] = [];
  server.use(
    http.post(`/api${path}`, async ({ request }) => {
      sent.push(await request.json());
      return answer();
    }),
  );
  return sent;
}

/** The throttler's refusal (NestJS ThrottlerException), with the wait in `Retry-After`. */
export const tooManyRequests = (retryAfterSeconds: number) => () =>
  HttpResponse.json(
    { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
    { status: 429, headers: { 'Retry-After': String(retryAfterSeconds) } },
  );

/** A validation refusal as the API's ValidationPipe sends it: 400 with a list of messages. */
export const badRequest =
  (...messages: string[]) =>
  () =>
    HttpResponse.json(
      { statusCode: 400, message: messages, error: 'Bad Request' },
      { status: 400 },
    );

/** No answer at all: the connection failed. */
export const networkError = () => () => HttpResponse.error();
