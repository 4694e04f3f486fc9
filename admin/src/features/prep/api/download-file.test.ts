import { describe, expect, it } from 'vitest';
import { fileNameFrom } from './download-file';

describe('file name from Content-Disposition (RFC 6266)', () => {
  it('reads the quoted, the bare and the UTF-8 encoded forms', () => {
    expect(fileNameFrom('attachment; filename="prep-plan-2026-03-23-2026-03-29.csv"')).toBe(
      'prep-plan-2026-03-23-2026-03-29.csv',
    );
    expect(fileNameFrom('inline; filename=prep-sheet.pdf')).toBe('prep-sheet.pdf');
    // RFC 6266 §4.3: filename* (RFC 8187 encoding) is preferred over filename.
    expect(
      fileNameFrom(`attachment; filename="labels.pdf"; filename*=UTF-8''%C3%A9tiquettes.pdf`),
    ).toBe('étiquettes.pdf');
    expect(fileNameFrom(null)).toBeNull();
    expect(fileNameFrom('attachment')).toBeNull();
  });
});
