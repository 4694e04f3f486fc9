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

/**
 * `errorMessage` where the payment service may be behind the answer (the order's actions and
 * reads): a 502 or 503 then carries the API's own words, what the payment service refused or that
 * nothing was charged or changed (api/src/payments/payment-gateway.ts), and they are shown as sent.
 */
export function paymentErrorMessage(error: unknown): string {
  if (error instanceof ApiError && (error.status === 502 || error.status === 503)) {
    return error.messages.join(' ');
  }
  return errorMessage(error);
}

/** `lines[2].quantity` → ['lines', 2, 'quantity']: how the API names a field (a schema path). */
export function parseIssuePath(text: string): PropertyKey[] {
  const path: PropertyKey[] = [];
  for (const match of text.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) {
    if (match[2] !== undefined) path.push(Number(match[2]));
    else if (match[1] !== undefined) path.push(match[1]);
  }
  return path;
}

/** A server message, and the form field it is about (null: the whole form). */
export interface PlacedMessage {
  field: string | null;
  message: string;
}

/**
 * A 400's messages, each placed at the form field its schema path names: "lines[2].quantity: The
 * quantity must be more than 0." goes to `fieldOf(['lines', 2, 'quantity'])` as the words after
 * the colon. A message without a path, or with one `fieldOf` does not know (null), stays whole,
 * for the form.
 */
export function placeFieldMessages(
  messages: readonly string[],
  fieldOf: (path: readonly PropertyKey[]) => string | null,
): PlacedMessage[] {
  return messages.map((text) => {
    const match = /^([A-Za-z]\w*(?:\.[A-Za-z]\w*|\[\d+\])*): (.+)$/s.exec(text);
    if (!match) return { field: null, message: text };
    const field = fieldOf(parseIssuePath(match[1]!));
    return field ? { field, message: match[2]! } : { field: null, message: text };
  });
}
