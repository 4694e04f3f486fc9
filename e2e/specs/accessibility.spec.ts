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
  ['/forgot-password', /Forgot your password/],
  [`/reset-password?token=${'A'.repeat(43)}`, /Choose a new password/],
  ['/reset-password?token=cut', /This link cannot be used/],
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

test('admin Prep pages have no serious or critical accessibility violations', async ({ page }) => {
  test.setTimeout(180_000);
  await page.goto(`${urls.admin}/sign-in`);
  await signIn(page, demo.chef);
  await expect(page.getByRole('heading', { level: 2, name: 'Prep today' })).toBeVisible();
  await expect(page.getByRole('status')).toHaveCount(0);
  await audit(page, 'admin Today (prep)');
  await page.getByRole('link', { name: 'Plan', exact: true }).click();
  await expect(page.getByRole('heading', { level: 2 }).first()).toBeVisible({ timeout: 30_000 });
  await audit(page, 'admin Prep Plan');
  await page.getByRole('link', { name: 'Schedule', exact: true }).click();
  // The first day with tasks (the demo's first prep day is within two weeks).
  const tasks = page.getByRole('list', { name: /^Tasks for / });
  const none = page.getByRole('heading', { name: 'Nothing to prep on this day' });
  for (let i = 0; i < 14; i += 1) {
    await expect(tasks.or(none)).toBeVisible({ timeout: 30_000 });
    if (await tasks.isVisible()) break;
    const day = await page.getByRole('heading', { level: 1 }).textContent();
    await page.getByRole('button', { name: 'Next day' }).click();
    await expect(page.getByRole('heading', { level: 1 })).not.toHaveText(day!);
  }
  await audit(page, 'admin Prep Schedule');
  await page.getByRole('link', { name: 'Labels', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Component labels' })).toBeVisible();
  await expect(page.getByRole('status')).toHaveCount(0, { timeout: 30_000 });
  await audit(page, 'admin Prep Labels');
});

test('admin Allergy notes pages have no serious or critical accessibility violations', async ({
  page,
}) => {
  test.setTimeout(180_000);
  await page.goto(`${urls.admin}/sign-in`);
  await signIn(page, demo.chef);
  await page.getByRole('link', { name: 'Allergy notes' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Allergy notes' })).toBeVisible();
  await expect(page.getByText(/plates? to resolve/).first()).toBeVisible();
  await audit(page, 'admin Allergy notes');
  // The wedding (Celebration Trio, 60 guests): conflicts, a changed plate, advisories.
  const wedding = page
    .getByRole('listitem')
    .filter({ has: page.getByRole('heading', { level: 3, name: /Celebration Trio/ }) })
    .filter({ hasText: '60 guests' });
  await wedding.getByRole('link', { name: /^Open notes/ }).click();
  await expect(page.getByRole('article', { name: 'Table 3, seat 4' })).toBeVisible();
  await page
    .getByRole('button', { name: 'Record a change: Table 3, seat 4, Pistachio Frost' })
    .click();
  await expect(page.getByRole('button', { name: 'Save and check again' })).toBeVisible();
  await audit(page, 'admin event allergy notes');
  await page.getByRole('link', { name: 'Staff briefing' }).click();
  await expect(page.getByRole('heading', { level: 2, name: 'Table 3' })).toBeVisible();
  await audit(page, 'admin staff briefing');
});

test('admin Insights, Studio settings and Team have no serious or critical accessibility violations', async ({
  page,
}) => {
  test.setTimeout(180_000);
  await page.goto(`${urls.admin}/sign-in`);
  await signIn(page, demo.chef);
  await expect(page).not.toHaveURL(/sign-in/);
  await page.goto(`${urls.admin}/insights`);
  await expect(page.getByRole('region', { name: 'Revenue by month' })).toBeVisible({
    timeout: 60_000,
  });
  await audit(page, 'admin Insights');
  await page.getByRole('link', { name: 'Settings' }).click();
  await expect(page.getByLabel('Studio name')).toBeVisible({ timeout: 60_000 });
  await audit(page, 'admin Settings');
  await page.getByRole('link', { name: 'Team' }).click();
  await expect(page.getByRole('region', { name: 'Pending invitations' })).toBeVisible();
  await audit(page, 'admin Team with invitations');
});

test('admin Accept invitation has no serious or critical accessibility violations', async ({
  page,
}) => {
  // A token of the right shape shows the form; a cut one shows the explanation.
  await page.goto(`${urls.admin}/accept-invitation?token=${'A'.repeat(43)}`);
  await expect(page.getByRole('heading', { level: 1, name: 'Join the team' })).toBeVisible({
    timeout: 60_000,
  });
  await audit(page, 'admin accept invitation');
  await page.goto(`${urls.admin}/accept-invitation?token=cut`);
  await expect(
    page.getByRole('heading', { level: 1, name: 'This invitation cannot be used' }),
  ).toBeVisible();
  await audit(page, 'admin accept invitation, bad link');
});

test('admin Forgot your password and Choose a new password have no serious or critical accessibility violations', async ({
  page,
}) => {
  await page.goto(`${urls.admin}/forgot-password`);
  await expect(page.getByRole('heading', { level: 1, name: 'Forgot your password?' })).toBeVisible({
    timeout: 60_000,
  });
  await audit(page, 'admin forgot password');
  // A token of the right shape shows the form; a cut one shows the explanation.
  await page.goto(`${urls.admin}/reset-password?token=${'A'.repeat(43)}`);
  await expect(
    page.getByRole('heading', { level: 1, name: 'Choose a new password' }),
  ).toBeVisible();
  await audit(page, 'admin reset password');
  await page.goto(`${urls.admin}/reset-password?token=cut`);
  await expect(
    page.getByRole('heading', { level: 1, name: 'This link cannot be used' }),
  ).toBeVisible();
  await audit(page, 'admin reset password, bad link');
});

test('admin Orders and Calendar pages have no serious or critical accessibility violations', async ({
  page,
}) => {
  test.setTimeout(180_000);
  await page.goto(`${urls.admin}/sign-in`);
  await signIn(page, demo.chef);
  await page.getByRole('link', { name: 'Orders', exact: true }).click();
  const inbox = page.getByRole('table', { name: 'Orders, newest booking first' });
  await expect(inbox).toBeVisible({ timeout: 30_000 });
  await audit(page, 'admin Orders');
  await inbox.locator('tbody tr').first().getByRole('link').first().click();
  await expect(page.getByRole('heading', { level: 2, name: 'History' })).toBeVisible({
    timeout: 30_000,
  });
  await expect(page.getByText(/Opened \d+ times?|Nobody at the studio/)).toBeVisible();
  await audit(page, 'admin Order');
  await page.getByRole('link', { name: 'Calendar', exact: true }).click();
  await expect(page.getByRole('table', { name: /^Events in / })).toBeVisible({ timeout: 30_000 });
  await audit(page, 'admin Calendar');
});
