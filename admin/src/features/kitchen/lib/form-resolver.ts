import { toNestErrors } from '@hookform/resolvers';
import type { FieldError, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';

export interface Conversion {
  /** The domain object built from the form, for the shared schema to judge. */
  candidate: unknown;
  /** Problems found while converting (a price that is not a price), by form field. */
  errors: Record<string, string>;
}

/**
 * A react-hook-form resolver that validates with the shared zod schema — the same one the API
 * validates with — so the chef reads the schema's own messages beside each field. `fieldOf`
 * says which form field a schema path belongs to.
 */
export function schemaResolver<V extends FieldValues, S extends z.ZodType>(
  convert: (values: V) => Conversion,
  schema: S,
  fieldOf: (path: readonly PropertyKey[], candidate: unknown) => string,
  /** Words for zod's generic messages on fields the schema gives no message of its own. */
  rephrase: (field: string, message: string) => string = (_field, message) => message,
): Resolver<V, unknown, z.output<S>> {
  return (values, _context, options) => {
    const { candidate, errors } = convert(values);
    const flat: Record<string, FieldError> = {};
    for (const [field, message] of Object.entries(errors)) {
      flat[field] = { type: 'conversion', message };
    }
    const result = schema.safeParse(candidate);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = fieldOf(issue.path, candidate);
        flat[field] ??= { type: 'schema', message: rephrase(field, issue.message) };
      }
    }
    if (Object.keys(flat).length > 0 || !result.success) {
      return { values: {}, errors: toNestErrors(flat, options) };
    }
    return { values: result.data, errors: {} };
  };
}

/** A number typed in a field: blank is "not given"; "1,5" reads as 1.5; anything else is NaN. */
export function parseNumber(text: string): number | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const normalised = trimmed.replace(/\s/g, '').replace(',', '.');
  return /^-?\d*\.?\d+$|^-?\d+\.$/.test(normalised) ? Number(normalised) : Number.NaN;
}

/** A required number: blank becomes NaN so the schema says "… must be a number." */
export function requiredNumber(text: string): number {
  return parseNumber(text) ?? Number.NaN;
}

export function numberToInput(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

/** Blank text is left out of the domain object. */
export function optionalText(text: string): string | undefined {
  const trimmed = text.trim();
  return trimmed === '' ? undefined : trimmed;
}
