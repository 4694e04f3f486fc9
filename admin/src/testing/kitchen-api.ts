import {
  costMenu,
  createKitchenIndex,
  expandDessertComponents,
  findRecipeCycle,
  isKitchenError,
  RecipeCycleError,
  scaleRecipe,
  suggestMenuPrice,
  tidy,
  type Dessert,
  type ExpandedRecipe,
  type Ingredient,
  type KitchenCatalogue,
  type Menu,
  type Recipe,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import {
  DESSERTS,
  INGREDIENTS,
  MENUS,
  RECIPES,
  dessertResponse,
  ingredientResponse,
  menuResponse,
  recipeResponse,
} from './kitchen-fixtures';

/**
 * A stand-in for the kitchen API over the fixture catalogue, for route tests. Its computed
 * views call the same shared functions the API's services call (api/src/kitchen/**), so what
 * the screens show is what the real server would answer; writes are recorded for the tests.
 */
export interface KitchenApiState {
  catalogue: KitchenCatalogue;
  requests: Array<{ method: string; path: string; body?: unknown }>;
}

const clone = <T>(value: T): T => structuredClone(value);

export function createKitchenApi(options: { chef: boolean } = { chef: true }) {
  const state: KitchenApiState = {
    catalogue: {
      currency: 'EUR',
      ingredients: clone(INGREDIENTS),
      recipes: clone(RECIPES),
      desserts: clone(DESSERTS),
      menus: clone(MENUS),
    },
    requests: [],
  };
  const names = () =>
    new Map<string, string>(
      [
        ...state.catalogue.ingredients,
        ...state.catalogue.recipes,
        ...state.catalogue.desserts,
        ...state.catalogue.menus,
      ].map((x) => [x.id, x.name]),
    );
  const page = <T>(items: readonly T[], url: URL) => {
    const p = Number(url.searchParams.get('page') ?? 1);
    const size = Number(url.searchParams.get('pageSize') ?? 20);
    const q = (url.searchParams.get('q') ?? '').toLowerCase();
    const matching = items.filter((i) => (i as { name: string }).name.toLowerCase().includes(q));
    return {
      items: matching.slice((p - 1) * size, p * size),
      total: matching.length,
      page: p,
      pageSize: size,
    };
  };
  const notFound = (what: string) =>
    HttpResponse.json(
      { statusCode: 404, message: `There is no ${what} with that id.` },
      { status: 404 },
    );
  const bad = (message: string[]) =>
    HttpResponse.json({ statusCode: 400, message, error: 'Bad Request' }, { status: 400 });
  const index = () => createKitchenIndex(state.catalogue);
  const record = async (request: Request, path: string) => {
    const body =
      request.method === 'GET' || request.method === 'DELETE'
        ? undefined
        : await request
            .clone()
            .json()
            .catch(() => undefined);
    state.requests.push({ method: request.method, path, ...(body !== undefined ? { body } : {}) });
    return body;
  };

  /** As inUseMessage in api/src/kitchen/catalogue/catalogue-checks.ts. */
  const usersOf = (kind: 'ingredient' | 'recipe' | 'dessert', id: string) => {
    const c = state.catalogue;
    const users: Array<{ kind: string; name: string }> = [];
    if (kind !== 'dessert') {
      for (const r of c.recipes) {
        const uses = r.lines.some((l) =>
          kind === 'ingredient'
            ? l.kind === 'ingredient' && l.ingredientId === id
            : l.kind === 'recipe' && l.recipeId === id,
        );
        if (uses) users.push({ kind: 'recipe', name: r.name });
      }
    }
    if (kind === 'recipe') {
      for (const d of c.desserts) {
        if (d.components.some((x) => x.recipeId === id))
          users.push({ kind: 'dessert', name: d.name });
      }
    }
    if (kind === 'dessert') {
      for (const m of c.menus)
        if (m.dessertIds.includes(id)) users.push({ kind: 'menu', name: m.name });
    }
    return users.sort((a, b) => a.name.localeCompare(b.name));
  };
  const inUse = (name: string, users: Array<{ kind: string; name: string }>) => {
    const [first, ...rest] = users;
    const more = rest.length > 0 ? ` and ${rest.length} more` : '';
    return HttpResponse.json(
      {
        statusCode: 409,
        message: `“${name}” cannot be deleted: used by the ${first!.kind} “${first!.name}”${more}. Remove it from ${users.length === 1 ? 'there' : 'them'} first.`,
        error: 'Conflict',
      },
      { status: 409 },
    );
  };
  const remover =
    <K extends 'ingredients' | 'recipes' | 'desserts' | 'menus'>(
      list: K,
      kind: 'ingredient' | 'recipe' | 'dessert' | 'menu',
    ) =>
    async ({ request, params }: { request: Request; params: Record<string, unknown> }) => {
      await record(request, `/api/${list}/${String(params.id)}`);
      const items = state.catalogue[list] as ReadonlyArray<{ id: string; name: string }>;
      const found = items.find((x) => x.id === params.id);
      if (!found) return notFound(kind);
      if (kind !== 'menu') {
        const users = usersOf(kind, found.id);
        if (users.length > 0) return inUse(found.name, users);
      }
      state.catalogue = { ...state.catalogue, [list]: items.filter((x) => x.id !== found.id) };
      return new HttpResponse(null, { status: 204 });
    };

  const handlers = [
    http.delete('/api/ingredients/:id', remover('ingredients', 'ingredient')),
    http.delete('/api/recipes/:id', remover('recipes', 'recipe')),
    http.delete('/api/desserts/:id', remover('desserts', 'dessert')),
    http.delete('/api/menus/:id', remover('menus', 'menu')),
    http.get('/api/ingredients', ({ request }) =>
      HttpResponse.json(
        page(
          state.catalogue.ingredients.map((i) => ingredientResponse(i, options.chef)),
          new URL(request.url),
        ),
      ),
    ),
    http.get('/api/ingredients/:id', ({ params }) => {
      const found = state.catalogue.ingredients.find((i) => i.id === params.id);
      return found
        ? HttpResponse.json(ingredientResponse(found, options.chef))
        : notFound('ingredient');
    }),
    http.post('/api/ingredients', async ({ request }) => {
      const body = (await record(request, '/api/ingredients')) as Omit<Ingredient, 'id'>;
      const created: Ingredient = { ...body, id: `ing-new-${state.requests.length}` };
      state.catalogue = {
        ...state.catalogue,
        ingredients: [...state.catalogue.ingredients, created],
      };
      return HttpResponse.json(ingredientResponse(created), { status: 201 });
    }),
    http.get('/api/recipes', ({ request }) =>
      HttpResponse.json(
        page(
          state.catalogue.recipes.map((r) => recipeResponse(r, names())),
          new URL(request.url),
        ),
      ),
    ),
    http.get('/api/recipes/:id', ({ params }) => {
      const found = state.catalogue.recipes.find((r) => r.id === params.id);
      return found ? HttpResponse.json(recipeResponse(found, names())) : notFound('recipe');
    }),
    http.put('/api/recipes/:id', async ({ request, params }) => {
      const body = (await record(request, `/api/recipes/${String(params.id)}`)) as Omit<
        Recipe,
        'id'
      >;
      const recipe: Recipe = { ...body, id: String(params.id) };
      const after = [...state.catalogue.recipes.filter((r) => r.id !== recipe.id), recipe];
      // As api/src/kitchen/catalogue/catalogue-checks.ts: a loop is refused with the shared error's message.
      const cycle = findRecipeCycle(after);
      if (cycle) return bad([new RecipeCycleError(cycle.names, cycle.ids).message]);
      state.catalogue = { ...state.catalogue, recipes: after };
      return HttpResponse.json(recipeResponse(recipe, names()));
    }),
    // As RecipesService.scaled: grams, or what `plates` of a dessert need of this recipe.
    http.get('/api/recipes/:id/scaled', ({ params, request }) => {
      const url = new URL(request.url);
      const id = String(params.id);
      const idx = index();
      const recipe = state.catalogue.recipes.find((r) => r.id === id);
      if (!recipe) return notFound('recipe');
      try {
        if (url.searchParams.has('grams')) {
          const grams = Number(url.searchParams.get('grams'));
          return HttpResponse.json({
            recipeId: id,
            name: recipe.name,
            basis: { mode: 'grams', grams },
            grams: tidy(grams, 3),
            ...scaleRecipe(idx, id, grams),
          });
        }
        const plates = Number(url.searchParams.get('plates'));
        const dessert = state.catalogue.desserts.find(
          (d) => d.id === url.searchParams.get('dessertId'),
        );
        if (!dessert) return bad(['There is no dessert with that id.']);
        let perPlate = 0;
        const visit = (node: ExpandedRecipe): void => {
          if (node.recipe.id === id) {
            perPlate += node.grams;
            return;
          }
          for (const line of node.lines) if (line.kind === 'recipe') visit(line.node);
        };
        expandDessertComponents(idx, dessert).forEach(visit);
        if (perPlate === 0) return bad([`“${dessert.name}” does not use “${recipe.name}”.`]);
        return HttpResponse.json({
          recipeId: id,
          name: recipe.name,
          basis: {
            mode: 'plates',
            plates,
            dessertId: dessert.id,
            dessertName: dessert.name,
            gramsPerPlate: tidy(perPlate, 3),
          },
          grams: tidy(perPlate * plates, 3),
          ...scaleRecipe(idx, id, perPlate * plates),
        });
      } catch (error) {
        if (isKitchenError(error))
          return HttpResponse.json({ statusCode: 409, message: error.message }, { status: 409 });
        throw error;
      }
    }),
    http.get('/api/desserts', ({ request }) =>
      HttpResponse.json(
        page(
          state.catalogue.desserts.map((d) => dessertResponse(d, names())),
          new URL(request.url),
        ),
      ),
    ),
    http.get('/api/desserts/:id', ({ params }) => {
      const found = state.catalogue.desserts.find((d) => d.id === params.id);
      return found ? HttpResponse.json(dessertResponse(found, names())) : notFound('dessert');
    }),
    http.post('/api/desserts/:id/photo', async ({ request, params }) => {
      const form = await request.formData();
      state.requests.push({
        method: 'POST',
        path: `/api/desserts/${String(params.id)}/photo`,
        body: form.get('photo'),
      });
      const found = state.catalogue.desserts.find((d) => d.id === params.id);
      if (!found) return notFound('dessert');
      const updated = { ...found, photos: [...found.photos, `photo-${state.requests.length}`] };
      state.catalogue = {
        ...state.catalogue,
        desserts: state.catalogue.desserts.map((d) => (d.id === updated.id ? updated : d)),
      };
      return HttpResponse.json(dessertResponse(updated, names()));
    }),
    http.get('/api/menus/admin', ({ request }) =>
      HttpResponse.json(
        page(
          state.catalogue.menus.map((m) => menuResponse(m, names())),
          new URL(request.url),
        ),
      ),
    ),
    http.get('/api/menus/admin/:id', ({ params }) => {
      const found = state.catalogue.menus.find((m) => m.id === params.id);
      return found ? HttpResponse.json(menuResponse(found, names())) : notFound('menu');
    }),
    // As MenusService.costing.
    http.get('/api/menus/:id/costing', ({ params, request }) => {
      const menu = state.catalogue.menus.find((m) => m.id === params.id);
      if (!menu) return notFound('menu');
      const target = new URL(request.url).searchParams.get('targetPercent');
      const idx = index();
      return HttpResponse.json({
        ...costMenu(idx, menu.id),
        suggestion:
          target === null
            ? null
            : {
                targetPercent: Number(target),
                stepMinor: 1,
                pricePerGuestMinor: suggestMenuPrice(idx, menu.id, Number(target), 1),
              },
      });
    }),
  ];
  return { state, handlers };
}

export type { Dessert, Menu };
