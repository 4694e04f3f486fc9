import { describe, expect, it } from 'vitest';
import { passwordLength, passwordSchema, registerSchema, nameSchema } from '../credentials.js';
import { isRole, Role } from '../roles.js';

describe('password rules (OWASP ASVS 5.0 V6.2.1, V6.2.9)', () => {
  it('refuses fewer than 12 characters and accepts 12', () => {
    expect(passwordSchema.safeParse('a'.repeat(11)).success).toBe(false);
    expect(passwordSchema.safeParse('a'.repeat(12)).success).toBe(true);
  });

  it('counts code points, so 12 emoji are 12 characters (V6.2.9: any Unicode)', () => {
    const twelveEmoji = '🍮'.repeat(12); // 24 UTF-16 units
    expect(passwordLength(twelveEmoji)).toBe(12);
    expect(passwordSchema.safeParse(twelveEmoji).success).toBe(true);
    expect(passwordSchema.safeParse('🍮'.repeat(11)).success).toBe(false);
  });

  it('accepts a long passphrase with spaces', () => {
    expect(passwordSchema.safeParse('caramel over the pistachio crumble').success).toBe(true);
  });
});

describe('registration input', () => {
  it('trims the e-mail and requires every field', () => {
    const parsed = registerSchema.parse({
      name: ' Ada ',
      email: ' ada@example.com ',
      password: 'twelve chars ok',
    });
    expect(parsed.email).toBe('ada@example.com');
    expect(parsed.name).toBe('Ada');
    expect(
      registerSchema.safeParse({ name: 'Ada', email: 'not-an-email', password: 'x' }).success,
    ).toBe(false);
  });

  it('refuses CR/LF in a name so it can never add an e-mail header', () => {
    expect(nameSchema.safeParse('Ada\r\nBcc: x@example.com').success).toBe(false);
  });
});

describe('roles', () => {
  it('recognises exactly the three roles', () => {
    expect([Role.Client, Role.Chef, Role.Staff].every(isRole)).toBe(true);
    expect(isRole('admin')).toBe(false);
  });
});
