import { expect, test, type Page } from '@playwright/test';
import { tick } from '../support/checkbox';
import { snap, urls } from '../support/env';

const mailUrl = process.env.NAPPE_MAIL_URL ?? 'http://localhost:1080';

interface PublicMenu {
  id: string;
  name: string;
  minGuests: number;
  maxGuests: number;
}

/** Signs up a brand-new client through the storefront. */
async function signUp(page: Page, name: string, email: string) {
  await page.goto(`${urls.storefront}/create-account`);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('three courses of quince and rye');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
}

/** A menu that takes 40 guests, from the public list. */
async function menuFor40(page: Page): Promise<PublicMenu> {
  const res = await page.request.get(`${urls.storefront}/api/menus`);
  const menus = ((await res.json()) as { items: PublicMenu[] }).items;
  const menu = menus.find((m) => m.minGuests <= 40 && m.maxGuests >= 40);
  if (!menu) throw new Error('no demo menu takes 40 guests');
  return menu;
}

/** Your event: the first open day, a service time, venue, occasion, phone. */
async function fillEvent(page: Page) {
  const openDay = page.getByRole('button', { name: /: open, \d+ plates? left/ }).first();
  if ((await openDay.count()) === 0) await page.getByRole('button', { name: 'Next month' }).click();
  await openDay.click();
  await page.getByLabel('Service time').fill('19:30');
  await page
    .getByLabel('Venue address')
    .fill('Orangery of the Old Mill\n12 Quay of the Lys, Ghent');
  await page.getByLabel('Occasion').fill('Our wedding dinner');
  await page.getByLabel('Phone on the day').fill('+32 470 12 34 56');
  await page.getByRole('button', { name: /Continue to your guests/ }).click();
}

/** Your guests: 40 guests, two requirements typed in and one imported from a CSV file. */
async function fillGuests(page: Page) {
  await page.getByLabel('Number of guests').fill('40');
  for (const [label, allergen] of [
    ['Aunt Mireille', 'Nuts'],
    ['Jonas (table 2)', 'Milk'],
  ] as const) {
    await page.getByRole('button', { name: /Add a guest with requirements/ }).click();
    const label_ = page.getByLabel('Name or label').last();
    await label_.fill(label);
    await tick(page.getByRole('checkbox', { name: allergen, exact: true }).last());
  }
  await page.getByLabel('Choose a CSV file').setInputFiles({
    name: 'guests.csv',
    mimeType: 'text/csv',
    buffer: Buffer.from(
      'name,table,allergens,diets,notes\r\nPriya,3,sesame,vegetarian,No seeds on the plate\r\n',
    ),
  });
  await page.getByRole('button', { name: /Add 1 guest to the list/ }).click();
  await expect(page.getByRole('region', { name: 'Summary by allergen' })).toBeVisible();
  await tick(page.getByRole('checkbox', { name: /My guests agreed to share/ }));
  await snap(page, 'storefront-booking-guests');
  await page.getByRole('button', { name: /Continue to review/ }).click();
}

test('a new client books 40 guests, pays the deposit with 4242…, sees it recorded and gets the receipt', async ({
  page,
}) => {
  test.setTimeout(120_000);
  page.setDefaultTimeout(15_000);
  const email = `wedding-${Date.now()}@example.test`;
  await signUp(page, 'Noor Van Acker', email);
  const menu = await menuFor40(page);
  await page.goto(`${urls.storefront}/menus/${menu.id}`);
  await page.getByRole('link', { name: 'Book this menu' }).first().click();

  await fillEvent(page);
  await fillGuests(page);

  // Review: the server's quote, the tiers in words, the terms.
  await expect(page.getByText(/deposit/i).first()).toBeVisible();
  await expect(page.getByRole('region', { name: 'The full booking terms' })).toBeVisible();
  await tick(page.getByRole('checkbox', { name: /accept/i }));
  await snap(page, 'storefront-booking-review');
  await page.getByRole('button', { name: /Continue to payment/ }).click();

  // Payment: the deposit, then the local payment page.
  await page.getByText(/Pay the deposit/).click();
  await page.getByRole('button', { name: /^Pay / }).click();
  await expect(page.getByRole('heading', { name: /Local test payment/i })).toBeVisible({
    timeout: 20_000,
  });

  // A declining card first: a clear reason, nothing recorded.
  await page.getByLabel('Card number').fill('4000 0000 0000 0002');
  await page.getByRole('button', { name: /^Pay / }).click();
  await expect(page.getByText(/declined/i).first()).toBeVisible();

  const paid = Date.now();
  await page.getByLabel('Card number').fill('4242 4242 4242 4242');
  await page.getByRole('button', { name: /^Pay / }).click();
  await expect(page.getByRole('heading', { name: /your payment of .* is recorded/ })).toBeVisible({
    timeout: 30_000,
  });
  const recordedMs = Date.now() - paid;
  console.log(`pay → payment recorded in the browser: ${recordedMs} ms`);
  await snap(page, 'storefront-booked');

  // The ledger holds exactly one payment: the deposit. The declined card recorded nothing.
  const orderId = /\/my-events\/([^/]+)\/booked/.exec(page.url())?.[1];
  expect(orderId).toBeTruthy();
  const login = await page.request.post(`${urls.storefront}/api/auth/login`, {
    data: { email, password: 'three courses of quince and rye' },
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const order = (await (
    await page.request.get(`${urls.storefront}/api/orders/${orderId}`, {
      headers: { Authorization: `Bearer ${accessToken}` },
    })
  ).json()) as { status: string; paidMinor: number; payments: { kind: string; status: string }[] };
  expect(order.status).toBe('requested');
  expect(order.payments.filter((p) => p.status === 'succeeded').map((p) => p.kind)).toEqual([
    'deposit',
  ]);

  // The receipt e-mail with its PDF reaches the mail inbox (the outbox worker sends it).
  await expect
    .poll(
      async () => {
        const inbox = (await (await page.request.get(`${mailUrl}/email`)).json()) as {
          to: { address: string }[];
          attachments?: { contentType: string }[];
        }[];
        return inbox.some(
          (m) =>
            m.to.some((t) => t.address === email) &&
            (m.attachments ?? []).some((a) => a.contentType === 'application/pdf'),
        );
      },
      { timeout: 30_000, intervals: [1000] },
    )
    .toBe(true);
});
