/**
 * The text shown by an uncompressed PDF made with pdfkit's standard fonts: each `[...] TJ` array
 * of hex strings, decoded as WinAnsiEncoding (PDF 32000-1:2008, Annex D: 0x80 is €, 0x92 is ’,
 * 0x97 is —). Enough to check what a receipt says without a PDF library.
 */
const WIN_ANSI_EXTRA: Record<number, string> = { 0x80: '€', 0x92: '’', 0x96: '–', 0x97: '—' };

export function pdfText(pdf: Buffer): string[] {
  const source = pdf.toString('latin1');
  const lines: string[] = [];
  for (const match of source.matchAll(/\[((?:\s*<[0-9a-fA-F]*>\s*-?[\d.]*)+)\]\s*TJ/g)) {
    let text = '';
    for (const hex of match[1]!.matchAll(/<([0-9a-fA-F]*)>/g)) {
      for (const byte of Buffer.from(hex[1]!, 'hex')) {
        text += WIN_ANSI_EXTRA[byte] ?? String.fromCharCode(byte);
      }
    }
    lines.push(text);
  }
  return lines;
}
