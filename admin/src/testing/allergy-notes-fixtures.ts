import {
  addIsoDays,
  dateInTimeZone,
  OrderStatus,
  type Dessert,
  type GuestRequirement,
  type Ingredient,
  type KitchenCatalogue,
  type Menu,
  type OrderSummary,
  type Recipe,
  type Substitution,
} from '@nappe/shared';
import { studioCard } from './fixtures';

/**
 * An invented studio, menu and guests for the Allergy notes tests. What each ingredient
 * declares follows Regulation (EU) No 1169/2011, Annex II: item 8 "Nuts, namely: almonds …,
 * hazelnuts …, pistachio nuts", item 1 cereals containing gluten (wheat, oats), item 7 milk.
 * Gelatin is of animal origin, so not vegetarian (common practice, no source).
 */

const plant = { animalOrigins: [], alcohol: false };
const pack = { packSize: 1, packUnit: 'kg' as const, packPriceMinor: 1000 };
const ingredient = (
  id: string,
  name: string,
  allergens: Ingredient['allergens'],
  dietary: Ingredient['dietary'] = plant,
): Ingredient => ({ id, name, purchase: pack, allergens, dietary });

export const AN_INGREDIENTS: Ingredient[] = [
  ingredient('i-almond', 'Ground almonds', {
    contains: [{ food: 'almond' }],
    mayContain: ['hazelnut'],
  }),
  ingredient('i-wheat', 'Wheat flour T65', { contains: [{ food: 'wheat' }], mayContain: [] }),
  ingredient('i-oat', 'Rolled oats', { contains: [{ food: 'oats' }], mayContain: [] }),
  ingredient(
    'i-butter',
    'Butter 82 %',
    { contains: [{ food: 'milk' }], mayContain: [] },
    { animalOrigins: ['milk'], alcohol: false },
  ),
  ingredient('i-sugar', 'Demerara sugar', { contains: [], mayContain: [] }),
  ingredient('i-pistachio', 'Pistachios, shelled', {
    contains: [{ food: 'pistachio' }],
    mayContain: [],
  }),
  ingredient('i-pear', 'Conference pears', { contains: [], mayContain: [] }),
  ingredient(
    'i-gelatin',
    'Gelatin powder (pork)',
    { contains: [], mayContain: [] },
    { animalOrigins: ['pork'], alcohol: false, gelatin: 'pork' },
  ),
  ingredient(
    'i-cream',
    'Double cream',
    { contains: [{ food: 'milk' }], mayContain: [] },
    { animalOrigins: ['milk'], alcohol: false },
  ),
  ingredient('i-cocoa', 'Dark chocolate 70 %', { contains: [], mayContain: ['milk'] }),
];

const recipe = (id: string, name: string, lines: Array<[string, number]>): Recipe => ({
  id,
  name,
  lines: lines.map(([ingredientId, quantity]) => ({
    kind: 'ingredient' as const,
    ingredientId,
    quantity,
    unit: 'g' as const,
  })),
  yieldG: lines.reduce((n, [, q]) => n + q, 0),
  steps: [],
  storage: 'dry',
  shelfLifeHours: 48,
});

export const AN_RECIPES: Recipe[] = [
  recipe('r-almond-crumble', 'Toasted almond crumble', [
    ['i-almond', 100],
    ['i-wheat', 100],
    ['i-butter', 100],
    ['i-sugar', 100],
  ]),
  recipe('r-oat-crumble', 'Oat crumble', [
    ['i-oat', 150],
    ['i-butter', 100],
    ['i-sugar', 100],
  ]),
  recipe('r-pistachio-tuile', 'Pistachio tuile', [
    ['i-pistachio', 60],
    ['i-sugar', 60],
    ['i-butter', 40],
  ]),
  recipe('r-poached-pear', 'Poached pear', [
    ['i-pear', 500],
    ['i-sugar', 100],
  ]),
  recipe('r-mousse', 'Set chocolate mousse', [
    ['i-cocoa', 200],
    ['i-cream', 300],
    ['i-gelatin', 5],
  ]),
];

export const AN_DESSERTS: Dessert[] = [
  {
    id: 'd-pear',
    name: 'Pear, Almond and Pistachio',
    components: [
      { recipeId: 'r-poached-pear', quantity: 90, unit: 'g' },
      { recipeId: 'r-almond-crumble', quantity: 25, unit: 'g' },
      { recipeId: 'r-pistachio-tuile', quantity: 8, unit: 'g' },
    ],
    photos: [],
  },
  {
    id: 'd-mousse',
    name: 'Chocolate Mousse Slice',
    components: [{ recipeId: 'r-mousse', quantity: 80, unit: 'g' }],
    photos: [],
  },
];

export const AN_MENU: Menu = {
  id: 'm-orchard',
  name: 'Orchard Evening',
  dessertIds: ['d-pear', 'd-mousse'],
  pricePerGuestMinor: 2200,
  minGuests: 8,
  maxGuests: 60,
  leadDays: 5,
  active: true,
};

export const AN_CATALOGUE: KitchenCatalogue = {
  currency: 'EUR',
  ingredients: AN_INGREDIENTS,
  recipes: AN_RECIPES,
  desserts: AN_DESSERTS,
  menus: [AN_MENU],
};

/** A guest's stored row (its position is the id in the substitution routes). */
export interface FixtureGuest extends GuestRequirement {
  position: number;
}

export interface FixtureSubstitution {
  guestPosition: number;
  dessertId: string;
  changes: Substitution[];
  note: string | null;
  recordedAt: string;
}

export interface FixtureOrder {
  summary: OrderSummary;
  occasion: string;
  venue: string[];
  guests: FixtureGuest[];
  substitutions: FixtureSubstitution[];
}

/** Days from today on the studio's calendar (the tests do not depend on the date). */
export function studioDay(offset: number): string {
  return addIsoDays(dateInTimeZone(new Date(), studioCard.timeZone), offset);
}

const summary = (
  id: string,
  reference: string,
  daysAhead: number,
  overrides: Partial<OrderSummary> = {},
): OrderSummary => ({
  id,
  reference,
  status: OrderStatus.Confirmed,
  menuId: AN_MENU.id,
  menuName: AN_MENU.name,
  eventDate: studioDay(daysAhead),
  serviceTime: '20:00',
  guestCount: 24,
  currency: 'EUR',
  totalMinor: 52_800,
  paidMinor: 15_840,
  balanceMinor: 36_960,
  balanceDueDate: null,
  clientName: 'Hedda Lindqvist',
  createdAt: '2026-01-10T09:00:00.000Z',
  ...overrides,
});

/** The event the detail tests open: three guests, one changed plate (a note only). */
export function harvestDinner(): FixtureOrder {
  return {
    summary: summary('o-harvest', 'N-2026-0101', 5, { guestCount: 30 }),
    occasion: 'Harvest dinner',
    venue: ['Domaine des Tilleuls', '12 chemin des Vignes', '69400 Villefranche'],
    guests: [
      {
        position: 0,
        label: 'Table 2, seat 1',
        table: '2',
        allergens: ['tree_nuts'],
        diets: [],
        // Markup in a client's note must show as text, never as markup.
        notes: '<b>Carries an auto-injector</b> — please tell the server',
      },
      { position: 1, label: 'Jonas', table: '5', allergens: [], diets: ['vegetarian'] },
      { position: 2, label: 'Mireille', table: '5', allergens: ['sesame'], diets: [] },
    ],
    substitutions: [
      {
        guestPosition: 1,
        dessertId: 'd-mousse',
        changes: [],
        note: 'Ask about a sorbet instead',
        recordedAt: '2026-01-11T15:30:00.000Z',
      },
    ],
  };
}

/** Events for the list: upcoming (one page and more), recent, and some that have no plates. */
export function listOrders(): FixtureOrder[] {
  const plain = (o: OrderSummary): FixtureOrder => ({
    summary: o,
    occasion: 'Dinner',
    venue: [],
    guests: [],
    substitutions: [],
  });
  return [
    harvestDinner(),
    {
      ...plain(
        summary('o-garden', 'N-2026-0102', 9, {
          status: OrderStatus.Requested,
          clientName: 'Rafael Okonkwo',
          guestCount: 12,
        }),
      ),
      guests: [{ position: 0, label: 'Tomas', table: '1', allergens: ['almond'], diets: [] }],
      substitutions: [
        {
          guestPosition: 0,
          dessertId: 'd-pear',
          changes: [
            { componentRecipeId: 'r-almond-crumble', replacementRecipeId: 'r-oat-crumble' },
          ],
          note: null,
          recordedAt: '2026-01-12T10:00:00.000Z',
        },
      ],
    },
    plain(summary('o-recent', 'N-2026-0090', -2, { status: OrderStatus.Completed })),
    plain(summary('o-cancelled', 'N-2026-0103', 6, { status: OrderStatus.Cancelled })),
    plain(summary('o-unpaid', 'N-2026-0104', 7, { status: OrderStatus.PendingPayment })),
  ];
}

/** `count` upcoming events with no guests, for the list's pages. */
export function manyOrders(count: number): FixtureOrder[] {
  return Array.from({ length: count }, (_, i) => ({
    summary: summary(`o-many-${i + 1}`, `N-2026-${String(200 + i).padStart(4, '0')}`, 1 + i),
    occasion: 'Dinner',
    venue: [],
    guests: [],
    substitutions: [],
  }));
}
