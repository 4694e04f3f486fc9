import {
  ANIMAL_ORIGINS,
  DERIVED_FORMS,
  GELATIN_ORIGINS,
  STEP_KINDS,
  STORAGE_KINDS,
  SUGAR_KINDS,
  SWEETENERS,
  UNIT_DEFINITIONS,
  UNITS,
  type AnimalOrigin,
  type GelatinOrigin,
  type StepKind,
  type StorageKind,
  type Unit,
} from '@nappe/shared';
import { formWord } from './allergen-text';

export function unitLabel(unit: Unit): string {
  return UNIT_DEFINITIONS[unit].label;
}

export const UNIT_OPTIONS = UNITS.map((u) => ({ value: u, label: unitLabel(u) }));

export const STEP_KIND_LABELS: Record<StepKind, string> = {
  prep: 'Prepare',
  cook: 'Cook',
  custard: 'Cook a custard',
  sugar_syrup: 'Sugar syrup',
  caramel: 'Caramel',
  bake: 'Bake',
  cool: 'Cool down',
  chill: 'Chill',
  freeze: 'Freeze',
  churn: 'Churn',
  temper: 'Temper chocolate',
  whip: 'Whip',
  rest: 'Rest',
  assemble: 'Assemble',
};
export const STEP_KIND_OPTIONS = STEP_KINDS.map((k) => ({ value: k, label: STEP_KIND_LABELS[k] }));

export const STORAGE_LABELS: Record<StorageKind, string> = {
  dry: 'Dry, room temperature',
  chilled: 'Chilled',
  frozen: 'Frozen',
};
export const STORAGE_OPTIONS = STORAGE_KINDS.map((k) => ({ value: k, label: STORAGE_LABELS[k] }));

export const ANIMAL_ORIGIN_LABELS: Record<AnimalOrigin, string> = {
  milk: 'Milk',
  egg: 'Egg',
  honey: 'Honey',
  fish: 'Fish',
  crustacean: 'Crustacean',
  mollusc: 'Mollusc',
  pork: 'Pork',
  beef: 'Beef',
  other_meat: 'Other meat',
  insect: 'Insect (carmine…)',
};
export const ANIMAL_ORIGIN_LIST = ANIMAL_ORIGINS;

export const GELATIN_LABELS: Record<GelatinOrigin, string> = {
  pork: 'Pork gelatin',
  beef: 'Beef gelatin',
  fish: 'Fish gelatin',
  unknown: 'Gelatin, origin unknown',
};
export const GELATIN_OPTIONS = GELATIN_ORIGINS.map((g) => ({ value: g, label: GELATIN_LABELS[g] }));

export const DERIVED_FORM_OPTIONS = DERIVED_FORMS.map((f) => ({
  value: f,
  label: `As ${formWord(f)}`,
}));

export const SUGAR_KIND_LIST = SUGAR_KINDS;
export function sugarLabel(kind: (typeof SUGAR_KINDS)[number]): string {
  const label = SWEETENERS[kind].label;
  return label.charAt(0).toUpperCase() + label.slice(1);
}

/** "36 h", "3 days", "2 days 4 h". */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours) || hours <= 0) return '';
  if (hours < 24) return `${hours} h`;
  const days = Math.floor(hours / 24);
  const rest = Math.round((hours - days * 24) * 10) / 10;
  return `${days} day${days === 1 ? '' : 's'}${rest > 0 ? ` ${rest} h` : ''}`;
}

/** A number for people to read, without float noise: 0.30000000000000004 → "0.3". */
export function formatNumber(value: number, maxDecimals = 2): string {
  return new Intl.NumberFormat('en-GB', { maximumFractionDigits: maxDecimals }).format(value);
}

export function formatGrams(grams: number): string {
  return `${formatNumber(grams, 1)} g`;
}
