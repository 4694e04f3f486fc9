// @ts-check
import { randomBytes } from 'node:crypto';

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/**
 * A random object id in the payment service's style: a type prefix, an underscore and
 * alphanumerics (`cs_test_…`, `pi_…`, `evt_…`).
 * @param {string} prefix
 * @param {number} [length]
 * @returns {string}
 */
export function newId(prefix, length = 24) {
  let out = '';
  for (const byte of randomBytes(length)) out += ALPHABET[byte % ALPHABET.length];
  return `${prefix}_${out}`;
}
