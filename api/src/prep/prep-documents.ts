import { formatMoney, type PrepPlanView } from '@nappe/shared';
import PDFDocument from 'pdfkit';
import type { ComponentLabel } from './prep.types.js';

const INK = '#2B1E2F';
const MUTED = '#6B5E6E';

function cell(value: string | number): string {
  const s = String(value);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const row = (values: Array<string | number>) => values.map(cell).join(',');

/**
 * The plan as CSV (RFC 4180 quoting): the Prep sheet (one row per recipe run and production day)
 * then the Purchase list. Cost columns only when `withCosts`: the chef's plan, which carries them.
 */
export function planCsv(plan: PrepPlanView, withCosts: boolean): string {
  const lines = [
    row(['Prep sheet', `${plan.range.from} to ${plan.range.to}`, `spare ${plan.sparePercent} %`]),
    row([
      'production day',
      'recipe',
      'storage',
      'grams',
      'batches',
      'grams per batch',
      'equipment',
      'batch capacity g',
      'orders',
      'start',
      'finish',
      'use by',
    ]),
  ];
  for (const day of plan.days) {
    for (const r of day.recipes) {
      lines.push(
        row([
          day.date,
          r.recipeName,
          r.storage,
          r.grams,
          r.batches,
          r.gramsPerBatch,
          r.equipment?.name ?? '',
          r.equipment?.batchCapacityG ?? '',
          r.orderIds.length,
          r.startAt,
          r.finishAt,
          r.expiresAt,
        ]),
      );
    }
  }
  lines.push('', row(['Purchase list']));
  lines.push(
    row([
      'ingredient',
      'needed g',
      'pack size',
      'pack unit',
      'packs',
      ...(withCosts ? ['pack price', 'total', 'used cost'] : []),
    ]),
  );
  for (const l of plan.purchaseList.lines) {
    lines.push(
      row([
        l.name,
        l.neededGrams,
        l.packSize,
        l.packUnit,
        l.packs,
        ...(withCosts
          ? [
              formatMoney(l.packPriceMinor!, plan.currency),
              formatMoney(l.totalMinor!, plan.currency),
              formatMoney(l.usedCostMinor!, plan.currency),
            ]
          : []),
      ]),
    );
  }
  if (withCosts) {
    lines.push(
      row(['Total', '', '', '', '', '', formatMoney(plan.purchaseList.totalMinor!, plan.currency)]),
    );
  }
  return `${lines.join('\r\n')}\r\n`;
}

/**
 * Text the PDF's standard fonts can draw (WinAnsi). Signs a label must not lose are spelled out
 * first: "−18 °C" (U+2212, from `formatCelsius`) must not print as "?18 °C" on a frozen label.
 */
export function winAnsi(text: string): string {
  return text
    .replace(/[“”]/g, '"')
    .replace(/\u2212/g, '-')
    .replace(/≤/g, '<=')
    .replace(/≥/g, '>=')
    .replace(/…/g, '...')
    .replace(/[^\t\n\u0020-\u00ff€’–—]/g, '?');
}

function pdf(title: string, draw: (doc: PDFKit.PDFDocument) => void): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 48, compress: false, info: { Title: title } });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  draw(doc);
  doc.end();
  return done;
}

/** Prep sheet and Purchase list as one PDF, rendered on request (costs as in `planCsv`). */
export function renderPlanPdf(plan: PrepPlanView, withCosts: boolean): Promise<Buffer> {
  return pdf(`Prep sheet ${plan.range.from} to ${plan.range.to}`, (doc) => {
    const t = winAnsi;
    doc.fillColor(INK).font('Helvetica-Bold').fontSize(18).text('Prep sheet');
    doc
      .font('Helvetica')
      .fontSize(10)
      .fillColor(MUTED)
      .text(
        t(
          `Events ${plan.range.from} to ${plan.range.to}; ${plan.orders.length} confirmed orders; spare ${plan.sparePercent} %.`,
        ),
      );
    for (const day of plan.days) {
      doc.moveDown(0.5).fillColor(INK).font('Helvetica-Bold').fontSize(12).text(day.date);
      doc.font('Helvetica').fontSize(9);
      for (const r of day.recipes) {
        doc.text(
          t(
            `${r.recipeName}: ${r.grams} g in ${r.batches} batch${r.batches === 1 ? '' : 'es'} of ${r.gramsPerBatch} g${r.equipment ? ` (${r.equipment.name})` : ''}; ${r.storage}; use by ${r.expiresAt.slice(0, 16).replace('T', ' ')}`,
          ),
          { indent: 12 },
        );
      }
    }
    doc.addPage();
    doc.fillColor(INK).font('Helvetica-Bold').fontSize(18).text('Purchase list');
    doc.font('Helvetica').fontSize(9);
    for (const l of plan.purchaseList.lines) {
      doc.text(
        t(
          `${l.name}: ${l.neededGrams} g needed; ${l.packs} × ${l.packSize} ${l.packUnit}${withCosts ? ` = ${formatMoney(l.totalMinor!, plan.currency)}` : ''}`,
        ),
      );
    }
    if (withCosts) {
      doc
        .moveDown(0.5)
        .font('Helvetica-Bold')
        .text(t(`Total: ${formatMoney(plan.purchaseList.totalMinor!, plan.currency)}`));
    }
  });
}

/** Component labels: name, made on, use by, storage, ingredients with allergens in bold. */
export function renderLabelsPdf(date: string, labels: readonly ComponentLabel[]): Promise<Buffer> {
  return pdf(`Component labels ${date}`, (doc) => {
    const t = winAnsi;
    if (labels.length === 0) doc.font('Helvetica').fontSize(11).text(`Nothing is made on ${date}.`);
    labels.forEach((label, i) => {
      if (i > 0) doc.moveDown(1);
      doc.fillColor(INK).font('Helvetica-Bold').fontSize(13).text(t(label.recipeName));
      doc
        .font('Helvetica')
        .fontSize(9)
        .text(t(`Made on ${label.madeOn.slice(0, 16).replace('T', ' ')}`))
        .text(t(`Use by ${label.useBy.slice(0, 16).replace('T', ' ')}`))
        .text(
          t(`Storage: ${label.storage}${label.storageCaution ? ` — ${label.storageCaution}` : ''}`),
        );
      label.segments.forEach((s, j) => {
        doc
          .font(s.emphasis ? 'Helvetica-Bold' : 'Helvetica')
          .text(t(s.text), { continued: j < label.segments.length - 1 });
      });
    });
  });
}
