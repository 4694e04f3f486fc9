import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

/**
 * Refuses passwords that are common or follow a guessable pattern (OWASP ASVS 5.0 V6.2.4,
 * NIST SP 800-63B §3.1.1.2: check against commonly used passwords, no composition rules).
 * zxcvbn's common-password and keyboard-pattern dictionaries do the judging; score 0–1 means
 * fewer than 10^6 guesses.
 */
const estimator = new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });

/** Only this many characters are analysed: enough to judge, and matching cost stays bounded. */
const ANALYSED_LENGTH = 64;

export const WEAK_PASSWORD_MESSAGE =
  'This password is too easy to guess: it is a common password or a simple pattern. A few unrelated words make a strong one.';

/** The person's own details count as guessable words too (their e-mail, its local part, their name). */
export function isGuessablePassword(
  password: string,
  person: { email?: string; name?: string } = {},
): boolean {
  const analysed = [...password].slice(0, ANALYSED_LENGTH).join('');
  const userInputs = [
    person.email ?? '',
    person.email?.split('@')[0] ?? '',
    ...(person.name?.split(/\s+/) ?? []),
  ].filter((w) => w.length > 0);
  return estimator.check(analysed, userInputs).score <= 1;
}
