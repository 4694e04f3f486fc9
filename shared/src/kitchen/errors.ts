/**
 * Errors a chef may see from the kitchen computation. Each has a stable `code` the API maps to
 * an HTTP status (400 for bad input, 409 for a conflict in the catalogue) and a message written
 * for the person at the bench, not for a developer.
 */
export abstract class KitchenError extends Error {
  abstract readonly code: string;

  constructor(message: string) {
    super(message);
    this.name = new.target.name;
  }
}

export function isKitchenError(value: unknown): value is KitchenError {
  return value instanceof KitchenError;
}

/** A quantity cannot be turned into grams because the ingredient lacks a density or a unit weight. */
export class MissingConversionError extends KitchenError {
  readonly code = 'missing_conversion';

  constructor(
    readonly itemId: string,
    readonly itemName: string,
    readonly unit: string,
    readonly needs: 'density' | 'unit_weight',
  ) {
    super(
      needs === 'density'
        ? `“${itemName}” has no density (g per ml), so a quantity in ${unit} cannot be turned into grams. Add its density or write the quantity by weight.`
        : `“${itemName}” has no weight per piece, so a quantity in ${unit} cannot be turned into grams. Add the weight of one piece or write the quantity by weight.`,
    );
  }
}

/** A number that cannot be a quantity, price, yield or percentage. */
export class InvalidQuantityError extends KitchenError {
  readonly code = 'invalid_quantity';

  constructor(
    readonly what: string,
    readonly value: number,
    readonly expectation: string,
  ) {
    super(`${what} must be ${expectation}; got ${String(value)}.`);
  }
}

export type KitchenEntityKind = 'ingredient' | 'recipe' | 'dessert' | 'menu';

/** A line, component or menu entry points at something that does not exist. */
export class UnknownReferenceError extends KitchenError {
  readonly code = 'unknown_reference';

  constructor(
    readonly kind: KitchenEntityKind,
    readonly id: string,
    readonly referencedFrom?: string,
  ) {
    super(
      referencedFrom
        ? `“${referencedFrom}” uses ${kind === 'ingredient' ? 'an' : 'a'} ${kind} that no longer exists (id ${id}). Remove that line or pick another ${kind}.`
        : `There is no ${kind} with id ${id}.`,
    );
  }
}

/** A recipe contains itself through its sub-recipes. `loop` names the recipes, first = last. */
export class RecipeCycleError extends KitchenError {
  readonly code = 'recipe_cycle';

  constructor(
    readonly loop: readonly string[],
    readonly loopIds: readonly string[],
  ) {
    super(
      `These recipes use each other in a loop: ${loop.join(' → ')}. Remove one of the sub-recipe lines to break it.`,
    );
  }
}

/** Mix balance needs the composition of every ingredient in a frozen recipe. */
export class MissingCompositionError extends KitchenError {
  readonly code = 'missing_composition';

  constructor(
    readonly ingredientId: string,
    readonly ingredientName: string,
    readonly recipeName: string,
  ) {
    super(
      `“${ingredientName}” in “${recipeName}” has no composition per 100 g (water, fat, milk solids, sugars), so the mix balance cannot be worked out. Add its composition.`,
    );
  }
}

/** A composition whose parts add up to more than 100 g per 100 g, or a negative part. */
export class InvalidCompositionError extends KitchenError {
  readonly code = 'invalid_composition';

  constructor(
    readonly ingredientName: string,
    detail: string,
  ) {
    super(`The composition of “${ingredientName}” does not add up: ${detail}`);
  }
}

/** A substitution that names a component the dessert does not have. */
export class InvalidSubstitutionError extends KitchenError {
  readonly code = 'invalid_substitution';

  constructor(
    readonly dessertName: string,
    readonly recipeId: string,
  ) {
    super(
      `“${dessertName}” has no component with recipe id ${recipeId}, so it cannot be left out or replaced.`,
    );
  }
}
