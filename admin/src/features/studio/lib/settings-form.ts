import { toNestErrors } from '@hookform/resolvers';
import {
  sortTiers,
  studioSettingsBodySchema,
  type CancellationTier,
  type StudioSettingsBody,
} from '@nappe/shared';
import type { FieldError, Resolver } from 'react-hook-form';
import { placeFieldMessages, type PlacedMessage } from '../../../lib/error-message';

/**
 * The chef's settings form: what the fields hold (text, as typed), how that becomes the API's
 * settings body, and how the shared body schema's messages — the same the API answers with —
 * land beside the right field.
 */

export interface SettingsFormValues {
  name: string;
  tagline: string;
  city: string;
  timeZone: string;
  currency: string;
  /** Per cent as typed ("21", "5.5"); the API takes basis points. */
  taxRatePercent: string;
  pricesIncludeTax: 'included' | 'added';
  depositPercent: string;
  balanceDueDaysBefore: string;
  cancellationTiers: Array<{ daysBefore: string; refundPercent: string }>;
  dailyPlateCapacity: string;
  blackoutDates: string[];
  finalGuestCountDaysBefore: string;
  sparePercent: string;
  guestDataRetentionDays: string;
  workingHours: { start: string; end: string };
  platingBufferMinutes: string;
}

/** 2100 basis points → "21"; 550 → "5.5"; 555 → "5.55" (exact: digits, never a float). */
export function bpToPercentText(bp: number): string {
  const sign = bp < 0 ? '-' : '';
  const digits = String(Math.abs(bp)).padStart(3, '0');
  const whole = digits.slice(0, -2);
  const fraction = digits.slice(-2).replace(/0+$/, '');
  return `${sign}${whole}${fraction ? `.${fraction}` : ''}`;
}

export type BpParse = { ok: true; bp: number } | { ok: false; message: string };

/** "21" → 2100, "5,5" → 550, "5.55" → 555. More than two decimals is an error, never rounded. */
export function percentTextToBp(text: string): BpParse {
  const t = text.trim().replace(',', '.').replace(/\s*%$/, '');
  if (t === '') return { ok: false, message: 'Enter the tax rate in per cent, such as 21 or 5.5.' };
  const match = /^(-?)(\d*)(?:\.(\d*))?$/.exec(t);
  if (!match || (match[2] === '' && !match[3])) {
    return { ok: false, message: 'Write the tax rate as a number, such as 21 or 5.5.' };
  }
  const fraction = match[3] ?? '';
  if (fraction.length > 2) {
    return { ok: false, message: 'Use at most two decimals for the tax rate (such as 5.55).' };
  }
  const bp = Number(match[2] || '0') * 100 + Number(fraction.padEnd(2, '0'));
  return { ok: true, bp: match[1] ? -bp : bp };
}

/** A whole number as typed; blank or anything else is NaN, so the schema says "… must be a number". */
export function textToNumber(text: string): number {
  const t = text.trim().replace(',', '.');
  return /^-?\d+(\.\d+)?$/.test(t) ? Number(t) : Number.NaN;
}

export function formValuesOf(s: StudioSettingsBody): SettingsFormValues {
  return {
    name: s.name,
    tagline: s.tagline,
    city: s.city,
    timeZone: s.timeZone,
    currency: s.currency,
    taxRatePercent: bpToPercentText(s.taxRateBp),
    pricesIncludeTax: s.pricesIncludeTax ? 'included' : 'added',
    depositPercent: String(s.depositPercent),
    balanceDueDaysBefore: String(s.balanceDueDaysBefore),
    cancellationTiers: sortTiers(s.cancellationTiers).map((t) => ({
      daysBefore: String(t.daysBefore),
      refundPercent: String(t.refundPercent),
    })),
    dailyPlateCapacity: String(s.dailyPlateCapacity),
    blackoutDates: [...s.blackoutDates].sort(),
    finalGuestCountDaysBefore: String(s.finalGuestCountDaysBefore),
    sparePercent: String(s.sparePercent),
    guestDataRetentionDays: String(s.guestDataRetentionDays),
    workingHours: { ...s.workingHours },
    platingBufferMinutes: String(s.platingBufferMinutes),
  };
}

export interface Conversion {
  /** The body as the API will read it, for the shared schema to judge. */
  candidate: Record<string, unknown>;
  /** Problems found before the schema (a tax rate that is not a number), by form field. */
  errors: Record<string, string>;
}

export function toBody(v: SettingsFormValues): Conversion {
  const errors: Record<string, string> = {};
  const tax = percentTextToBp(v.taxRatePercent);
  if (!tax.ok) errors.taxRatePercent = tax.message;
  return {
    errors,
    candidate: {
      name: v.name,
      tagline: v.tagline,
      city: v.city,
      currency: v.currency,
      timeZone: v.timeZone,
      taxRateBp: tax.ok ? tax.bp : 0,
      pricesIncludeTax: v.pricesIncludeTax === 'included',
      depositPercent: textToNumber(v.depositPercent),
      balanceDueDaysBefore: textToNumber(v.balanceDueDaysBefore),
      cancellationTiers: v.cancellationTiers.map((t) => ({
        daysBefore: textToNumber(t.daysBefore),
        refundPercent: textToNumber(t.refundPercent),
      })),
      dailyPlateCapacity: textToNumber(v.dailyPlateCapacity),
      blackoutDates: v.blackoutDates,
      finalGuestCountDaysBefore: textToNumber(v.finalGuestCountDaysBefore),
      sparePercent: textToNumber(v.sparePercent),
      guestDataRetentionDays: textToNumber(v.guestDataRetentionDays),
      workingHours: { start: v.workingHours.start, end: v.workingHours.end },
      platingBufferMinutes: textToNumber(v.platingBufferMinutes),
    },
  };
}

/** The form field a schema path belongs to; null for the form as a whole. */
export function fieldOf(path: readonly PropertyKey[]): string | null {
  const [head, index, leaf] = path;
  switch (head) {
    case undefined:
      return null;
    case 'taxRateBp':
      return 'taxRatePercent';
    case 'blackoutDates':
      return 'blackoutDates';
    case 'cancellationTiers':
      if (typeof index === 'number')
        return `cancellationTiers.${index}.${String(leaf ?? 'daysBefore')}`;
      return 'cancellationTiers';
    case 'workingHours':
      // The order of the two times is a problem with the closing time.
      return leaf === undefined && index === undefined
        ? 'workingHours.end'
        : `workingHours.${String(index)}`;
    default:
      return typeof head === 'string' && head in BODY_FIELDS ? head : null;
  }
}

const BODY_FIELDS: Record<string, true> = Object.fromEntries(
  Object.keys(studioSettingsBodySchema.shape).map((k) => [k, true] as const),
);

/**
 * The schema speaks of the tax rate in basis points (what the API stores); the field is in per
 * cent. Same rule, same meaning: "must be 10000 or less" (basis points) is "100 % or less".
 */
export function rephrase(field: string, message: string): string {
  if (field !== 'taxRatePercent') return message;
  const bound = /must be (\d+) or (more|less)\.$/.exec(message);
  if (bound) {
    return `The tax rate must be ${bpToPercentText(Number(bound[1]))} % or ${bound[2]}.`;
  }
  if (/whole number/.test(message)) {
    return 'Use at most two decimals for the tax rate (such as 5.55).';
  }
  if (/must be a number/.test(message)) {
    return 'Write the tax rate as a number, such as 21 or 5.5.';
  }
  return message;
}

/** Several problems with one field (a cancellation policy can have three) are kept, one a line. */
function add(into: Record<string, FieldError>, field: string, message: string, type: string) {
  const existing = into[field];
  if (!existing) into[field] = { type, message };
  else if (!existing.message?.split('\n').includes(message))
    existing.message = `${existing.message}\n${message}`;
}

/**
 * A react-hook-form resolver over the shared body schema. Problems with the form as a whole (a
 * field the server does not know) go to `root`.
 */
export const settingsResolver: Resolver<SettingsFormValues, unknown, StudioSettingsBody> = (
  values,
  _context,
  options,
) => {
  const { candidate, errors } = toBody(values);
  const flat: Record<string, FieldError> = {};
  for (const [field, message] of Object.entries(errors)) add(flat, field, message, 'conversion');
  const result = studioSettingsBodySchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const field = fieldOf(issue.path) ?? 'root';
      if (field === 'taxRatePercent' && flat.taxRatePercent?.type === 'conversion') continue;
      add(flat, field, rephrase(field, issue.message), 'schema');
    }
  }
  if (Object.keys(flat).length > 0 || !result.success) {
    return { values: {}, errors: toNestErrors(flat, options) };
  }
  return { values: result.data, errors: {} };
};

/** The API's 400 messages ("depositPercent: The deposit must be 1 % or more."), by form field. */
export function placeServerMessages(messages: readonly string[]): PlacedMessage[] {
  return placeFieldMessages(messages, fieldOf).map((placed) =>
    placed.field
      ? { field: placed.field, message: rephrase(placed.field, placed.message) }
      : placed,
  );
}

/** The policy in words, from the earliest cancellation to the latest; [] while a tier is unreadable. */
export function describePolicy(tiers: readonly CancellationTier[]): string[] {
  if (tiers.some((t) => !Number.isInteger(t.daysBefore) || !Number.isInteger(t.refundPercent))) {
    return [];
  }
  const sorted = sortTiers(tiers);
  return sorted.map((t, i) => {
    const refund = t.refundPercent === 0 ? 'no refund' : `${t.refundPercent} % refunded`;
    const days = (n: number) => `${n} day${n === 1 ? '' : 's'}`;
    if (i === 0) {
      return t.daysBefore === 0
        ? `Cancelled any time before the event: ${refund}.`
        : `Cancelled ${days(t.daysBefore)} or more before the event: ${refund}.`;
    }
    const upTo = sorted[i - 1]!.daysBefore - 1;
    if (upTo === 0) return `Cancelled on the day of the event: ${refund}.`;
    return upTo === t.daysBefore
      ? `Cancelled ${days(t.daysBefore)} before: ${refund}.`
      : `Cancelled ${t.daysBefore} to ${days(upTo)} before: ${refund}.`;
  });
}
