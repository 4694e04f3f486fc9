import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../testing/server';
import { api, preloadPublicGet } from './api-client';

/** Counts the requests the API receives for `path`, answering each with its number. */
function countRequests(path: string) {
  const seen = { count: 0 };
  server.use(
    http.get(`/api${path}`, () => {
      seen.count += 1;
      return HttpResponse.json({ answer: seen.count });
    }),
  );
  return seen;
}

describe('public answers asked for ahead of the screen that reads them', () => {
  it('the screen receives the answer already asked for, once; later reads ask again', async () => {
    const requests = countRequests('/studio');

    const early = preloadPublicGet<{ answer: number }>('/studio');
    expect(preloadPublicGet('/studio')).toBe(early); // asking twice ahead is one request
    expect(await api.get('/studio', { auth: false })).toEqual({ answer: 1 });
    expect(requests.count).toBe(1);

    // Taken once: a later read (a refetch) is a new request, with a new answer.
    expect(await api.get('/studio', { auth: false })).toEqual({ answer: 2 });
    expect(requests.count).toBe(2);
  });

  it('a signed-in read of the same address never receives the public answer', async () => {
    const requests = countRequests('/menus?page=1&pageSize=3');
    await preloadPublicGet('/menus?page=1&pageSize=3'); // answered, not yet read

    expect(await api.get('/menus?page=1&pageSize=3')).toEqual({ answer: 2 });
    expect(requests.count).toBe(2);
    // The public answer is still there for the public read.
    expect(await api.get('/menus?page=1&pageSize=3', { auth: false })).toEqual({ answer: 1 });
  });

  it('a failed early request is reported by the read that receives it, not before', async () => {
    server.use(
      http.get('/api/studio', () =>
        HttpResponse.json({ statusCode: 503, message: 'Service unavailable' }, { status: 503 }),
      ),
    );
    void preloadPublicGet('/studio');
    await expect(api.get('/studio', { auth: false })).rejects.toMatchObject({ status: 503 });
  });
});
