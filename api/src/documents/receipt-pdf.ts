import { formatMoney, formatRateBp, taxIncluded } from '@nappe/shared';
import PDFDocument from 'pdfkit';

/** Everything a receipt shows; amounts in integer minor units. */
export interface ReceiptFacts {
  studioName: string;
  studioCity: string;
  receiptNumber: string;
  /** Written for people, e.g. "Sunday 21 June 2026". */
  issuedOn: string;
  clientName: string;
  clientEmail: string;
  reference: string;
  menuName: string;
  guestCount: number;
  eventOn: string;
  /** "Deposit (30 %)", "Refund"… */
  description: string;
  isRefund: boolean;
  amountMinor: number;
  currency: string;
  taxRateBp: number;
  seeded: boolean;
}

const INK = '#2B1E2F';
const MUTED = '#6B5E6E';
const ACCENT = '#C2813A';

/**
 * A receipt for one settled payment or refund, as a PDF rendered on request (never stored).
 * The amount is formatted with Intl.NumberFormat (through `formatMoney`); the tax line is the
 * tax inside the amount paid — every payment is a share of a tax-inclusive total, so its tax is
 * amount × r / (1 + r) whether the studio's prices include tax or add it.
 * Standard PDF fonts (WinAnsi): text outside Latin-1 and a few signs (€ – — ’) would not show.
 * Uncompressed so the text stays searchable by simple tools; a receipt is a few kilobytes.
 */
export function renderReceiptPdf(facts: ReceiptFacts): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 56,
    compress: false,
    info: {
      Title: `${facts.isRefund ? 'Refund receipt' : 'Receipt'} ${facts.receiptNumber}`,
      Author: facts.studioName,
      Subject: `Booking ${facts.reference}`,
    },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const money = (minor: number) => formatMoney(minor, facts.currency);
  const taxMinor = taxIncluded(facts.amountMinor, facts.taxRateBp);
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;

  doc.fillColor(INK).font('Helvetica-Bold').fontSize(22).text(facts.studioName, left, 56);
  doc
    .font('Helvetica')
    .fontSize(10)
    .fillColor(MUTED)
    .text(facts.studioCity || ' ');
  doc.moveDown(2);
  doc
    .fillColor(ACCENT)
    .font('Helvetica-Bold')
    .fontSize(16)
    .text(facts.isRefund ? 'Refund receipt' : 'Receipt');
  doc.moveDown(0.5);

  const row = (label: string, value: string) => {
    const y = doc.y;
    doc.font('Helvetica').fontSize(10).fillColor(MUTED).text(label, left, y, { width: 150 });
    doc
      .font('Helvetica')
      .fontSize(10)
      .fillColor(INK)
      .text(value, left + 160, y, { width: width - 160 });
    doc.moveDown(0.4);
  };
  row('Receipt number', facts.receiptNumber);
  row('Date', facts.issuedOn);
  row('Billed to', `${facts.clientName} (${facts.clientEmail})`);
  row('Booking', facts.reference);
  row(
    'Event',
    `${facts.menuName}, ${facts.guestCount} ${facts.guestCount === 1 ? 'guest' : 'guests'}, ${facts.eventOn}`,
  );
  doc.moveDown(1);

  const y = doc.y;
  doc
    .moveTo(left, y)
    .lineTo(left + width, y)
    .strokeColor(MUTED)
    .lineWidth(0.5)
    .stroke();
  doc.moveDown(0.6);
  const lineY = doc.y;
  doc.font('Helvetica').fontSize(11).fillColor(INK).text(facts.description, left, lineY);
  doc
    .font('Helvetica-Bold')
    .fontSize(11)
    .text(`${facts.isRefund ? '-' : ''}${money(facts.amountMinor)}`, left, lineY, {
      width,
      align: 'right',
    });
  doc.moveDown(0.6);
  doc
    .font('Helvetica')
    .fontSize(10)
    .fillColor(MUTED)
    .text(
      facts.taxRateBp === 0
        ? 'No tax charged.'
        : `Of which tax at ${formatRateBp(facts.taxRateBp)}: ${money(taxMinor)}`,
      left,
      doc.y,
      { width, align: 'right' },
    );
  doc.moveDown(2);
  doc
    .fontSize(9)
    .fillColor(MUTED)
    .text(
      facts.seeded
        ? 'Demo record: no money moved.'
        : facts.isRefund
          ? 'Refunded to the card used for the payment, through our payment service.'
          : 'Paid by card through our payment service.',
      left,
      doc.y,
      { width },
    );
  doc.end();
  return done;
}
