import { formatIsoDate, type Briefing } from '@nappe/shared';
import PDFDocument from 'pdfkit';

const INK = '#2B1E2F';
const MUTED = '#6B5E6E';
const ALERT = '#A3324A';

/** Standard PDF fonts are WinAnsi: replace the few signs they cannot show. */
function winAnsi(text: string): string {
  return text
    .replace(/[“”]/g, '"')
    .replace(/[→]/g, '->')
    .replace(/[^\t\n\u0020-\u00ff€’–—]/g, '?');
}

/**
 * The Allergy briefing as a printable PDF, rendered on request and never stored (it holds
 * health data). Uncompressed so its text stays searchable by simple tools.
 */
export function renderBriefingPdf(briefing: Briefing, studioName: string): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 48,
    compress: false,
    info: { Title: `Allergy briefing ${briefing.reference}`, Author: studioName },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const t = (s: string) => winAnsi(s);
  doc.fillColor(INK).font('Helvetica-Bold').fontSize(18).text(t('Allergy briefing'));
  doc
    .font('Helvetica')
    .fontSize(10)
    .fillColor(MUTED)
    .text(
      t(
        `${briefing.reference} · ${briefing.occasion} · ${formatIsoDate(briefing.eventDate)} at ${briefing.serviceTime}`,
      ),
    )
    .text(t(briefing.venue.join(', ')))
    .text(
      t(
        `${briefing.guestCount} guests; ${briefing.standardPlates} standard plates. Confidential: guests' health data — do not leave lying around.`,
      ),
    );
  doc.moveDown();
  if (briefing.tables.length === 0) {
    doc.fillColor(INK).fontSize(11).text(t('No guest needs a changed plate.'));
  }
  for (const table of briefing.tables) {
    doc
      .fillColor(INK)
      .font('Helvetica-Bold')
      .fontSize(13)
      .text(t(`Table ${table.table}`));
    for (const g of table.guests) {
      doc
        .font('Helvetica-Bold')
        .fontSize(11)
        .fillColor(g.unresolved ? ALERT : INK)
        .text(t(`${g.guest} — ${g.dessert}: ${g.change}`));
      doc.font('Helvetica').fontSize(9).fillColor(MUTED);
      for (const why of g.why) doc.text(t(`Why: ${why}`), { indent: 12 });
      for (const a of g.advisories) doc.text(t(`Note: ${a}`), { indent: 12 });
    }
    doc.moveDown(0.5);
  }
  doc.end();
  return done;
}
