import { describe, expect, it } from 'vitest';
import { system } from './index';

/*
 * The screens' recipes are not startup JavaScript: they join the system when the first screen's
 * code loads (router.tsx). Chakra looks recipes up in the system's theme when a component first
 * renders, and merges an app's recipe into Chakra's by deep merge (Chakra UI v3 docs,
 * "Customization > Recipes": extending a built-in recipe keeps its other styles).
 */
describe('recipes added with the screens', () => {
  it('are absent at startup and present, merged with ours, once the screens’ recipes load', async () => {
    expect(system.isSlotRecipe('dialog')).toBe(false);
    expect(system.isRecipe('input')).toBe(false);
    // What the header, the footer, the loading and the error page need is there from the start.
    for (const key of ['button', 'container', 'heading', 'icon', 'link', 'skipNavLink', 'spinner'])
      expect(system.isRecipe(key)).toBe(true);

    await import('./screen-recipes');

    for (const key of ['input', 'inputAddon', 'separator', 'skeleton', 'textarea'])
      expect(system.isRecipe(key)).toBe(true);
    for (const key of [
      'alert',
      'card',
      'checkbox',
      'dialog',
      'emptyState',
      'field',
      'list',
      'nativeSelect',
      'radioCard',
      'table',
      'tabs',
      'timeline',
    ])
      expect(system.isSlotRecipe(key)).toBe(true);

    // Ours on top of Chakra's: our palette for an error alert, Chakra's parts still there.
    const alert = system.getSlotRecipe('alert');
    expect(alert.variants?.status?.error?.root).toMatchObject({ colorPalette: 'danger' });
    expect(alert.slots).toEqual(expect.arrayContaining(['root', 'title', 'description']));
    // Our input outline at 3:1 on the paper (WCAG 2.2 SC 1.4.11), Chakra's sizes kept.
    const input = system.getRecipe('input');
    expect(input.variants?.variant?.outline).toMatchObject({ borderColor: 'border.emphasized' });
    expect(Object.keys(input.variants?.size ?? {})).toEqual(expect.arrayContaining(['sm', 'md']));
  });

  it('a recipe already in the system is not replaced by a later addition', async () => {
    const { addRecipes } = await import('./screen-recipes');
    const before = system.getRecipe('button');
    addRecipes({ theme: { recipes: { button: { base: { color: 'red' } } } } });
    expect(system.getRecipe('button')).toBe(before);
  });
});
