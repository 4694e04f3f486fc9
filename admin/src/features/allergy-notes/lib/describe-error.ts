import { ApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-message';

/**
 * An allergy-notes failure in words a chef can act on: a refusal by role and a booking that is
 * gone said plainly (the API's own words for them are generic), anything else as everywhere.
 */
export function describeError(error: unknown): string {
  if (error instanceof ApiError && error.status === 403) {
    return 'Your role is not allowed to do this. Ask the chef.';
  }
  if (error instanceof ApiError && error.status === 404) {
    return 'This booking could not be found. It may have been removed.';
  }
  return errorMessage(error);
}
