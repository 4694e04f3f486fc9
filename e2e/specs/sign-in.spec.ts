import { expect, test, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, fontsReady, snap, urls } from '../support/env';

/** Today opens with a greeting as its title and the day's three lists. */
async function expectToday(page: Page, firstName: string) {
  await expect(
    page.getByRole('heading', {
      level: 1,
      name: new RegExp(`Good (morning|afternoon|evening), ${firstName}`),
    }),
  ).toBeVisible();
  await expect(page.getByRole('heading', { level: 2, name: 'Services today' })).toBeVisible();
}

async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

test.describe('each demo role signs in and lands on the right screen', () => {
  test('the client signs in on the storefront and lands on My events', async ({ page }) => {
    await page.goto(`${urls.storefront}/sign-in`);
    await expect(page).toHaveTitle(/Sign in/);
    await signIn(page, demo.client);
    await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
    await expect(page.getByText('Selma Brandt').first()).toBeVisible();
    await snap(page, 'storefront-my-events-client');
  });

  test('the chef signs in on the admin app and lands on Today, with the Studio section', async ({
    page,
  }) => {
    await page.goto(urls.admin);
    await signIn(page, demo.chef);
    await expectToday(page, 'Margaux');
    await expect(page.getByRole('link', { name: 'Team' })).toBeVisible();
    await snap(page, 'admin-today-chef');
    await page.getByRole('link', { name: 'Team' }).click();
    await expect(page.getByRole('cell', { name: 'staff@nappe.test' })).toBeVisible();
    await snap(page, 'admin-team-chef');
  });

  test('staff sign in on the admin app and land on Today, without the chef-only sections', async ({
    page,
  }) => {
    await page.goto(urls.admin);
    await signIn(page, demo.staff);
    await expectToday(page, 'Idris');
    await expect(page.getByRole('link', { name: 'Team' })).toHaveCount(0);
    await snap(page, 'admin-today-staff');
  });

  test('a client who signs in on the admin app is told where to go and is not let in', async ({
    page,
  }) => {
    await page.goto(urls.admin);
    await signIn(page, demo.client);
    await expect(page.getByText(/storefront/i).first()).toBeVisible();
    await expect(page.getByRole('heading', { level: 2, name: 'Services today' })).toHaveCount(0);
    await snap(page, 'admin-client-refused');
  });

  test('a wrong password is refused with a message', async ({ page }) => {
    await page.goto(`${urls.storefront}/sign-in`);
    await signIn(page, demo.client, 'not the right password');
    await expect(page.getByText('Wrong e-mail or password.')).toBeVisible();
  });
});

test.describe('a new client', () => {
  test('creates an account, stays signed in across a reload, and signs out', async ({ page }) => {
    const email = `new-client-${Date.now()}@example.test`;
    await page.goto(urls.storefront);
    await expect(page.getByRole('heading', { level: 1, name: /Plated desserts/ })).toBeVisible();
    await snap(page, 'storefront-home');
    await page.goto(`${urls.storefront}/create-account`);
    await page.getByLabel('Your name').fill('Wren Calloway');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect(page.getByText(/at least 12 characters/)).toBeVisible();
    await page.getByLabel('Password', { exact: true }).fill('lemon curd and toasted meringue');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
    // The access token lives in memory only: a reload restores the session from the refresh cookie.
    await page.reload();
    await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
    await expect(page.getByText('Wren Calloway').first()).toBeVisible();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page.getByRole('link', { name: /Sign in/ }).first()).toBeVisible();
    await page.goto(`${urls.storefront}/my-events`);
    await expect(page).toHaveURL(/sign-in/);
  });

  test('opening My events signed out asks to sign in, then returns there', async ({ page }) => {
    await page.goto(`${urls.storefront}/my-events`);
    await expect(page).toHaveURL(/sign-in/);
    await signIn(page, demo.client);
    await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
  });
});

test('phone width: the storefront and the admin sign-in fit a 375 px screen', async ({
  browser,
}) => {
  const phone = await browser.newContext({
    viewport: { width: 375, height: 812 },
    deviceScaleFactor: 2,
  });
  const page = await phone.newPage();
  await page.goto(urls.storefront);
  await expect(page.getByRole('heading', { level: 1, name: /Plated desserts/ })).toBeVisible();
  await fontsReady(page);
  const overflow = await page.evaluate(
    () => document.documentElement.scrollWidth - window.innerWidth,
  );
  expect(overflow).toBeLessThanOrEqual(0);
  await snap(page, 'storefront-home-phone');
  await page.goto(urls.admin);
  await signIn(page, demo.staff);
  await expectToday(page, 'Idris');
  await snap(page, 'admin-today-staff-phone');
  await phone.close();
});
