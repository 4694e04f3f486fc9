import { env } from '../../../config/env';
import { api, ApiError, NETWORK_ERROR_MESSAGE } from '../../../lib/api-client';

/** The file name a `Content-Disposition` header gives, if any (RFC 6266 `filename=`). */
export function fileNameFrom(disposition: string | null): string | null {
  if (!disposition) return null;
  const star = /filename\*\s*=\s*UTF-8''([^;]+)/i.exec(disposition);
  if (star?.[1]) {
    try {
      return decodeURIComponent(star[1].trim());
    } catch {
      // Badly encoded: fall through to the plain name.
    }
  }
  const plain = /filename\s*=\s*"([^"]*)"|filename\s*=\s*([^;\s]+)/i.exec(disposition);
  return plain?.[1] ?? plain?.[2] ?? null;
}

async function send(path: string, token: string | null): Promise<Response> {
  try {
    return await fetch(new URL(`${env.apiBasePath}${path}`, window.location.origin), {
      headers: token ? { Authorization: `Bearer ${token}` } : {},
      credentials: 'include',
    });
  } catch {
    throw new ApiError(0, [NETWORK_ERROR_MESSAGE]);
  }
}

async function errorOf(res: Response): Promise<ApiError> {
  let messages: string[] = [];
  try {
    const body = (await res.json()) as { message?: unknown };
    if (Array.isArray(body.message)) messages = body.message.map(String);
    else if (typeof body.message === 'string') messages = [body.message];
  } catch {
    // Not JSON: the generic message below.
  }
  if (messages.length === 0) {
    messages = [
      res.status >= 500
        ? 'Something went wrong on our side. Please try again in a moment.'
        : `The download failed (${res.status}).`,
    ];
  }
  return new ApiError(res.status, messages);
}

/**
 * Fetches a document of the API with the signed-in person's token (a plain link would carry no
 * token) and hands it to the browser as a download. One refresh and retry on a 401, like every
 * other request. Resolves with the file name used.
 */
export async function downloadFile(path: string, fallbackName: string): Promise<string> {
  let res = await send(path, api.getAccessToken());
  if (res.status === 401) {
    const session = await api.refreshSession();
    if (!session) throw await errorOf(res);
    res = await send(path, session.accessToken);
  }
  if (!res.ok) throw await errorOf(res);
  const blob = await res.blob();
  const name = fileNameFrom(res.headers.get('Content-Disposition')) ?? fallbackName;
  const href = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = href;
  link.download = name;
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the blob goes.
  window.setTimeout(() => URL.revokeObjectURL(href), 10_000);
  return name;
}
