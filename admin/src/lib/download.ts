import { saveDownloadedFile } from '@nappe/web-kit';
import { api } from './api-client';

/**
 * Fetches one of the API's documents with the signed-in person's token (a plain link would carry
 * none; the client refreshes once on a 401) and offers it as a download. Resolves with the file
 * name used: the server's, or `fallbackName`.
 */
export async function downloadFile(path: string, fallbackName: string): Promise<string> {
  return saveDownloadedFile(await api.download(path), fallbackName);
}
