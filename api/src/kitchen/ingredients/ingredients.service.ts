import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { Role, type Ingredient, type Page } from '@nappe/shared';
import {
  assertWriteKeepsCatalogue,
  inUseConflict,
  usersOf,
  type KitchenSubject,
} from '../catalogue/catalogue-checks.js';
import { ingredientToRow } from '../catalogue/catalogue-rows.js';
import {
  KitchenCatalogueService,
  notFound,
  pageByName,
  rethrowForeignKey,
  stillUsed,
  danglingReference,
} from '../catalogue/kitchen-catalogue.service.js';
import type { IngredientBody } from '../dto/kitchen-bodies.js';
import type { KitchenListQuery } from '../dto/kitchen-queries.js';
import { IngredientEntity } from '../entities/ingredient.entity.js';
import { toIngredientResponse, type IngredientResponse } from './ingredient.mapper.js';

@Injectable()
export class IngredientsService {
  constructor(private readonly kitchen: KitchenCatalogueService) {}

  list(query: KitchenListQuery, viewer: Role): Promise<Page<IngredientResponse>> {
    return this.kitchen.transaction(async (manager) => {
      const { rows, total } = await pageByName(
        manager.createQueryBuilder(IngredientEntity, 'i'),
        query,
      );
      return {
        items: rows.map((row) => toIngredientResponse(row, viewer)),
        total,
        page: query.page,
        pageSize: query.pageSize,
      };
    });
  }

  async get(id: string, viewer: Role): Promise<IngredientResponse> {
    const row = await this.kitchen.transaction((m) => m.findOneBy(IngredientEntity, { id }));
    if (!row) throw notFound('ingredient');
    return toIngredientResponse(row, viewer);
  }

  create(body: IngredientBody): Promise<IngredientResponse> {
    return this.save(randomUUID(), body, 'create');
  }

  replace(id: string, body: IngredientBody): Promise<IngredientResponse> {
    return this.save(id, body, 'replace');
  }

  private save(
    id: string,
    body: IngredientBody,
    mode: 'create' | 'replace',
  ): Promise<IngredientResponse> {
    return this.kitchen
      .transaction(async (manager) => {
        const { catalogue, rows } = await this.kitchen.load(manager);
        if (mode === 'replace' && !rows.ingredients.has(id)) throw notFound('ingredient');
        const ingredient: Ingredient = { ...body, id };
        const others = catalogue.ingredients.filter((i) => i.id !== id);
        assertWriteKeepsCatalogue(
          catalogue,
          { ...catalogue, ingredients: [...others, ingredient] },
          { kind: 'ingredient', id, name: ingredient.name },
        );
        if (mode === 'create') await manager.insert(IngredientEntity, ingredientToRow(ingredient));
        else await manager.update(IngredientEntity, { id }, ingredientToRow(ingredient));
        return toIngredientResponse(
          await manager.findOneByOrFail(IngredientEntity, { id }),
          Role.Chef,
        );
      })
      .catch((e: unknown) => rethrowForeignKey(e, danglingReference(body.name)));
  }

  remove(id: string): Promise<void> {
    return this.kitchen.transaction(async (manager) => {
      const { catalogue, rows } = await this.kitchen.load(manager);
      const row = rows.ingredients.get(id);
      if (!row) throw notFound('ingredient');
      const subject: KitchenSubject = { kind: 'ingredient', id, name: row.name };
      const users = usersOf(catalogue, subject);
      if (users.length > 0) throw inUseConflict(subject, users);
      await manager
        .delete(IngredientEntity, { id })
        .catch((e: unknown) => rethrowForeignKey(e, stillUsed(row.name)));
    });
  }
}
