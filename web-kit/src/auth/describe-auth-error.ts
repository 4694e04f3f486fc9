import { ApiError, NETWORK_ERROR_MESSAGE } from '../api-client.js';
import { formatWait } from './use-countdown.js';

export interface ErrorSummary {
  title: string;
  messages: string[];
}

/** What to tell a person whose sign-in or sign-up the server refused. */
export function describeAuthError(
  error: unknown,
  secondsLeft: number,
  action:
    | 'signing in'
    | 'creating an account'
    | 'sending reset links'
    | 'choosing a new password' = 'signing in',
): ErrorSummary {
  if (!(error instanceof ApiError)) {
    return { title: 'Something went wrong', messages: ['Please try again in a moment.'] };
  }
  switch (error.status) {
    case 0:
      return { title: 'No connection', messages: [NETWORK_ERROR_MESSAGE] };
    case 400:
      return { title: 'Please check the form', messages: error.messages };
    case 401:
      return { title: 'We could not sign you in', messages: error.messages };
    case 429:
      return {
        title: 'Too many attempts',
        messages: [
          secondsLeft > 0
            ? `To protect accounts, ${action} is paused for a moment. Please try again in ${formatWait(secondsLeft)}.`
            : 'You can try again now.',
        ],
      };
    default:
      return {
        title: 'Something went wrong',
        messages:
          error.status >= 500
            ? ['Something went wrong on our side. Please try again in a moment.']
            : error.messages,
      };
  }
}
