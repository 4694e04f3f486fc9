import { describe, expect, it } from 'vitest';
import { pdfText } from '../../test/factories/pdf-text.js';
import { renderReceiptPdf, type ReceiptFacts } from './receipt-pdf.js';

const base: ReceiptFacts = {
  studioName: 'Atelier Test',
  studioCity: 'Ghent',
  receiptNumber: 'N-2026-0001-ABCDEF12',
  issuedOn: 'Friday 6 March 2026',
  clientName: 'Selma Brandt',
  clientEmail: 'selma@example.test',
  reference: 'N-2026-0001',
  menuName: 'Garden Supper',
  guestCount: 20,
  eventOn: 'Saturday 20 June 2026 at 19:30',
  description: 'Deposit (30 %)',
  isRefund: false,
  amountMinor: 12000,
  currency: 'GBP',
  taxRateBp: 2000,
  seeded: false,
};

describe('renderReceiptPdf', () => {
  it('states the amount and the VAT inside it (HMRC VAT fraction 1/6 at 20 %)', async () => {
    // HMRC VAT Notice 700, "VAT fraction": at the 20 % standard rate the VAT in a VAT-inclusive
    // price is 1/6 of it — £120.00 includes £20.00.
    const text = pdfText(await renderReceiptPdf(base)).join('\n');
    expect(text).toContain('£120.00');
    expect(text).toContain('Of which tax at 20 %: £20.00');
    expect(text).toContain('N-2026-0001-ABCDEF12');
    expect(text).toContain('Selma Brandt (selma@example.test)');
  });

  it('formats currencies with their own minor units (ISO 4217: JPY has none)', async () => {
    const text = pdfText(
      await renderReceiptPdf({ ...base, currency: 'JPY', amountMinor: 10800, taxRateBp: 800 }),
    ).join('\n');
    // Japan's consumption tax 8 % (reduced rate, from memory): ¥10,800 includes ¥800. The en-GB
    // locale writes the yen as "JP¥" (Unicode CLDR).
    expect(text).toContain('JP¥10,800');
    expect(text).toContain('Of which tax at 8 %: JP¥800');
  });

  it('shows a refund as money out and says when no tax applies', async () => {
    const text = pdfText(
      await renderReceiptPdf({
        ...base,
        currency: 'EUR',
        isRefund: true,
        description: 'Refund',
        taxRateBp: 0,
        amountMinor: 3600,
      }),
    ).join('\n');
    expect(text).toContain('Refund receipt');
    expect(text).toContain('-€36.00');
    expect(text).toContain('No tax charged.');
  });
});
