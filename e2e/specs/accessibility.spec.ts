import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, urls } from '../support/env';

// axe-core (Deque) against every main page of both apps: WCAG 2.x A and AA rules.
// Serious and critical violations fail the test; the rest are printed for the record.
async function audit(page: Page, name: string) {
  const results = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  const blocking = results.violations.filter(
    (v) => v.impact === 'serious' || v.impact === 'critical',
  );
  const minor = results.violations.filter((v) => !blocking.includes(v));
  if (minor.length > 0)
    console.log(`${name}: minor: ${minor.map((v) => `${v.id} (${v.nodes.length})`).join(', ')}`);
  expect(
    blocking.map(
      (v) => `${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(' | ')}`,
    ),
    name,
  ).toEqual([]);
}

async function signIn(page: Page, email: string) {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

for (const [path, heading] of [
  ['/', /Plated desserts/],
  ['/how-booking-works', /./],
  ['/sign-in', /Sign in/],
  ['/create-account', /./],
  ['/no-such-page', /./],
] as const) {
  test(`storefront ${path} has no serious or critical accessibility violations`, async ({
    page,
  }) => {
    await page.goto(`${urls.storefront}${path}`);
    await expect(page.getByRole('heading', { level: 1, name: heading }).first()).toBeVisible();
    await audit(page, `storefront ${path}`);
  });
}

test('storefront My events has no serious or critical accessibility violations', async ({
  page,
}) => {
  await page.goto(`${urls.storefront}/sign-in`);
  await signIn(page, demo.client);
  await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
  await audit(page, 'storefront /my-events');
});

test('admin pages have no serious or critical accessibility violations', async ({ page }) => {
  test.setTimeout(60_000);
  await page.goto(urls.admin);
  await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await audit(page, 'admin sign-in');
  await signIn(page, demo.chef);
  await expect(page.getByRole('heading', { level: 2, name: 'Services today' })).toBeVisible();
  await audit(page, 'admin Today');
  await page.getByRole('link', { name: 'Team' }).click();
  await expect(page.getByRole('cell', { name: 'staff@nappe.test' })).toBeVisible();
  await audit(page, 'admin Team');
});
