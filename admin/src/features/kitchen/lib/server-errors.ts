import { ApiError } from '../../../lib/api-client';

/** `lines[2].quantity` → ['lines', 2, 'quantity']. */
export function parseIssuePath(text: string): PropertyKey[] {
  const path: PropertyKey[] = [];
  for (const match of text.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) {
    if (match[2] !== undefined) path.push(Number(match[2]));
    else if (match[1] !== undefined) path.push(match[1]);
  }
  return path;
}

export interface PlacedMessage {
  /** The form field, or null for the whole form. */
  field: string | null;
  message: string;
}

/**
 * A 400 from the kitchen API, message by message, placed at the form field it is about when the
 * message starts with a schema path ("lines[2].quantity: The quantity must be more than 0.").
 */
export function placeServerMessages(
  error: ApiError,
  fieldOf: (path: readonly PropertyKey[]) => string | null,
): PlacedMessage[] {
  return error.messages.map((text) => {
    const match = /^([A-Za-z][\w]*(?:\.[A-Za-z]\w*|\[\d+\])*): (.+)$/s.exec(text);
    if (!match) return { field: null, message: text };
    const field = fieldOf(parseIssuePath(match[1]!));
    return field ? { field, message: match[2]! } : { field: null, message: text };
  });
}

/** What to tell the chef when saving failed for a reason other than their input. */
export function saveFailureMessage(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Please try again in a moment.';
  if (error.status === 0) return error.message;
  if (error.status >= 500) return 'Something went wrong on our side. Please try again in a moment.';
  return error.messages.join(' ');
}

/** What a failed save tells the chef: messages beside the fields they are about, and the alert's words. */
export interface SaveErrors {
  fields: Array<{ field: string; message: string }>;
  summary: string;
}

/**
 * Sorts out a failed save. A 400's messages go to the form field their schema path names
 * (`fieldOf`; a `root.…` field means the whole form), or to the field `placeElsewhere` finds from
 * the words; what is left is said in the alert. Any other failure is said in the alert alone.
 */
export function saveErrorsOf(
  error: unknown,
  fieldOf: (path: readonly PropertyKey[]) => string,
  placeElsewhere: (message: string) => string | null = () => null,
): SaveErrors {
  if (!(error instanceof ApiError) || error.status !== 400) {
    return { fields: [], summary: saveFailureMessage(error) };
  }
  const fields: SaveErrors['fields'] = [];
  const general: string[] = [];
  for (const placed of placeServerMessages(error, (path) => {
    const field = fieldOf(path);
    return field.startsWith('root.') ? null : field;
  })) {
    const field = placed.field ?? placeElsewhere(placed.message);
    if (field) fields.push({ field, message: placed.message });
    else general.push(placed.message);
  }
  return {
    fields,
    summary: general.length > 0 ? general.join(' ') : 'Please check the fields marked below.',
  };
}
