import { describe, expect, it } from 'vitest';
import { ApiError } from '../api-client.js';
import { createQueryClient } from './query-client.js';

/** Fetches once through the apps' query client, failing with `error` each time; counts tries. */
async function triesFor(error: unknown): Promise<number> {
  // No wait between tries, so the test does not sit out TanStack's back-off.
  const client = createQueryClient({ queries: { retryDelay: 0 } });
  let tries = 0;
  await expect(
    client.fetchQuery({
      queryKey: ['failing'],
      queryFn: () => {
        tries += 1;
        throw error;
      },
    }),
  ).rejects.toBe(error);
  return tries;
}

describe('createQueryClient: retries', () => {
  // RFC 9110 §15.5: a 4xx is the client's error, and repeating the request unchanged will not
  // help; so one try only.
  it.each([400, 401, 403, 404, 409, 422, 429])('a %i is not retried', async (status) => {
    expect(await triesFor(new ApiError(status, ['Refused.']))).toBe(1);
  });

  // RFC 9110 §15.6: a 5xx is the server's, and may pass (503 says so outright); two more tries.
  it.each([500, 502, 503])('a %i is tried three times in all', async (status) => {
    expect(await triesFor(new ApiError(status, ['Server error.']))).toBe(3);
  });

  it('no answer at all (status 0, the connection failed) is tried three times in all', async () => {
    expect(await triesFor(new ApiError(0, ['We could not reach Nappe.']))).toBe(3);
  });

  it('an error that is not an API answer is tried three times in all', async () => {
    expect(await triesFor(new TypeError('Failed to fetch'))).toBe(3);
  });

  it('a mutation is never retried: repeating one could do it twice', async () => {
    const client = createQueryClient();
    let tries = 0;
    const mutation = client.getMutationCache().build(client, {
      mutationFn: () => {
        tries += 1;
        return Promise.reject(new ApiError(503, ['Unavailable.']));
      },
    });
    await expect(mutation.execute(undefined)).rejects.toBeInstanceOf(ApiError);
    expect(tries).toBe(1);
  });
});

describe('createQueryClient: defaults and overrides', () => {
  it('keeps an answer fresh for a minute by default', () => {
    expect(createQueryClient().getDefaultOptions().queries?.staleTime).toBe(60_000);
  });

  it('takes an app’s or a test’s own settings over the defaults, keeping the rest', () => {
    const options = createQueryClient({
      queries: { retry: false, gcTime: Infinity },
      mutations: { retry: 1 },
    }).getDefaultOptions();
    expect(options.queries?.retry).toBe(false);
    expect(options.queries?.gcTime).toBe(Infinity);
    expect(options.queries?.staleTime).toBe(60_000);
    expect(options.mutations?.retry).toBe(1);
  });
});
