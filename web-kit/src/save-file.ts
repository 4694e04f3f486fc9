import type { DownloadedFile } from './api-client.js';

/** How long the in-memory copy outlives the click: long enough for the browser to start saving. */
export const SAVE_RELEASE_MS = 30_000;

/**
 * Offers a downloaded file to save: a click on a hidden link to an object URL of the in-memory
 * copy, named as the server suggested (or `fallbackName`), released once the browser has it.
 * Returns the name used.
 */
export function saveDownloadedFile(file: DownloadedFile, fallbackName: string): string {
  const name = file.fileName ?? fallbackName;
  const href = URL.createObjectURL(file.blob);
  const link = document.createElement('a');
  link.href = href;
  link.download = name;
  link.rel = 'noopener';
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  window.setTimeout(() => URL.revokeObjectURL(href), SAVE_RELEASE_MS);
  return name;
}
