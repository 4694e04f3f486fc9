import { createApiClient, type RequestOptions } from '@nappe/web-kit';
import { env } from '../config/env';

export {
  ApiError,
  NETWORK_ERROR_MESSAGE,
  parseRetryAfter,
  fileNameFrom,
  type ApiClient,
  type DownloadedFile,
  type RequestOptions,
  type UploadOptions,
} from '@nappe/web-kit';

const client = createApiClient({ basePath: env.apiBasePath });

/** A public answer asked for ahead of the screen that reads it, kept until that screen asks. */
interface Preloaded {
  answer: Promise<unknown>;
  at: number;
}

/** Long enough for the page to start; short enough that nobody is shown an old answer. */
const PRELOAD_KEPT_MS = 15_000;
const preloaded = new Map<string, Preloaded>();

/**
 * Asks for a public GET now, for a screen that will read it a moment later: on the first page
 * load, before React has taken over the markup rendered at build time, the screens must still
 * show their loading state (as that markup does), so the answer cannot go into the query cache
 * yet. The screen's own query then receives it (once) instead of asking again. No-op outside a
 * browser (the build-time render has no API to ask).
 */
export function preloadPublicGet<T>(path: string): Promise<T> | undefined {
  if (typeof window === 'undefined') return undefined;
  const kept = preloaded.get(path);
  if (kept) return kept.answer as Promise<T>;
  const answer = client.get<T>(path, { auth: false });
  // Read by the screen's query, which reports any failure; never an unhandled rejection here.
  answer.catch(() => undefined);
  preloaded.set(path, { answer, at: Date.now() });
  return answer;
}

function takePreloaded(path: string, opts: Omit<RequestOptions, 'method' | 'body'>) {
  const hit = preloaded.get(path);
  if (!hit || opts.auth !== false || opts.signal) return undefined;
  preloaded.delete(path);
  return Date.now() - hit.at <= PRELOAD_KEPT_MS ? hit.answer : undefined;
}

/** The app's one client: the token in memory, the refresh cookie for /api/auth. */
export const api: typeof client = {
  ...client,
  get: <T>(path: string, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
    (takePreloaded(path, opts) as Promise<T> | undefined) ?? client.get<T>(path, opts),
};
