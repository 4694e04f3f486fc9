import { z } from 'zod';
import { Role } from './roles.js';

/**
 * Password rules (OWASP ASVS 5.0 V6.2): at least 12 characters, any Unicode allowed,
 * never truncated. The upper bound only guards the hashing cost.
 */
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 256;
export const NAME_MAX_LENGTH = 120;
export const EMAIL_MAX_LENGTH = 254; // RFC 5321 path limit

/** Counts Unicode code points, not UTF-16 units, so "12 characters" means what a person sees. */
export function passwordLength(password: string): number {
  return [...password].length;
}

export const emailSchema = z
  .string()
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(EMAIL_MAX_LENGTH, 'That e-mail address is too long.')
  .email('Enter an e-mail address like name@example.com.');

export const passwordSchema = z
  .string()
  .refine((p) => passwordLength(p) >= PASSWORD_MIN_LENGTH, {
    message: `Use at least ${PASSWORD_MIN_LENGTH} characters — a few words make a good passphrase.`,
  })
  .refine((p) => passwordLength(p) <= PASSWORD_MAX_LENGTH, {
    message: `Use at most ${PASSWORD_MAX_LENGTH} characters.`,
  });

export const nameSchema = z
  .string()
  .trim()
  .min(1, 'Tell us your name.')
  .max(NAME_MAX_LENGTH, `Keep the name under ${NAME_MAX_LENGTH} characters.`)
  .refine((n) => !/[\r\n]/.test(n), { message: 'The name must fit on one line.' });

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(PASSWORD_MAX_LENGTH),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const registerSchema = z.object({
  name: nameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type RegisterInput = z.infer<typeof registerSchema>;

/** What `GET /api/auth/me` returns, and what sign-in returns as `user`. */
export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

/** Body of a successful sign-in, sign-up or refresh. The refresh token travels in an HttpOnly cookie. */
export interface AuthSession {
  accessToken: string;
  tokenType: 'Bearer';
  /** Seconds until the access token expires. */
  expiresIn: number;
  user: AuthUser;
}

/** The error body every API error uses (Nest's shape). `message` may be a list for validation errors. */
export interface ApiErrorBody {
  statusCode: number;
  message: string | string[];
  error?: string;
}
