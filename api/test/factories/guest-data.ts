import { expect } from 'vitest';
import { bearer, bookOrder, payOnPage, type BookingApp } from './booking.js';
import { create, ingredientLine, recipeBody } from './kitchen.js';
import type { TestApp } from './test-app.js';

/**
 * Test data for guest health data: a menu with an almond crumble (tree nuts, Regulation (EU)
 * No 1169/2011 Annex II item 8) that a sugar crumble can replace, and guests with names and
 * notes distinctive enough to search every log line, e-mail and export for. All invented.
 */
export interface GuestMenu {
  menuId: string;
  dessertId: string;
  almondCrumbleId: string;
  sugarCrumbleId: string;
}

export async function makeGuestMenu(t: TestApp, chef: string): Promise<GuestMenu> {
  const sugar = await create(t, chef, '/api/ingredients', {
    name: 'Caster sugar',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 180 },
    allergens: { contains: [], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
  });
  const almonds = await create(t, chef, '/api/ingredients', {
    name: 'Ground almonds',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 2000 },
    allergens: { contains: [{ food: 'almond' }], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
  });
  const almondCrumbleId = await create(
    t,
    chef,
    '/api/recipes',
    recipeBody([ingredientLine(almonds, 300), ingredientLine(sugar, 200)], {
      name: 'Almond crumble',
      yieldG: 450,
      storage: 'dry',
      shelfLifeHours: 72,
    }),
  );
  const sugarCrumbleId = await create(
    t,
    chef,
    '/api/recipes',
    recipeBody([ingredientLine(sugar, 500)], {
      name: 'Sugar crumble',
      yieldG: 450,
      storage: 'dry',
      shelfLifeHours: 72,
    }),
  );
  const tuile = await create(
    t,
    chef,
    '/api/recipes',
    recipeBody([ingredientLine(sugar, 500)], {
      name: 'Sugar tuile',
      yieldG: 450,
      storage: 'dry',
      shelfLifeHours: 72,
    }),
  );
  const dessertId = await create(t, chef, '/api/desserts', {
    name: 'Crumble and tuile',
    components: [
      { recipeId: almondCrumbleId, quantity: 20, unit: 'g' },
      { recipeId: tuile, quantity: 10, unit: 'g' },
    ],
  });
  const menuId = await create(t, chef, '/api/menus', {
    name: 'Crumble supper',
    dessertIds: [dessertId],
    pricePerGuestMinor: 1500,
    minGuests: 2,
    maxGuests: 200,
    leadDays: 3,
    active: true,
  });
  return { menuId, dessertId, almondCrumbleId, sugarCrumbleId };
}

/** Guests whose names and notes appear nowhere else, so their absence can be checked. */
export function distinctiveGuests(tag: string) {
  return [
    {
      label: `Zephyrine Quillfeather-${tag}`,
      table: '4',
      allergens: ['nuts'],
      diets: [],
      notes: `Severe almond anaphylaxis, carries an adrenaline pen ${tag}`,
    },
    { label: `Barnabus Oakenshaw-${tag}`, table: '4', allergens: ['gluten'], diets: [] },
    {
      label: `Ottoline Wrenfield-${tag}`,
      table: '2',
      allergens: [],
      diets: ['vegan'],
      notes: `Lactose upset since childhood ${tag}`,
    },
  ];
}

/** Books for `token` with the guests, pays the deposit on the fake's page; status `requested`. */
export async function bookAndPayDeposit(
  app: BookingApp,
  token: string,
  menuId: string,
  overrides: Record<string, unknown> = {},
): Promise<string> {
  const { id } = await bookOrder(app.t, token, menuId, overrides);
  const co = await app.t.http
    .post(`/api/orders/${id}/checkout`)
    .set(bearer(token))
    .send({ plan: 'deposit' });
  expect(co.status, JSON.stringify(co.body)).toBe(200);
  expect((await payOnPage(co.body.checkoutUrl as string)).status).toBe(303);
  const order = await app.t.http.get(`/api/orders/${id}`).set(bearer(token)).expect(200);
  expect(order.body.status).toBe('requested');
  return id;
}

/** The chef replaces the almond crumble for guest 0 (the nut allergy) and confirms. */
export async function substituteAndConfirm(
  app: BookingApp,
  chef: string,
  orderId: string,
  menu: GuestMenu,
  note = 'Sugar crumble instead, plated first',
): Promise<void> {
  await app.t.http
    .put(`/api/orders/${orderId}/guests/0/substitutions/${menu.dessertId}`)
    .set(bearer(chef))
    .send({
      replace: [
        { componentRecipeId: menu.almondCrumbleId, replacementRecipeId: menu.sugarCrumbleId },
      ],
      note,
    })
    .expect(200);
  await app.t.http.post(`/api/orders/${orderId}/confirm`).set(bearer(chef)).send({}).expect(200);
}
