import { z } from 'zod';

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Paths of keys present in `input` that are missing from `output`. zod drops keys an object
 * schema does not know; comparing what came in with what came out finds them at any depth,
 * whatever the schema is built from (unions, refinements, records).
 */
export function droppedKeys(
  input: unknown,
  output: unknown,
  path: readonly PropertyKey[] = [],
): PropertyKey[][] {
  if (Array.isArray(input) && Array.isArray(output)) {
    return input.flatMap((item: unknown, i) =>
      i < output.length ? droppedKeys(item, output[i], [...path, i]) : [],
    );
  }
  if (isPlainObject(input) && isPlainObject(output)) {
    return Object.keys(input).flatMap((key) =>
      Object.hasOwn(output, key)
        ? droppedKeys(input[key], output[key], [...path, key])
        : [[...path, key]],
    );
  }
  return [];
}

/**
 * A request body made from a domain schema of `@nappe/shared`, without re-stating any of its
 * rules:
 * - fields the server owns (`id`, `photos`…) must not be sent; they are filled with placeholders
 *   only so the domain schema's own checks run, and dropped from the result;
 * - any key the schema does not know, at any depth, is refused rather than silently dropped
 *   (OWASP API Security Top 10 2023 API3, mass assignment) — the message names each one.
 * The shared schemas carry refinements, which zod 4 does not allow `.omit()` on; this wrapper
 * is how one schema per request shape is kept without copying them.
 */
export function requestBody<T extends Record<string, unknown>, K extends keyof T & string>(
  schema: z.ZodType<T>,
  serverOwned: { [P in K]: T[P] },
) {
  const owned = Object.keys(serverOwned) as K[];
  return z.unknown().transform((input, ctx): Omit<T, K> => {
    if (!isPlainObject(input)) {
      ctx.addIssue({ code: 'custom', message: 'Send a JSON object.', input });
      return z.NEVER;
    }
    let refused = false;
    for (const key of owned) {
      if (Object.hasOwn(input, key)) {
        refused = true;
        ctx.addIssue({
          code: 'custom',
          path: [key],
          message: `“${key}” is set by the server; leave it out.`,
          input,
        });
      }
    }
    const candidate: Record<string, unknown> = { ...input, ...serverOwned };
    const result = schema.safeParse(candidate);
    if (!result.success) {
      for (const issue of result.error.issues) {
        ctx.addIssue({ code: 'custom', path: [...issue.path], message: issue.message, input });
      }
      return z.NEVER;
    }
    for (const path of droppedKeys(candidate, result.data)) {
      refused = true;
      ctx.addIssue({
        code: 'custom',
        path: [...path],
        message: `Unknown field “${String(path[path.length - 1])}”: it is not accepted.`,
        input,
      });
    }
    if (refused) return z.NEVER;
    const output: Record<string, unknown> = { ...result.data };
    for (const key of owned) delete output[key];
    return output as Omit<T, K>;
  });
}
