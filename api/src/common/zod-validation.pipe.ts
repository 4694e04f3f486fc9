import { BadRequestException, type PipeTransform } from '@nestjs/common';
import type { z } from 'zod';

/** `lines[0].quantity` from zod's `['lines', 0, 'quantity']`. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  return path
    .map((key, i) => (typeof key === 'number' ? `[${key}]` : `${i === 0 ? '' : '.'}${String(key)}`))
    .join('');
}

/** One readable line per problem: the field, then the message the schema gives (written for chefs). */
export function formatIssues(issues: readonly z.core.$ZodIssue[]): string[] {
  const lines = issues.map((issue) => {
    const where = formatIssuePath(issue.path);
    return where ? `${where}: ${issue.message}` : issue.message;
  });
  return [...new Set(lines)];
}

/**
 * Validates a request part with a zod schema (the global class-validator pipe ignores types that
 * are not classes). Use per route: `@Body(new ZodValidationPipe(schema)) body: z.infer<typeof schema>`.
 * A failure is a 400 in Nest's own shape: `{ statusCode, message: string[], error }`.
 */
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.output<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.output<S> {
    const result = this.schema.safeParse(value);
    if (result.success) return result.data;
    throw new BadRequestException({
      statusCode: 400,
      message: formatIssues(result.error.issues),
      error: 'Bad Request',
    });
  }
}
