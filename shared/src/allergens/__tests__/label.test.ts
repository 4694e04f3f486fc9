import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import {
  dessertIngredientLabel,
  emphasiseFoods,
  recipeIngredientLabel,
  renderLabelPlainText,
  usContainsStatement,
} from '../label.js';
import { rollUpRecipe } from '../rollup.js';

const milk = ingredient('milk', {
  name: 'Whole milk',
  labelName: 'whole milk',
  allergens: { contains: [{ food: 'milk' }], mayContain: [] },
});
const butter = ingredient('butter', {
  name: 'Butter',
  labelName: 'butter',
  allergens: { contains: [{ food: 'milk' }], mayContain: [] },
});
const sugar = ingredient('sugar', { name: 'Sugar', labelName: 'sugar' });
const glucose = ingredient('glucose', {
  name: 'Glucose syrup (wheat)',
  labelName: 'glucose syrup',
  allergens: { contains: [{ food: 'wheat', form: 'glucose_syrup' }], mayContain: [] },
});
const chocolate = ingredient('choc', {
  name: 'White chocolate',
  labelName: 'white chocolate (sugar, cocoa butter, whole milk powder, emulsifier: soya lecithin)',
  allergens: { contains: [{ food: 'milk' }, { food: 'soybean' }], mayContain: ['hazelnut'] },
});
const yolk = ingredient('yolk', {
  name: 'Egg yolks',
  labelName: 'egg yolks',
  allergens: { contains: [{ food: 'egg' }], mayContain: [] },
});

const caramel = recipe('caramel', [line('sugar', 100), line('glucose', 40), line('butter', 60)], {
  name: 'Caramel',
  yieldG: 180,
});
const base = recipe(
  'base',
  [line('milk', 500), line('yolk', 80), line('sugar', 100), subRecipe('caramel', 120)],
  {
    name: 'Caramel ice cream',
    yieldG: 780,
  },
);
const index = createKitchenIndex({
  ingredients: [milk, butter, sugar, glucose, chocolate, yolk],
  recipes: [caramel, base, recipe('shards', [line('choc', 100)], { name: 'Shards', yieldG: 100 })],
  desserts: [
    dessert('d', [
      { recipeId: 'shards', quantity: 5, unit: 'g' },
      { recipeId: 'base', quantity: 70, unit: 'g' },
    ]),
  ],
});

describe('ingredient list text (Regulation (EU) 1169/2011 Art. 18 and 21)', () => {
  it('lists ingredients by descending weight with sub-recipes as compound ingredients in brackets', () => {
    const label = recipeIngredientLabel(index, 'base');
    // 500 milk > 120 caramel > 100 sugar > 80 yolk; inside the caramel: 100 sugar > 60 butter > 40 glucose.
    expect(label.plainText).toBe(
      'Ingredients: whole MILK, Caramel (sugar, butter (MILK), glucose syrup), sugar, EGG yolks.',
    );
  });

  it('returns structured segments, emphasis as a flag, never markup', () => {
    const { segments } = recipeIngredientLabel(index, 'caramel');
    expect(segments).toEqual([
      { text: 'Ingredients: sugar, butter (', emphasis: false },
      { text: 'milk', emphasis: true },
      { text: '), glucose syrup.', emphasis: false },
    ]);
    expect(segments.map((s) => s.text).join('')).not.toMatch(/[<>]/);
  });

  it('does not emphasise an EU-exempt derivative (wheat glucose syrup, Annex II 1(a))', () => {
    const { segments } = recipeIngredientLabel(index, 'caramel');
    expect(segments.filter((s) => s.emphasis).map((s) => s.text)).toEqual(['milk']);
  });

  it('emphasises the allergen word inside a compound name and adds nothing when the name already says it', () => {
    const segs = emphasiseFoods(
      'white chocolate (sugar, cocoa butter, whole milk powder, emulsifier: soya lecithin)',
      ['milk', 'soybean'],
    );
    expect(renderLabelPlainText(segs)).toBe(
      'white chocolate (sugar, cocoa butter, whole MILK powder, emulsifier: SOYA lecithin)',
    );
  });

  it('adds the allergen in brackets when the name does not say it (butter → butter (milk))', () => {
    expect(renderLabelPlainText(emphasiseFoods('crème fraîche', ['milk']))).toBe(
      'crème fraîche (MILK)',
    );
    expect(renderLabelPlainText(emphasiseFoods('praline', ['hazelnut', 'almond']))).toBe(
      'praline (HAZELNUTS, ALMONDS)',
    );
  });

  it('matches whole word starts only (no “egg” inside “nutmeg”)', () => {
    expect(renderLabelPlainText(emphasiseFoods('nutmeg', ['egg']))).toBe('nutmeg (EGG)');
  });

  it('text that looks like markup stays text', () => {
    const segs = emphasiseFoods('<b>cream</b>', ['milk']);
    expect(segs.map((s) => s.text).join('')).toBe('<b>cream</b> (milk)');
  });

  it('a plated dessert lists its components by plate weight and adds the “may contain” sentence', () => {
    const label = dessertIngredientLabel(index, 'd');
    expect(label.plainText).toBe(
      'Ingredients: Caramel ice cream (whole MILK, Caramel (sugar, butter (MILK), glucose syrup), sugar, EGG yolks), ' +
        'Shards (white chocolate (sugar, cocoa butter, whole MILK powder, emulsifier: SOYA lecithin)). May contain hazelnuts.',
    );
    expect(label.mayContain).toEqual(['hazelnuts']);
  });
});

describe('the US “Contains” statement (FD&C Act §403(w)(1))', () => {
  it('names wheat from glucose syrup (not exempt in the US) and each tree nut by kind', () => {
    const almonds = ingredient('alm', {
      name: 'Almonds',
      allergens: { contains: [{ food: 'almond' }], mayContain: [] },
    });
    const pine = ingredient('pine', {
      name: 'Pine nuts',
      allergens: { contains: [{ food: 'pine_nut' }], mayContain: [] },
    });
    const idx = createKitchenIndex({
      ingredients: [glucose, almonds, pine, milk],
      recipes: [
        recipe('r', [line('glucose', 10), line('alm', 10), line('pine', 10), line('milk', 10)]),
      ],
    });
    expect(usContainsStatement(rollUpRecipe(idx, 'r'))).toBe(
      'Contains: milk, almond, pine nut, wheat.',
    );
  });

  it('is null when there is nothing to declare', () => {
    expect(usContainsStatement(rollUpRecipe(index, 'shards'))).toBe('Contains: milk, soy.');
    const idx = createKitchenIndex({
      ingredients: [sugar],
      recipes: [recipe('r', [line('sugar', 1)])],
    });
    expect(usContainsStatement(rollUpRecipe(idx, 'r'))).toBeNull();
  });
});
