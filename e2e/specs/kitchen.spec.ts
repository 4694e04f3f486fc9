import { expect, test, type Locator, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, snap, urls } from '../support/env';

/**
 * The chef writes a new frozen recipe in Chromium and watches cost, allergens and mix balance
 * follow each line before saving; then saves it, finds it again and deletes it.
 *
 * Figures by hand from the demo catalogue (shared/src/kitchen/demo-catalogue.ts):
 * - whole milk 1 l = 1,031 g (USDA FDC 171265: 1 US cup = 244 g) at €1.15; cream 36 % 1 l =
 *   1,006 g (FDC 170859: 1 cup = 238 g) at €5.20; caster sugar €1.45/kg; pistachio paste €56/kg.
 * - milkfat: whole milk 3.25 % (FDC 171265), cream 36.08 % (FDC 170859).
 */
const name = `Pistachio ice-cream base ${Date.now().toString(36)}`;

async function pickLine(page: Page, n: number, search: string, option: RegExp, grams: string) {
  const line = page.getByRole('group', { name: `Line ${n}`, exact: true });
  const picker = line.getByRole('combobox', { name: `Line ${n}: ingredient or recipe` });
  await picker.click();
  await picker.pressSequentially(search, { delay: 30 });
  await page.getByRole('option', { name: option }).first().click();
  await line.getByRole('textbox', { name: `Line ${n}: quantity` }).fill(grams);
}

const figures = (page: Page): Locator =>
  page.getByRole('complementary', { name: 'Recipe figures' });

test('the chef builds a recipe and sees cost, allergens and mix balance follow each line', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto(`${urls.admin}/sign-in?redirectTo=${encodeURIComponent('/kitchen/recipes/new')}`);
  await page.getByLabel('E-mail').fill(demo.chef);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(/recipe/i);

  await page.getByLabel('Name').fill(name);
  await page.getByLabel('Measured yield').fill('1000');
  await page.getByLabel('Storage').selectOption({ label: 'Frozen' });
  await page.getByLabel('Shelf life').fill('72');

  await pickLine(page, 1, 'Whole', /Whole milk/, '600');
  await page.getByRole('button', { name: 'Add a line' }).click();
  await pickLine(page, 2, 'Whipping', /Whipping cream 36/, '250');
  await page.getByRole('button', { name: 'Add a line' }).click();
  await pickLine(page, 3, 'Caster', /Caster sugar/, '150');

  // 600 × 115 / 1031 + 250 × 520 / 1006 + 150 × 145 / 1000 = 66.925 + 129.225 + 21.75
  // = 217.90 cents for the 1,000 g yield: €2.18 per kg.
  const costPerKg = figures(page).getByTestId('cost-per-kg');
  await expect(costPerKg).toHaveText(/€2\.18/);
  const allergens = figures(page).getByRole('region', { name: 'Allergens' });
  await expect(allergens.getByText('Milk').first()).toBeVisible();
  await expect(allergens.getByText(/Tree nuts/)).toHaveCount(0);

  // Milkfat (19.5 + 90.2) / 1000 g = 10.97 %: inside Goff's 10–16 % (Ice Cream Technology, ch. 16).
  const mix = figures(page).getByRole('region', { name: 'Mix balance' });
  await expect(mix.getByRole('meter', { name: 'Milkfat' })).toHaveAttribute(
    'aria-valuetext',
    /^Milkfat 11 %, within the 10–16 % band$/,
  );
  await expect(mix.getByText(/judged as an ice cream/)).toBeVisible();
  await snap(page, 'kitchen-recipe-building');

  // Pistachio paste: + 60 × 5600 / 1000 = 336 cents → 553.90 cents per 1,000 g: €5.54 per kg.
  // Pistachio is a tree nut under EU 1169/2011 Annex II (8) and the FD&C Act §201(qq).
  await page.getByRole('button', { name: 'Add a line' }).click();
  await pickLine(page, 4, 'Pistachio', /Pistachio paste/, '60');
  await expect(costPerKg).toHaveText(/€5\.54/);
  await expect(allergens.getByText(/Tree nuts/).first()).toBeVisible();
  // The 60 g the lines weigh over the yield count as evaporated water: the warning says so.
  await expect(figures(page).getByText(/counted as evaporated water/)).toBeVisible();
  await snap(page, 'kitchen-recipe-with-pistachio');

  await page.getByRole('button', { name: /^(Save|Create)/ }).click();
  await expect(page).toHaveURL(/\/kitchen\/recipes\/[0-9a-f-]{36}$/);
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible({ timeout: 30_000 });
  // Read back from the server: a fresh page load (sign-in restored from the refresh cookie).
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible({ timeout: 30_000 });
  await expect(figures(page).getByTestId('cost-per-kg')).toHaveText(/€5\.54/);

  // Clean up: delete it, after the confirmation.
  await page
    .getByRole('button', { name: /Delete/ })
    .first()
    .click();
  const dialog = page.getByRole('alertdialog').or(page.getByRole('dialog'));
  await expect(dialog).toContainText(name);
  await dialog.getByRole('button', { name: /Delete/ }).click();
  await expect(page).toHaveURL(/\/kitchen\/recipes$/);
  await expect(page.getByRole('link', { name })).toHaveCount(0);
});
