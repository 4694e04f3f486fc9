import type { Response } from 'supertest';
import type { TestApp } from './test-app.js';

/** Small builders for kitchen request bodies. Values are test data, not reference values. */

export function ingredientBody(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name: 'Test ingredient',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 1000 },
    allergens: { contains: [], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
    ...overrides,
  };
}

export function recipeBody(
  lines: unknown[],
  overrides: Record<string, unknown> = {},
): Record<string, unknown> {
  return {
    name: 'Test recipe',
    lines,
    yieldG: 1000,
    steps: [],
    storage: 'chilled',
    shelfLifeHours: 48,
    ...overrides,
  };
}

export const ingredientLine = (ingredientId: string, quantity: number, unit = 'g') => ({
  kind: 'ingredient',
  ingredientId,
  quantity,
  unit,
});

export const subRecipeLine = (recipeId: string, quantity: number, unit = 'g') => ({
  kind: 'recipe',
  recipeId,
  quantity,
  unit,
});

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** POSTs as `token` and returns the created resource's id (expects 201). */
export async function create(
  t: TestApp,
  token: string,
  path: string,
  body: Record<string, unknown>,
): Promise<string> {
  const res: Response = await t.http.post(path).set(bearer(token)).send(body);
  if (res.status !== 201) {
    throw new Error(`POST ${path} answered ${res.status}: ${JSON.stringify(res.body)}`);
  }
  return (res.body as { id: string }).id;
}

/** Every key path of a JSON value: `items[].desserts[].name`. Array elements share one path. */
export function keyPaths(value: unknown, prefix = ''): string[] {
  const paths = new Set<string>();
  if (Array.isArray(value)) {
    for (const item of value) for (const p of keyPaths(item, `${prefix}[]`)) paths.add(p);
  } else if (typeof value === 'object' && value !== null) {
    for (const [key, child] of Object.entries(value)) {
      const path = prefix ? `${prefix}.${key}` : key;
      paths.add(path);
      for (const p of keyPaths(child, path)) paths.add(p);
    }
  }
  return [...paths].sort();
}
