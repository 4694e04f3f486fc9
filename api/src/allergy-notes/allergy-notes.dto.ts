import { kitchenIdSchema, orderReasonSchema } from '@nappe/shared';
import { z } from 'zod';

/** PUT …/substitutions/:dessertId — components to leave out, components to replace, a note. */
export const substitutionBodySchema = z
  .strictObject({
    leaveOut: z.array(kitchenIdSchema).max(10).default([]),
    replace: z
      .array(
        z.strictObject({
          componentRecipeId: kitchenIdSchema,
          replacementRecipeId: kitchenIdSchema,
        }),
      )
      .max(10)
      .default([]),
    note: z.string().trim().max(500).optional(),
  })
  .refine((b) => b.leaveOut.length + b.replace.length > 0 || (b.note ?? '') !== '', {
    message: 'Say what changes: a component to leave out, one to replace, or a note.',
  });
export type SubstitutionBody = z.output<typeof substitutionBodySchema>;

/** POST /orders/:id/confirm — the reason, and the chef's reason for confirming despite a warning. */
export const confirmBodySchema = orderReasonSchema.extend({
  overrideReason: z
    .string()
    .trim()
    .min(5, 'Give the reason for confirming anyway in a few words.')
    .max(480)
    .optional(),
});
export type ConfirmBody = z.output<typeof confirmBodySchema>;
