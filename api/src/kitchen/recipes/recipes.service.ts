import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import {
  computeMixBalance,
  costRecipe,
  expandDessertComponents,
  recipeIngredientLabel,
  rollUpRecipe,
  scaleRecipe,
  tidy,
  usContainsStatement,
  type AllergenReport,
  type ExpandedRecipe,
  type IngredientLabel,
  type MixBalance,
  type Page,
  type Recipe,
  type RecipeCost,
  type ScaleResult,
} from '@nappe/shared';
import { EntityManager, In } from 'typeorm';
import {
  assertWriteKeepsCatalogue,
  badRequest,
  inUseConflict,
  usersOf,
  type KitchenSubject,
} from '../catalogue/catalogue-checks.js';
import { recipeToRows } from '../catalogue/catalogue-rows.js';
import {
  computeView,
  KitchenCatalogueService,
  namesOf,
  notFound,
  pageByName,
  rethrowForeignKey,
  stillUsed,
  danglingReference,
  type LoadedCatalogue,
} from '../catalogue/kitchen-catalogue.service.js';
import type { RecipeBody } from '../dto/kitchen-bodies.js';
import type { KitchenListQuery, MixBalanceQuery, ScaleQuery } from '../dto/kitchen-queries.js';
import { IngredientEntity } from '../entities/ingredient.entity.js';
import { RecipeLineEntity } from '../entities/recipe-line.entity.js';
import { RecipeEntity } from '../entities/recipe.entity.js';
import { toRecipeResponse, type RecipeResponse } from './recipe.mapper.js';

export type ScaleBasis =
  | { mode: 'grams'; grams: number }
  | {
      mode: 'plates';
      plates: number;
      dessertId: string;
      dessertName: string;
      gramsPerPlate: number;
    };

export type ScaledRecipeView = ScaleResult & {
  recipeId: string;
  name: string;
  basis: ScaleBasis;
  /** Grams of the recipe made (unrounded total of the basis, tidied). */
  grams: number;
};

export type RecipeAllergenView = Omit<AllergenReport, 'occurrences'> & {
  label: IngredientLabel;
  usContainsStatement: string | null;
};

@Injectable()
export class RecipesService {
  constructor(private readonly kitchen: KitchenCatalogueService) {}

  // ---------------------------------------------------------------- reading

  private async responses(
    manager: EntityManager,
    rows: readonly RecipeEntity[],
  ): Promise<RecipeResponse[]> {
    if (rows.length === 0) return [];
    const lines = await manager.find(RecipeLineEntity, {
      where: { recipeId: In(rows.map((r) => r.id)) },
    });
    const ingredientNames = await namesOf(
      manager,
      IngredientEntity,
      lines.flatMap((l) => (l.ingredientId ? [l.ingredientId] : [])),
    );
    const recipeNames = await namesOf(
      manager,
      RecipeEntity,
      lines.flatMap((l) => (l.subRecipeId ? [l.subRecipeId] : [])),
    );
    const names = new Map([...ingredientNames, ...recipeNames]);
    return rows.map((row) =>
      toRecipeResponse(
        row,
        lines.filter((l) => l.recipeId === row.id),
        names,
      ),
    );
  }

  list(query: KitchenListQuery): Promise<Page<RecipeResponse>> {
    return this.kitchen.transaction(async (manager) => {
      const { rows, total } = await pageByName(
        manager.createQueryBuilder(RecipeEntity, 'r'),
        query,
      );
      return {
        items: await this.responses(manager, rows),
        total,
        page: query.page,
        pageSize: query.pageSize,
      };
    });
  }

  get(id: string): Promise<RecipeResponse> {
    return this.kitchen.transaction(async (manager) => {
      const row = await manager.findOneBy(RecipeEntity, { id });
      if (!row) throw notFound('recipe');
      const [response] = await this.responses(manager, [row]);
      return response!;
    });
  }

  // ---------------------------------------------------------------- writing

  create(body: RecipeBody): Promise<RecipeResponse> {
    return this.save(randomUUID(), body, 'create');
  }

  replace(id: string, body: RecipeBody): Promise<RecipeResponse> {
    return this.save(id, body, 'replace');
  }

  private save(id: string, body: RecipeBody, mode: 'create' | 'replace'): Promise<RecipeResponse> {
    return this.kitchen
      .transaction(async (manager) => {
        const { catalogue, rows } = await this.kitchen.load(manager);
        if (mode === 'replace' && !rows.recipes.has(id)) throw notFound('recipe');
        const recipe: Recipe = { ...body, id };
        const others = catalogue.recipes.filter((r) => r.id !== id);
        assertWriteKeepsCatalogue(
          catalogue,
          { ...catalogue, recipes: [...others, recipe] },
          { kind: 'recipe', id, name: recipe.name },
        );
        const written = recipeToRows(recipe);
        if (mode === 'create') {
          await manager.insert(RecipeEntity, written.recipe);
        } else {
          await manager.update(RecipeEntity, { id }, written.recipe);
          await manager.delete(RecipeLineEntity, { recipeId: id });
        }
        await manager.insert(RecipeLineEntity, written.lines);
        const [response] = await this.responses(manager, [
          await manager.findOneByOrFail(RecipeEntity, { id }),
        ]);
        return response!;
      })
      .catch((e: unknown) => rethrowForeignKey(e, danglingReference(body.name)));
  }

  remove(id: string): Promise<void> {
    return this.kitchen.transaction(async (manager) => {
      const { catalogue, rows } = await this.kitchen.load(manager);
      const row = rows.recipes.get(id);
      if (!row) throw notFound('recipe');
      const subject: KitchenSubject = { kind: 'recipe', id, name: row.name };
      const users = usersOf(catalogue, subject);
      if (users.length > 0) throw inUseConflict(subject, users);
      await manager
        .delete(RecipeEntity, { id })
        .catch((e: unknown) => rethrowForeignKey(e, stillUsed(row.name)));
    });
  }

  // ---------------------------------------------------------------- computed views

  private async loadWith(id: string): Promise<LoadedCatalogue> {
    const loaded = await this.kitchen.load();
    if (!loaded.rows.recipes.has(id)) throw notFound('recipe');
    return loaded;
  }

  /**
   * The recipe scaled to `grams`, or to what `plates` of a dessert need of it (as a component or
   * inside one): every ingredient in grams and in its purchase unit, sub-recipes expanded,
   * counted items rounded up to whole pieces (DESIGN.md §2, computed by the shared scaling).
   */
  async scaled(id: string, query: ScaleQuery): Promise<ScaledRecipeView> {
    const byGrams = query.grams !== undefined;
    const byPlates = query.plates !== undefined || query.dessertId !== undefined;
    if (byGrams === byPlates) {
      throw badRequest(['Ask for either grams=N, or plates=N with dessertId=… — not both.']);
    }
    if (byPlates && (query.plates === undefined || query.dessertId === undefined)) {
      throw badRequest(['Scaling by plates needs both plates=N and dessertId=….']);
    }
    const { index, catalogue } = await this.loadWith(id);
    const recipe = index.recipe(id);
    let basis: ScaleBasis;
    let grams: number;
    if (query.grams !== undefined) {
      grams = query.grams;
      basis = { mode: 'grams', grams };
    } else {
      const dessert = catalogue.desserts.find((d) => d.id === query.dessertId);
      if (!dessert) throw badRequest([`There is no dessert with id ${query.dessertId}.`]);
      const trees = computeView(() => expandDessertComponents(index, dessert));
      let perPlate = 0;
      const visit = (node: ExpandedRecipe): void => {
        if (node.recipe.id === id) {
          perPlate += node.grams;
          return;
        }
        for (const line of node.lines) if (line.kind === 'recipe') visit(line.node);
      };
      trees.forEach(visit);
      if (perPlate === 0) {
        throw badRequest([`“${dessert.name}” does not use “${recipe.name}”.`]);
      }
      const plates = query.plates!;
      grams = perPlate * plates;
      basis = {
        mode: 'plates',
        plates,
        dessertId: dessert.id,
        dessertName: dessert.name,
        gramsPerPlate: tidy(perPlate, 3),
      };
    }
    const result = computeView(() => scaleRecipe(index, id, grams));
    return { recipeId: id, name: recipe.name, basis, grams: tidy(grams, 3), ...result };
  }

  /** Allergen roll-up of one batch through every sub-recipe, EU and US, with the label text. */
  async allergens(id: string): Promise<RecipeAllergenView> {
    const { index } = await this.loadWith(id);
    return computeView(() => {
      const report = rollUpRecipe(index, id);
      const { occurrences: _occurrences, ...view } = report;
      return {
        ...view,
        label: recipeIngredientLabel(index, id),
        usContainsStatement: usContainsStatement(report),
      };
    });
  }

  /** Cost per batch and per kg, line by line (chef only). */
  async cost(id: string): Promise<RecipeCost> {
    const { index } = await this.loadWith(id);
    return computeView(() => costRecipe(index, id));
  }

  /** Mix balance and the 21 CFR 135.110 class, for frozen recipes. */
  async mixBalance(id: string, query: MixBalanceQuery): Promise<MixBalance> {
    const { index } = await this.loadWith(id);
    const recipe = index.recipe(id);
    if (recipe.storage !== 'frozen') {
      throw badRequest([
        `Mix balance is for frozen recipes; “${recipe.name}” is stored ${recipe.storage}.`,
      ]);
    }
    return computeView(() =>
      computeMixBalance(index, id, {
        ...(query.overrunPercent !== undefined ? { overrunPercent: query.overrunPercent } : {}),
        ...(query.bulkyFlavours !== undefined ? { bulkyFlavours: query.bulkyFlavours } : {}),
      }),
    );
  }
}
