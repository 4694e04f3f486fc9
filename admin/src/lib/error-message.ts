import { ApiError } from './api-client';

/** The words for an error a person can act on: the server's own message, or what to do next. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 0) return error.message;
    if (error.status >= 500) return 'The server ran into a problem. Please try again in a moment.';
    return error.messages.join(' ');
  }
  return 'Please try again in a moment.';
}
