// @ts-check
/**
 * The test cards the local payment page and `payment_intents/:id/confirm` understand: the
 * card numbers and PaymentMethod ids the payment service documents for testing (Stripe docs,
 * "Test card numbers": cards by outcome, declined payments, 3D Secure authentication).
 */

/**
 * @typedef {object} TestCard
 * @property {string} number card number, digits only
 * @property {string} paymentMethod the matching test PaymentMethod id for API calls
 * @property {string} label what the card does, for the list on the payment page
 * @property {'succeeds' | 'declined' | 'requires_authentication'} outcome
 * @property {string} [code] error code of the decline
 * @property {string} [declineCode] decline code of the decline
 * @property {string} [message] the message the service returns with the decline
 */

/** @type {readonly TestCard[]} */
export const TEST_CARDS = Object.freeze([
  {
    number: '4242424242424242',
    paymentMethod: 'pm_card_visa',
    label: 'Payment succeeds',
    outcome: 'succeeds',
  },
  {
    number: '4000000000000002',
    paymentMethod: 'pm_card_visa_chargeDeclined',
    label: 'Declined: generic decline',
    outcome: 'declined',
    code: 'card_declined',
    declineCode: 'generic_decline',
    message: 'Your card was declined.',
  },
  {
    number: '4000000000009995',
    paymentMethod: 'pm_card_visa_chargeDeclinedInsufficientFunds',
    label: 'Declined: insufficient funds',
    outcome: 'declined',
    code: 'card_declined',
    declineCode: 'insufficient_funds',
    message: 'Your card has insufficient funds.',
  },
  {
    number: '4000000000009987',
    paymentMethod: 'pm_card_visa_chargeDeclinedLostCard',
    label: 'Declined: lost card',
    outcome: 'declined',
    code: 'card_declined',
    declineCode: 'lost_card',
    message: 'Your card was declined.',
  },
  {
    number: '4000000000000069',
    paymentMethod: 'pm_card_chargeDeclinedExpiredCard',
    label: 'Declined: expired card',
    outcome: 'declined',
    code: 'expired_card',
    declineCode: 'expired_card',
    message: 'Your card has expired.',
  },
  {
    number: '4000000000000127',
    paymentMethod: 'pm_card_chargeDeclinedIncorrectCvc',
    label: 'Declined: incorrect security code (CVC)',
    outcome: 'declined',
    code: 'incorrect_cvc',
    declineCode: 'incorrect_cvc',
    message: "Your card's security code is incorrect.",
  },
  {
    number: '4000002760003184',
    paymentMethod: 'pm_card_authenticationRequired',
    label: 'Asks for authentication (3D Secure), then succeeds or fails as you choose',
    outcome: 'requires_authentication',
  },
]);

/** @type {ReadonlyMap<string, TestCard>} */
export const TEST_CARDS_BY_NUMBER = new Map(TEST_CARDS.map((card) => [card.number, card]));

/** @type {ReadonlyMap<string, TestCard>} */
export const TEST_CARDS_BY_PAYMENT_METHOD = new Map(
  TEST_CARDS.map((card) => [card.paymentMethod, card]),
);

/**
 * Luhn checksum (ISO/IEC 7812-1, annex B), which every card number carries.
 * @param {string} digits
 * @returns {boolean}
 */
export function passesLuhn(digits) {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return digits.length > 0 && sum % 10 === 0;
}

/**
 * Group a card number in fours for reading: "4242 4242 4242 4242".
 * @param {string} digits
 * @returns {string}
 */
export function groupCardNumber(digits) {
  return digits.replace(/(\d{4})(?=\d)/g, '$1 ');
}
