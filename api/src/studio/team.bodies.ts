import { emailSchema, nameSchema, passwordSchema } from '@nappe/shared';
import { z } from 'zod';

const teamRole = z.enum(['staff', 'chef'], {
  error: 'The role is either staff or chef.',
});

export const invitationBodySchema = z
  .object({
    email: emailSchema.transform((e) => e.toLowerCase()),
    name: nameSchema,
    role: teamRole,
  })
  .strict();
export type InvitationBody = z.output<typeof invitationBodySchema>;

export const acceptInvitationBodySchema = z
  .object({
    token: z
      .string({ error: 'The invitation link is missing its token.' })
      .regex(/^[A-Za-z0-9_-]{43}$/, {
        message: 'This invitation link is not valid. Ask the chef for a new one.',
      }),
    name: nameSchema,
    password: passwordSchema,
  })
  .strict();
export type AcceptInvitationBody = z.output<typeof acceptInvitationBodySchema>;

export const roleChangeBodySchema = z.object({ role: teamRole }).strict();
export type RoleChangeBody = z.output<typeof roleChangeBodySchema>;

/** A pending invitation as the chef's team screen lists it (never the token or its hash). */
export interface InvitationView {
  id: string;
  email: string;
  name: string;
  role: 'staff' | 'chef';
  invitedBy: string;
  createdAt: string;
  expiresAt: string;
}

export interface TeamMemberView {
  id: string;
  email: string;
  name: string;
  role: 'staff' | 'chef';
}
