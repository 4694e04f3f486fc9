import { ApiError } from '../../../lib/api-client';

/** An API failure in words a chef can act on. */
export function describeError(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong. Please try again in a moment.';
  if (error.status === 0) return error.message;
  if (error.status === 403) return 'Your role is not allowed to do this. Ask the chef.';
  if (error.status === 404) return 'This booking could not be found. It may have been removed.';
  if (error.status >= 500) return 'The server ran into a problem. Please try again in a moment.';
  return error.messages.join(' ');
}
