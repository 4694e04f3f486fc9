import { ApiError } from '../../../lib/api-client';
import { errorMessage, placeFieldMessages } from '../../../lib/error-message';

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
    return { fields: [], summary: errorMessage(error) };
  }
  const fields: SaveErrors['fields'] = [];
  const general: string[] = [];
  for (const placed of placeFieldMessages(error.messages, (path) => {
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
