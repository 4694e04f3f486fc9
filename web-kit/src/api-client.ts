import type { ApiErrorBody, AuthSession } from '@nappe/shared';

/** An API answer other than 2xx, or no answer at all (`status` 0). */
export class ApiError extends Error {
  readonly status: number;
  /** Human-readable messages from the server (Nest sends one string or a list). */
  readonly messages: string[];
  /** Seconds to wait, from `Retry-After` on a 429; null otherwise. */
  readonly retryAfterSeconds: number | null;

  constructor(status: number, messages: string[], retryAfterSeconds: number | null = null) {
    super(messages[0] ?? `The request failed (${status}).`);
    this.name = 'ApiError';
    this.status = status;
    this.messages = messages;
    this.retryAfterSeconds = retryAfterSeconds;
  }
}

export const NETWORK_ERROR_MESSAGE =
  'We could not reach Nappe. Check your connection and try again.';

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  /** false for the sign-in endpoints: no Bearer header, and a 401 is an answer, not an expiry. */
  auth?: boolean;
  signal?: AbortSignal;
  /** Extra request headers, e.g. `Idempotency-Key` on a booking. */
  headers?: Record<string, string>;
  /** `blob` for files (receipts, calendar files): they need the Bearer header too. */
  responseType?: 'json' | 'blob';
}

/** A file fetched with the session's token, with the name the server suggests. */
export interface DownloadedFile {
  blob: Blob;
  fileName: string | null;
}

type SessionListener = (session: AuthSession | null) => void;

export interface ApiClientOptions {
  /** Where the API is on this origin, e.g. `/api` (each app's `config/env.ts`). */
  basePath: string;
  fetch?: typeof fetch;
}

export interface UploadOptions {
  /** Told as the body goes out: bytes sent so far and the total. */
  onProgress?: (loaded: number, total: number) => void;
  signal?: AbortSignal;
}

/**
 * The one way the app talks to the API. The access token lives in memory only (never in
 * storage); the refresh token is an HttpOnly cookie the browser sends to /api/auth. A 401
 * triggers one refresh, shared by every request that failed meanwhile, then one retry.
 */
export function createApiClient(options: ApiClientOptions) {
  const { basePath } = options;
  const doFetch = (input: string, init: RequestInit) => (options.fetch ?? fetch)(input, init);

  let accessToken: string | null = null;
  let refreshing: Promise<AuthSession | null> | null = null;
  const listeners = new Set<SessionListener>();

  function url(path: string): string {
    return new URL(`${basePath}${path}`, window.location.origin).toString();
  }

  function setSession(session: AuthSession): void {
    accessToken = session.accessToken;
    listeners.forEach((listener) => listener(session));
  }

  function clearSession(): void {
    const hadSession = accessToken !== null;
    accessToken = null;
    if (hadSession) listeners.forEach((listener) => listener(null));
  }

  async function send(path: string, opts: RequestOptions, token: string | null): Promise<Response> {
    const headers: Record<string, string> = {
      Accept: opts.responseType === 'blob' ? '*/*' : 'application/json',
      ...opts.headers,
    };
    if (opts.body !== undefined) headers['Content-Type'] = 'application/json';
    if (token) headers.Authorization = `Bearer ${token}`;
    try {
      return await doFetch(url(path), {
        method: opts.method ?? 'GET',
        headers,
        body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
        credentials: 'include',
        signal: opts.signal,
      });
    } catch (error) {
      if (opts.signal?.aborted) throw error;
      throw new ApiError(0, [NETWORK_ERROR_MESSAGE]);
    }
  }

  /** Single-flight: while one refresh is running, every caller waits for the same answer. */
  function refreshSession(): Promise<AuthSession | null> {
    refreshing ??= (async () => {
      try {
        const res = await send('/auth/refresh', { method: 'POST' }, null);
        if (res.ok) {
          const session = (await res.json()) as AuthSession;
          setSession(session);
          return session;
        }
        if (res.status === 401 || res.status === 403) {
          clearSession();
          return null;
        }
        throw await toApiError(res);
      } finally {
        refreshing = null;
      }
    })();
    return refreshing;
  }

  async function request<T>(path: string, opts: RequestOptions = {}): Promise<T> {
    const useAuth = opts.auth !== false;
    const tokenSent = useAuth ? accessToken : null;
    let res = await send(path, opts, tokenSent);

    if (res.status === 401 && useAuth) {
      // Another request may already have refreshed while this one was in flight.
      const newer = accessToken !== null && accessToken !== tokenSent ? accessToken : null;
      const token = newer ?? (await refreshSession())?.accessToken ?? null;
      if (token === null) throw await toApiError(res);
      res = await send(path, opts, token);
      if (res.status === 401) clearSession();
    }

    if (!res.ok) throw await toApiError(res);
    if (opts.responseType === 'blob') {
      const file: DownloadedFile = {
        blob: await res.blob(),
        fileName: fileNameFrom(res.headers.get('Content-Disposition')),
      };
      return file as T;
    }
    if (res.status === 204) return undefined as T;
    const text = await res.text();
    return (text ? JSON.parse(text) : undefined) as T;
  }

  /**
   * A multipart upload through XMLHttpRequest, the one browser API that reports upload
   * progress. Same token rules as `request`: one refresh and one retry on a 401.
   */
  function sendUpload(
    path: string,
    form: FormData,
    token: string | null,
    opts: UploadOptions,
  ): Promise<{ status: number; text: string; retryAfter: string | null }> {
    return new Promise((resolve, reject) => {
      const xhr = new XMLHttpRequest();
      xhr.open('POST', url(path));
      xhr.withCredentials = true;
      xhr.setRequestHeader('Accept', 'application/json');
      if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
      xhr.upload.onprogress = (event) => {
        if (event.lengthComputable) opts.onProgress?.(event.loaded, event.total);
      };
      xhr.onload = () =>
        resolve({
          status: xhr.status,
          text: xhr.responseText,
          retryAfter: xhr.getResponseHeader('Retry-After'),
        });
      xhr.onerror = () => reject(new ApiError(0, [NETWORK_ERROR_MESSAGE]));
      xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
      opts.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
      xhr.send(form);
    });
  }

  async function upload<T>(path: string, form: FormData, opts: UploadOptions = {}): Promise<T> {
    const tokenSent = accessToken;
    let res = await sendUpload(path, form, tokenSent, opts);
    if (res.status === 401) {
      const newer = accessToken !== null && accessToken !== tokenSent ? accessToken : null;
      const token = newer ?? (await refreshSession())?.accessToken ?? null;
      if (token !== null) {
        res = await sendUpload(path, form, token, opts);
        if (res.status === 401) clearSession();
      }
    }
    if (res.status < 200 || res.status >= 300) {
      throw errorFromBody(res.status, res.text, res.retryAfter);
    }
    return (res.text ? JSON.parse(res.text) : undefined) as T;
  }

  return {
    request,
    get: <T>(path: string, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
      request<T>(path, { ...opts, method: 'GET' }),
    post: <T>(path: string, body?: unknown, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
      request<T>(path, { ...opts, method: 'POST', body }),
    put: <T>(path: string, body?: unknown, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
      request<T>(path, { ...opts, method: 'PUT', body }),
    patch: <T>(path: string, body?: unknown, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
      request<T>(path, { ...opts, method: 'PATCH', body }),
    delete: <T = void>(path: string, opts: Omit<RequestOptions, 'method' | 'body'> = {}) =>
      request<T>(path, { ...opts, method: 'DELETE' }),
    upload,
    /** A file behind the session (the browser cannot add the Bearer header to a plain link). */
    download: (path: string, opts: Omit<RequestOptions, 'method' | 'body' | 'responseType'> = {}) =>
      request<DownloadedFile>(path, { ...opts, method: 'GET', responseType: 'blob' }),
    refreshSession,
    /** On app start: trade the refresh cookie, if any, for a session. Null when signed out. */
    restoreSession: (): Promise<AuthSession | null> => refreshSession(),
    setSession,
    clearSession,
    getAccessToken: () => accessToken,
    /** Told when a session starts, is refreshed (a session) or ends (null). */
    subscribe(listener: SessionListener): () => void {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}

export type ApiClient = ReturnType<typeof createApiClient>;

async function toApiError(res: Response): Promise<ApiError> {
  let text = '';
  try {
    text = await res.text();
  } catch {
    // No body to read: the generic message below will do.
  }
  return errorFromBody(res.status, text, res.headers.get('Retry-After'));
}

function errorFromBody(status: number, text: string, retryAfter: string | null): ApiError {
  let messages: string[] = [];
  try {
    const body = JSON.parse(text) as Partial<ApiErrorBody>;
    if (Array.isArray(body.message)) messages = body.message.map(String);
    else if (typeof body.message === 'string') messages = [body.message];
  } catch {
    // Not JSON (a proxy error page, an empty body): fall back to a generic message below.
  }
  if (messages.length === 0) messages = [fallbackMessage(status)];
  return new ApiError(status, messages, parseRetryAfter(retryAfter));
}

function fallbackMessage(status: number): string {
  if (status === 413) return 'The file is too large for the server. Send a smaller one.';
  if (status === 415) return 'The server does not accept this kind of file.';
  if (status === 429) return 'Too many attempts. Please wait a little and try again.';
  if (status >= 500) return 'Something went wrong on our side. Please try again in a moment.';
  return `The request failed (${status}).`;
}

/**
 * The file name from `Content-Disposition` (RFC 6266): `filename*=UTF-8''…` (RFC 8187) wins over
 * a plain `filename="…"`. Path separators are dropped so a name can never point elsewhere.
 */
export function fileNameFrom(header: string | null): string | null {
  if (!header) return null;
  let name: string | null = null;
  const extended = /filename\*\s*=\s*([^']*)'[^']*'([^;]+)/i.exec(header);
  if (extended) {
    try {
      name = decodeURIComponent(extended[2]!.trim());
    } catch {
      name = null;
    }
  }
  if (name === null) {
    const plain = /filename\s*=\s*(?:"((?:[^"\\]|\\.)*)"|([^;\s]+))/i.exec(header);
    name = plain ? (plain[1]?.replace(/\\(.)/g, '$1') ?? plain[2] ?? null) : null;
  }
  const safe = name?.replace(/[\\/]/g, '_').trim();
  return safe ? safe : null;
}

/** `Retry-After` is either delay-seconds or an HTTP date (RFC 9110 §10.2.3). */
export function parseRetryAfter(value: string | null, now: number = Date.now()): number | null {
  if (value === null || value.trim() === '') return null;
  if (/^\d+$/.test(value.trim())) return Number(value.trim());
  const date = Date.parse(value);
  if (Number.isNaN(date)) return null;
  return Math.max(0, Math.ceil((date - now) / 1000));
}
