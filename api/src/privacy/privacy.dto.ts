import { PASSWORD_MAX_LENGTH } from '@nappe/shared';
import { z } from 'zod';

/** `DELETE /api/me`: the current password, so a borrowed unlocked screen cannot erase an account. */
export const deleteAccountBodySchema = z.strictObject(
  {
    password: z
      .string({ error: 'Enter your current password to delete your account.' })
      .min(1, 'Enter your current password to delete your account.')
      .max(PASSWORD_MAX_LENGTH),
  },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? 'Send only your current password.' : undefined,
  },
);
export type DeleteAccountBody = z.output<typeof deleteAccountBodySchema>;
