import { useMutation } from '@tanstack/react-query';
import { api, ApiError, NETWORK_ERROR_MESSAGE } from '../../../lib/api-client';

/**
 * `GET /api/orders/:id/briefing.pdf` (chef, staff; logged by the API). A plain link cannot carry
 * the Bearer token, so the file is fetched with it (one refresh and retry on a 401, as the API
 * client does) and offered as a download of an in-memory copy. Generated on request, never
 * stored by the API; the copy is released once the browser has it.
 */
export async function fetchBriefingPdf(orderId: string): Promise<{ blob: Blob; fileName: string }> {
  const path = `/api/orders/${encodeURIComponent(orderId)}/briefing.pdf`;
  const send = async (token: string | null) => {
    try {
      return await fetch(path, {
        headers: {
          Accept: 'application/pdf',
          ...(token ? { Authorization: `Bearer ${token}` } : {}),
        },
        credentials: 'include',
      });
    } catch {
      throw new ApiError(0, [NETWORK_ERROR_MESSAGE]);
    }
  };
  const sent = api.getAccessToken();
  let res = await send(sent);
  if (res.status === 401) {
    const current = api.getAccessToken();
    const token =
      current !== null && current !== sent
        ? current
        : ((await api.refreshSession())?.accessToken ?? null);
    if (token !== null) res = await send(token);
  }
  if (!res.ok) throw await errorOf(res);
  return {
    blob: await res.blob(),
    fileName: fileNameFrom(res.headers.get('Content-Disposition')) ?? `allergy-briefing.pdf`,
  };
}

async function errorOf(res: Response): Promise<ApiError> {
  let messages: string[] = [];
  try {
    const body = (await res.json()) as { message?: string | string[] };
    messages = Array.isArray(body.message) ? body.message : body.message ? [body.message] : [];
  } catch {
    // Not JSON: the words below will do.
  }
  if (messages.length === 0) {
    messages = [
      res.status >= 500
        ? 'The briefing could not be made on the server. Please try again in a moment.'
        : `The briefing could not be downloaded (${res.status}).`,
    ];
  }
  return new ApiError(res.status, messages);
}

/** `filename="allergy-briefing-N-2026-0005.pdf"` from a Content-Disposition header. */
export function fileNameFrom(header: string | null): string | null {
  const match = header ? /filename="?([^";]+)"?/i.exec(header) : null;
  return match ? match[1]!.trim() : null;
}

/** Offers the file to save, as a link click on an object URL (released after a while). */
export function saveFile(blob: Blob, fileName: string): void {
  const href = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = href;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  window.setTimeout(() => URL.revokeObjectURL(href), 30_000);
}

export const downloadBriefingPdf = async (orderId: string) => {
  const file = await fetchBriefingPdf(orderId);
  saveFile(file.blob, file.fileName);
  return file.fileName;
};

export const useDownloadBriefingPdf = () => useMutation({ mutationFn: downloadBriefingPdf });
