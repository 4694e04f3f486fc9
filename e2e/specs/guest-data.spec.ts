import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { tick } from '../support/checkbox';
import { snap, urls } from '../support/env';

/**
 * Guest data is health data (DESIGN.md): the client confirms their guests agreed before the guest
 * step lets them on (GDPR Art. 9(2)(a)); a client downloads everything held about them (Art. 15,
 * 20) and deletes their account (Art. 17) from My events, and cannot sign in again.
 */

const PASSWORD = 'a pear poached slowly in bay leaves';
/** Route chunks load on first visit; on a busy 2-core machine that can take many seconds. */
const expectSoon = expect.configure({ timeout: 30_000 });
const STEP_MS = 30_000;

interface PublicMenu {
  id: string;
  minGuests: number;
  maxGuests: number;
}

async function signUp(page: Page, name: string, email: string) {
  await page.goto(`${urls.storefront}/create-account`);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Create account' }).click();
  await expectSoon(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
}

/** Opens the booking of a demo menu that takes 12 guests, at *Your event*. */
async function startBooking(page: Page) {
  const res = await page.request.get(`${urls.storefront}/api/menus`);
  const menus = ((await res.json()) as { items: PublicMenu[] }).items;
  const menu = menus.find((m) => m.minGuests <= 12 && m.maxGuests >= 12);
  if (!menu) throw new Error('no demo menu takes 12 guests');
  await page.goto(`${urls.storefront}/menus/${menu.id}`);
  await page.getByRole('link', { name: 'Book this menu' }).first().click();
  const openDay = page.getByRole('button', { name: /: open, \d+ plates? left/ }).first();
  if ((await openDay.count()) === 0) await page.getByRole('button', { name: 'Next month' }).click();
  await openDay.click();
  await page.getByLabel('Service time').fill('20:00');
  await page.getByLabel('Venue address').fill('The glasshouse\n3 Linden Walk, Ghent');
  await page.getByLabel('Occasion').fill('A retirement supper');
  await page.getByLabel('Phone on the day').fill('+32 470 98 76 54');
  await page.getByRole('button', { name: /Continue to your guests/ }).click();
}

async function addGuest(page: Page, label: string, allergen: string) {
  await page.getByRole('button', { name: /Add a guest with requirements/ }).click();
  await page.getByLabel('Name or label').last().fill(label);
  await tick(page.getByRole('checkbox', { name: allergen, exact: true }).last());
}

/** Books 12 guests on the first open date of a demo menu, as the signed-in client. */
async function bookThroughApi(page: Page, email: string): Promise<void> {
  const login = await page.request.post(`${urls.storefront}/api/auth/login`, {
    data: { email, password: PASSWORD },
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const menus = (
    (await (await page.request.get(`${urls.storefront}/api/menus`)).json()) as {
      items: PublicMenu[];
    }
  ).items;
  const menu = menus.find((m) => m.minGuests <= 12 && m.maxGuests >= 12);
  if (!menu) throw new Error('no demo menu takes 12 guests');
  const from = new Date().toISOString().slice(0, 10);
  const to = new Date(Date.now() + 80 * 86_400_000).toISOString().slice(0, 10);
  const days = (
    (await (
      await page.request.get(
        `${urls.storefront}/api/availability?menuId=${menu.id}&from=${from}&to=${to}&guests=12`,
      )
    ).json()) as { days: Array<{ date: string; status: string; fitsGuests?: boolean }> }
  ).days;
  const day = days.find((d) => d.status === 'open' && d.fitsGuests);
  if (!day) throw new Error('no open date for 12 guests in the next 80 days');
  const res = await page.request.post(`${urls.storefront}/api/orders`, {
    headers: { Authorization: `Bearer ${accessToken}`, 'Idempotency-Key': `gd-${Date.now()}` },
    data: {
      menuId: menu.id,
      eventDate: day.date,
      serviceTime: '20:00',
      venueAddressLines: ['The glasshouse', '3 Linden Walk, Ghent'],
      occasion: 'A retirement supper',
      contactPhone: '+32 470 98 76 54',
      guestCount: 12,
      guestRequirements: [{ label: 'Cousin Thaddeus', allergens: ['sesame'], diets: [] }],
      guestDataConsent: true,
      acceptTerms: true,
    },
  });
  expect(res.status(), await res.text()).toBe(201);
}

test('the consent confirmation blocks the guest step until it is ticked', async ({ page }) => {
  test.setTimeout(240_000);
  page.setDefaultTimeout(STEP_MS);
  await signUp(page, 'Hester Quarrington', `consent-${Date.now()}@example.test`);
  await startBooking(page);
  await page.getByLabel('Number of guests').fill('12');
  await addGuest(page, 'Uncle Leopold', 'Nuts');

  const consent = page.getByRole('checkbox', { name: /My guests agreed to share/ });
  await expectSoon(consent).not.toBeChecked();
  await page.getByRole('button', { name: /Continue to review/ }).click();
  await expectSoon(
    page.getByText(
      'Please confirm that your guests agreed to share their allergies and diets with the studio.',
    ),
  ).toBeVisible();
  await expectSoon(page).toHaveURL(/\/guests$/);
  await snap(page, 'storefront-guests-consent-required');

  await tick(consent);
  await page.getByRole('button', { name: /Continue to review/ }).click();
  await expectSoon(page).toHaveURL(/\/review$/);
});

test('a new client downloads their data, is told to cancel first, deletes the account and cannot sign in again', async ({
  page,
}) => {
  test.setTimeout(420_000);
  page.setDefaultTimeout(STEP_MS);
  const email = `erase-${Date.now()}@example.test`;
  await signUp(page, 'Imogen Staveley', email);

  // A booking with a guest's allergy, made through the API as the booking flow makes it (the flow
  // itself is the booking spec's); unpaid, it holds its date for 30 minutes.
  await bookThroughApi(page, email);

  // Download my data: a JSON file with the account, the booking and its guest.
  await page.goto(`${urls.storefront}/my-events`);
  const section = page.getByRole('region', { name: 'Your data' });
  await expectSoon(section).toBeVisible();
  await snap(page, 'storefront-my-events-your-data');
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    section.getByRole('button', { name: 'Download my data' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/^nappe-my-data-\d{4}-\d{2}-\d{2}\.json$/);
  const exported = JSON.parse(await readFile((await download.path())!, 'utf8')) as {
    format: string;
    account: { email: string; name: string };
    orders: Array<{
      status: string;
      occasion: string;
      guests: Array<{ label: string; allergens: string[] }>;
    }>;
    consents: Array<{ kind: string }>;
  };
  expect(exported.format).toBe('nappe-personal-data-export');
  expect(exported.account).toMatchObject({ email, name: 'Imogen Staveley' });
  expect(exported.orders).toHaveLength(1);
  expect(exported.orders[0]).toMatchObject({
    status: 'pending_payment',
    occasion: 'A retirement supper',
    guests: [{ label: 'Cousin Thaddeus', allergens: ['sesame'] }],
  });
  expect(exported.consents.map((c) => c.kind).sort()).toEqual(['booking_terms', 'guest_data']);

  // Delete my account: the dialog says what goes and what stays; the open booking blocks it.
  await section.getByRole('button', { name: 'Delete my account' }).click();
  const dialog = page.getByRole('alertdialog', { name: 'Delete your account?' });
  await expectSoon(dialog.getByText(/The studio must keep its bookkeeping records/)).toBeVisible();
  await dialog.getByLabel(/Your current password/).fill(PASSWORD);
  await snap(page, 'storefront-delete-account-dialog');
  await dialog.getByRole('button', { name: 'Delete my account' }).click();
  await expectSoon(dialog.getByRole('alert')).toContainText(
    /cannot be deleted while you have an upcoming booking: N-\d{4}-\d{4} on .*\. Cancel it first in My events/,
  );
  await snap(page, 'storefront-delete-account-blocked');
  await dialog.getByRole('button', { name: 'Keep my account' }).click();

  // Cancel the booking from its page, then delete.
  await page.getByRole('list', { name: 'Your events' }).getByRole('link').first().click();
  await page.getByRole('button', { name: 'Cancel booking' }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: 'Cancel the booking' }).click();
  await expectSoon(page.getByRole('alertdialog')).toHaveCount(0);
  await page.goto(`${urls.storefront}/my-events`);
  await page
    .getByRole('region', { name: 'Your data' })
    .getByRole('button', { name: 'Delete my account' })
    .click();
  await dialog.getByLabel(/Your current password/).fill(PASSWORD);
  await dialog.getByRole('button', { name: 'Delete my account' }).click();

  await expectSoon(page.getByText('Your account is deleted')).toBeVisible();
  await expectSoon(page).toHaveURL(`${urls.storefront}/`);
  await expectSoon(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
  await snap(page, 'storefront-account-deleted');

  // The old e-mail and password no longer open anything.
  await page.goto(`${urls.storefront}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expectSoon(page.getByText(/Wrong e-mail or password/)).toBeVisible();
  await snap(page, 'storefront-sign-in-after-deletion');
});
