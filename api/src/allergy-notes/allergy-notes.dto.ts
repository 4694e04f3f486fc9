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

/** GET /allergy-notes/counts?orderIds=a,b,c — the orders of a list screen, at most 100. */
export const allergyCountsQuerySchema = z
  .string({ error: 'Give the orders to count as orderIds=id1,id2,…' })
  .transform((raw) => [...new Set(raw.split(',').map((id) => id.trim()))].filter((id) => id !== ''))
  .pipe(
    z
      .array(z.string().max(64, 'An order id has at most 64 characters.'))
      .min(1, 'Give at least one order id.')
      .max(100, 'Ask for at most 100 orders at once.'),
  );

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
