import type { Menu } from '@nappe/shared';
import { minorToInput, parseMoneyToMinor } from '../../../lib/money-input';
import type { MenuResponse } from '../api/types';
import { numberToInput, optionalText, requiredNumber, type Conversion } from './form-resolver';

export interface MenuFormValues {
  name: string;
  description: string;
  /** Wrapped for useFieldArray, which needs objects. */
  desserts: Array<{ dessertId: string }>;
  /** In major units, as typed ("48.00"). */
  pricePerGuest: string;
  minGuests: string;
  maxGuests: string;
  leadDays: string;
  active: boolean;
}

export function menuToFormValues(menu: MenuResponse | undefined, currency: string): MenuFormValues {
  return {
    name: menu?.name ?? '',
    description: menu?.description ?? '',
    desserts: menu ? menu.dessertIds.map((dessertId) => ({ dessertId })) : [{ dessertId: '' }],
    pricePerGuest: minorToInput(menu?.pricePerGuestMinor, currency),
    minGuests: numberToInput(menu?.minGuests ?? 8),
    maxGuests: numberToInput(menu?.maxGuests ?? 40),
    leadDays: numberToInput(menu?.leadDays ?? 7),
    active: menu?.active ?? false,
  };
}

export function menuFromForm(
  values: MenuFormValues,
  currency: string,
): Conversion & { candidate: Menu } {
  const errors: Record<string, string> = {};
  const price = parseMoneyToMinor(values.pricePerGuest, currency);
  if (!price.ok) errors.pricePerGuest = price.message;
  values.desserts.forEach((d, i) => {
    if (!d.dessertId) errors[`desserts.${i}.dessertId`] = 'Pick a dessert, or remove this line.';
  });
  const description = optionalText(values.description);
  return {
    candidate: {
      id: 'draft',
      name: values.name,
      ...(description ? { description } : {}),
      dessertIds: values.desserts.map((d) => d.dessertId),
      pricePerGuestMinor: price.ok ? price.minor : 0,
      minGuests: requiredNumber(values.minGuests),
      maxGuests: requiredNumber(values.maxGuests),
      leadDays: requiredNumber(values.leadDays),
      active: values.active,
    },
    errors,
  };
}

export function menuFieldOf(path: readonly PropertyKey[]): string {
  const [head, index] = path;
  switch (head) {
    case 'dessertIds':
      return typeof index === 'number' ? `desserts.${index}.dessertId` : 'root.desserts';
    case 'pricePerGuestMinor':
      return 'pricePerGuest';
    case 'name':
    case 'description':
    case 'minGuests':
    case 'maxGuests':
    case 'leadDays':
    case 'active':
      return head;
    default:
      return 'root.form';
  }
}

export function rephraseMenuMessage(field: string, message: string): string {
  if (!/^(Invalid input|Too small|Too big)/.test(message)) return message;
  if (field === 'leadDays') return 'Lead time is a whole number of days, 0 to 365.';
  if (field === 'minGuests' || field === 'maxGuests')
    return 'A whole number of guests, 1 to 5,000.';
  return 'Check this value.';
}

export function menuBody(parsed: Menu): Omit<Menu, 'id'> {
  const { id: _id, ...body } = parsed;
  return body;
}
