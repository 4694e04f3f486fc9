import { describe, expect, it } from 'vitest';
import { isGuessablePassword } from './password-strength.js';

// Common passwords of 12+ characters from public breach-derived lists (SecLists
// "10-million-password-list-top-10000"; from memory), and simple patterns.
describe('guessable passwords are refused (OWASP ASVS 5.0 V6.2.4; NIST SP 800-63B 3.1.1.2)', () => {
  it.each(['123456789012', 'qwertyuiopasdf', 'password1234', 'aaaaaaaaaaaa', 'abcdefghijkl'])(
    'refuses %s',
    (password) => {
      expect(isGuessablePassword(password)).toBe(true);
    },
  );

  it('refuses a password made of the person’s own e-mail', () => {
    expect(
      isGuessablePassword('imogen.vale2026', {
        email: 'imogen.vale2026@example.com',
        name: 'Imogen Vale',
      }),
    ).toBe(true);
    expect(isGuessablePassword('imogen.vale2026')).toBe(false);
  });

  it.each([
    'poached pear with bay leaf',
    'lemon curd and toasted meringue',
    'quince, rye & brown butter',
  ])('accepts the passphrase %s', (password) => {
    expect(isGuessablePassword(password)).toBe(false);
  });
});
