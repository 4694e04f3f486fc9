import { BadRequestException, ConflictException } from '@nestjs/common';
import {
  createKitchenIndex,
  findCatalogueProblems,
  findRecipeCycle,
  isKitchenError,
  RecipeCycleError,
  type CatalogueProblem,
  type KitchenCatalogue,
  type KitchenEntityKind,
} from '@nappe/shared';

/**
 * The rules a write must keep, decided by the shared computation (never re-stated here):
 * no recipe loop, every reference resolves, every quantity turns into grams, every pack can be
 * priced. A problem with the thing being written is the request's fault (400); a problem the write
 * would cause elsewhere (an ingredient losing the density a recipe needs) is a conflict (409).
 */

export interface KitchenSubject {
  kind: KitchenEntityKind;
  id: string;
  name: string;
}

export interface KitchenUser {
  kind: 'recipe' | 'dessert' | 'menu';
  id: string;
  name: string;
}

export function badRequest(messages: readonly string[]): BadRequestException {
  return new BadRequestException({
    statusCode: 400,
    message: [...new Set(messages)],
    error: 'Bad Request',
  });
}

const problemKey = (p: CatalogueProblem) => `${p.kind}|${p.id}|${p.message}`;

/**
 * `findCatalogueProblems` resolves a dessert component's recipe only when it needs the recipe's
 * piece weight; a component by grams pointing at a missing recipe slips through. The index's own
 * look-up (and its UnknownReferenceError message) closes that gap.
 */
function dessertReferenceProblems(catalogue: KitchenCatalogue): CatalogueProblem[] {
  const index = createKitchenIndex(catalogue);
  const problems: CatalogueProblem[] = [];
  for (const dessert of catalogue.desserts) {
    for (const component of dessert.components) {
      try {
        index.recipe(component.recipeId, dessert.name);
      } catch (error) {
        if (!isKitchenError(error)) throw error;
        problems.push({ kind: 'dessert', id: dessert.id, message: error.message });
      }
    }
  }
  return problems;
}

/** Every problem the computation would meet in `catalogue`. */
export function catalogueProblems(catalogue: KitchenCatalogue): CatalogueProblem[] {
  const seen = new Set<string>();
  return [...findCatalogueProblems(catalogue), ...dessertReferenceProblems(catalogue)].filter(
    (p) => !seen.has(problemKey(p)) && seen.add(problemKey(p)),
  );
}

function nameOf(catalogue: KitchenCatalogue, kind: CatalogueProblem['kind'], id: string): string {
  const list =
    kind === 'ingredient'
      ? catalogue.ingredients
      : kind === 'recipe'
        ? catalogue.recipes
        : kind === 'dessert'
          ? catalogue.desserts
          : kind === 'menu'
            ? catalogue.menus
            : [];
  return list.find((item) => item.id === id)?.name ?? id;
}

/**
 * Throws when `after` (the catalogue with the write applied) breaks a rule that `before` kept.
 * Problems that already existed are not blamed on this write.
 */
export function assertWriteKeepsCatalogue(
  before: KitchenCatalogue,
  after: KitchenCatalogue,
  subject: KitchenSubject,
): void {
  if (!findRecipeCycle(before.recipes)) {
    const cycle = findRecipeCycle(after.recipes);
    if (cycle) throw badRequest([new RecipeCycleError(cycle.names, cycle.ids).message]);
  }
  const known = new Set(catalogueProblems(before).map(problemKey));
  const fresh = catalogueProblems(after).filter((p) => !known.has(problemKey(p)));
  const own = fresh.filter((p) => p.kind === subject.kind && p.id === subject.id);
  if (own.length > 0) throw badRequest(own.map((p) => p.message));
  if (fresh.length > 0) {
    const broken = fresh.map((p) => `the ${p.kind} “${nameOf(after, p.kind, p.id)}”: ${p.message}`);
    throw new ConflictException({
      statusCode: 409,
      message: `Saving “${subject.name}” would break ${[...new Set(broken)].join(' Also ')}`,
      error: 'Conflict',
    });
  }
}

const USER_ORDER: Record<KitchenUser['kind'], number> = { recipe: 0, dessert: 1, menu: 2 };

/** What uses `subjectId` in the catalogue, as named rows, recipes first, then by name. */
export function usersOf(catalogue: KitchenCatalogue, subject: KitchenSubject): KitchenUser[] {
  const users: KitchenUser[] = [];
  if (subject.kind === 'ingredient' || subject.kind === 'recipe') {
    for (const recipe of catalogue.recipes) {
      const uses = recipe.lines.some((line) =>
        subject.kind === 'ingredient'
          ? line.kind === 'ingredient' && line.ingredientId === subject.id
          : line.kind === 'recipe' && line.recipeId === subject.id,
      );
      if (uses) users.push({ kind: 'recipe', id: recipe.id, name: recipe.name });
    }
  }
  if (subject.kind === 'recipe') {
    for (const dessert of catalogue.desserts) {
      if (dessert.components.some((c) => c.recipeId === subject.id)) {
        users.push({ kind: 'dessert', id: dessert.id, name: dessert.name });
      }
    }
  }
  if (subject.kind === 'dessert') {
    for (const menu of catalogue.menus) {
      if (menu.dessertIds.includes(subject.id)) {
        users.push({ kind: 'menu', id: menu.id, name: menu.name });
      }
    }
  }
  return users.sort(
    (a, b) => USER_ORDER[a.kind] - USER_ORDER[b.kind] || a.name.localeCompare(b.name),
  );
}

/** “Butter” cannot be deleted: used by the recipe “Hazelnut sponge” and 2 more. */
export function inUseMessage(subjectName: string, users: readonly KitchenUser[]): string {
  const [first, ...rest] = users;
  if (!first) return `“${subjectName}” is not used anywhere.`;
  const more = rest.length > 0 ? ` and ${rest.length} more` : '';
  return `“${subjectName}” cannot be deleted: used by the ${first.kind} “${first.name}”${more}. Remove it from ${users.length === 1 ? 'there' : 'them'} first.`;
}

/** 409 for deleting something still in use, naming what uses it; `usedBy` lists every user. */
export function inUseConflict(subject: KitchenSubject, users: readonly KitchenUser[]) {
  return new ConflictException({
    statusCode: 409,
    message: inUseMessage(subject.name, users),
    error: 'Conflict',
    usedBy: users,
  });
}
