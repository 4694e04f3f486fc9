import { saveDownloadedFile } from '@nappe/web-kit';
import type { DownloadedFile } from './api-client';

/**
 * The few things the app asks of the browser window itself, in one object so that tests can
 * watch them (jsdom cannot leave the page or save a file).
 */
export const browser = {
  /** Leave the app for another site: the payment page. */
  assign(url: string): void {
    window.location.assign(url);
  },

  /** Offer a file to save, as a download of an in-memory copy (web-kit's `saveDownloadedFile`). */
  save(file: DownloadedFile, fallbackName: string): void {
    saveDownloadedFile(file, fallbackName);
  },
};

/**
 * A fresh idempotency key: a random (version 4) UUID. `crypto.randomUUID` exists only on secure
 * origins (https, localhost), so elsewhere the same layout is built from `getRandomValues`
 * (RFC 9562 §5.4: version bits 0100, variant bits 10).
 */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = (bytes[6]! & 0x0f) | 0x40;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
