/** Query keys of the kitchen feature; never write these arrays inline. */

function entityKeys<const E extends string>(entity: E) {
  const all = ['kitchen', entity] as const;
  return {
    all,
    lists: () => [...all, 'list'] as const,
    list: () => [...all, 'list', 'all'] as const,
    details: () => [...all, 'detail'] as const,
    detail: (id: string) => [...all, 'detail', id] as const,
  };
}

export const kitchenKeys = {
  all: ['kitchen'] as const,
  ingredients: entityKeys('ingredients'),
  recipes: {
    ...entityKeys('recipes'),
    scaled: (id: string, basis: ScaleQuery) =>
      [...entityKeys('recipes').detail(id), 'scaled', basis] as const,
  },
  desserts: entityKeys('desserts'),
  menus: {
    ...entityKeys('menus'),
    costing: (id: string, targetPercent: number) =>
      [...entityKeys('menus').detail(id), 'costing', targetPercent] as const,
  },
};

export type ScaleQuery = { grams: number } | { plates: number; dessertId: string };
