import { BadRequestException } from '@nestjs/common';
import { menuSchema, recipeSchema } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { droppedKeys, requestBody } from './request-body.js';
import { formatIssuePath, ZodValidationPipe } from './zod-validation.pipe.js';

const messages = (pipe: ZodValidationPipe<z.ZodType>, value: unknown): string[] => {
  try {
    pipe.transform(value);
  } catch (error) {
    if (error instanceof BadRequestException) {
      const body = error.getResponse() as { statusCode: number; message: string[]; error: string };
      expect(body.statusCode).toBe(400);
      expect(body.error).toBe('Bad Request');
      return body.message;
    }
    throw error;
  }
  return [];
};

describe('droppedKeys', () => {
  it('finds keys zod dropped at any depth, in arrays and union members', () => {
    const schema = z.object({
      a: z.string(),
      list: z.array(
        z.discriminatedUnion('kind', [
          z.object({ kind: z.literal('x'), x: z.number() }),
          z.object({ kind: z.literal('y'), y: z.number() }),
        ]),
      ),
    });
    const input = {
      a: 'ok',
      extra: 1,
      list: [
        { kind: 'x', x: 1, y: 2 },
        { kind: 'y', y: 3 },
      ],
    };
    expect(droppedKeys(input, schema.parse(input))).toEqual([['extra'], ['list', 0, 'y']]);
  });

  it('finds nothing when everything was known, defaults added or not', () => {
    const schema = z.object({ a: z.string(), b: z.array(z.string()).default([]) });
    expect(droppedKeys({ a: 'x' }, schema.parse({ a: 'x' }))).toEqual([]);
  });
});

describe('requestBody over a shared schema', () => {
  const menu = {
    name: 'Spring',
    dessertIds: ['d1'],
    pricePerGuestMinor: 900,
    minGuests: 2,
    maxGuests: 10,
    leadDays: 1,
    active: true,
  };
  const pipe = new ZodValidationPipe(requestBody(menuSchema, { id: 'placeholder' }));

  it('returns the body without the server-owned id, keeping the schema’s refinements', () => {
    expect(pipe.transform(menu)).toEqual(menu);
    expect(messages(pipe, { ...menu, minGuests: 20 })).toEqual([
      'maxGuests: The maximum number of guests must be at least the minimum.',
    ]);
  });

  it('refuses the server-owned id and unknown fields together with the schema’s own problems', () => {
    expect(messages(pipe, { ...menu, id: 'mine', total: 5, leadDays: -1 })).toEqual([
      'id: “id” is set by the server; leave it out.',
      'leadDays: Too small: expected number to be >=0',
    ]);
    expect(messages(pipe, { ...menu, id: 'mine', total: 5 })).toEqual([
      'id: “id” is set by the server; leave it out.',
      'total: Unknown field “total”: it is not accepted.',
    ]);
  });

  it('refuses something that is not an object', () => {
    for (const value of [null, [menu], 'menu', 3]) {
      expect(messages(pipe, value)).toEqual(['Send a JSON object.']);
    }
  });

  it('refuses nested unknown fields with their path', () => {
    const recipes = new ZodValidationPipe(requestBody(recipeSchema, { id: 'placeholder' }));
    const body = {
      name: 'R',
      lines: [{ kind: 'ingredient', ingredientId: 'i', quantity: 1, unit: 'g', priceMinor: 2 }],
      yieldG: 1,
      storage: 'dry',
      shelfLifeHours: 1,
      equipment: { name: 'Bowl', batchCapacityG: 10, owner: 'x' },
    };
    expect(messages(recipes, body)).toEqual([
      'lines[0].priceMinor: Unknown field “priceMinor”: it is not accepted.',
      'equipment.owner: Unknown field “owner”: it is not accepted.',
    ]);
  });
});

describe('formatIssuePath', () => {
  it('writes indexes in brackets and keys with dots', () => {
    expect(formatIssuePath(['lines', 0, 'quantity'])).toBe('lines[0].quantity');
    expect(formatIssuePath([])).toBe('');
  });
});
