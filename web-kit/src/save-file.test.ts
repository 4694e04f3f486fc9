import { afterEach, describe, expect, it, vi } from 'vitest';
import { SAVE_RELEASE_MS, saveDownloadedFile } from './save-file.js';

describe('saveDownloadedFile', () => {
  afterEach(() => {
    vi.useRealTimers();
    vi.restoreAllMocks();
  });

  function watch() {
    const created: string[] = [];
    const revoked: string[] = [];
    URL.createObjectURL = vi.fn(() => {
      created.push(`blob:nappe/${created.length + 1}`);
      return created[created.length - 1]!;
    });
    URL.revokeObjectURL = vi.fn((href: string) => void revoked.push(href));
    const clicks: Array<{ href: string; download: string; inDocument: boolean }> = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      clicks.push({ href: this.href, download: this.download, inDocument: this.isConnected });
    });
    return { created, revoked, clicks };
  }

  it('clicks a link to the copy with the server’s name, removes it, and releases the copy later', () => {
    vi.useFakeTimers();
    const w = watch();
    const name = saveDownloadedFile(
      { blob: new Blob(['%PDF-1.7'], { type: 'application/pdf' }), fileName: 'receipt-N-1.pdf' },
      'receipt.pdf',
    );
    expect(name).toBe('receipt-N-1.pdf');
    expect(w.clicks).toEqual([
      { href: 'blob:nappe/1', download: 'receipt-N-1.pdf', inDocument: true },
    ]);
    expect(document.querySelectorAll('a')).toHaveLength(0);
    vi.advanceTimersByTime(SAVE_RELEASE_MS - 1);
    expect(w.revoked).toEqual([]);
    vi.advanceTimersByTime(1);
    expect(w.revoked).toEqual(['blob:nappe/1']);
  });

  it('uses the fallback name when the server suggests none', () => {
    const w = watch();
    expect(saveDownloadedFile({ blob: new Blob(['x']), fileName: null }, 'plan.csv')).toBe(
      'plan.csv',
    );
    expect(w.clicks[0]?.download).toBe('plan.csv');
  });
});
