import { expect, request, test, type APIRequestContext, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, snap, urls } from '../support/env';

/**
 * The chef's Orders and Calendar on the running system. The setup books and pays two events as
 * the demo client through the API and the local payment page (so the spec does not depend on
 * what the seed holds): one the chef confirms through the API, one the chef confirms here.
 * Sign-in is rate-limited and shared: one sign-in per account for the whole file.
 */

const api = `${urls.storefront}/api`;
const desktop = { width: 1280, height: 900 };
const phone = { width: 390, height: 844 };

interface Booked {
  id: string;
  reference: string;
  eventDate: string;
}

let ctx: APIRequestContext;
let chefToken: string;
let alreadyConfirmed: Booked;
let toConfirm: Booked;
/** Whether the allergy notes say the order to confirm has plates still in conflict. */
let hasConflicts = false;

async function login(email: string): Promise<string> {
  const res = await ctx.post(`${api}/auth/login`, { data: { email, password: DEMO_PASSWORD } });
  expect(res.status(), `sign-in of ${email}`).toBe(200);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

const auth = (token: string) => ({ Authorization: `Bearer ${token}` });

interface PublicMenu {
  id: string;
  name: string;
  minGuests: number;
  maxGuests: number;
}

/** An open day that takes `guests`, from the menu's availability over the next 90 days. */
async function openDay(menuId: string, guests: number, skip: string[]): Promise<string> {
  const from = new Date().toISOString().slice(0, 10);
  const to = new Date(Date.now() + 90 * 86_400_000).toISOString().slice(0, 10);
  const res = await ctx.get(`${api}/availability`, {
    params: { menuId, from, to, guests },
  });
  expect(res.status()).toBe(200);
  const days = (
    (await res.json()) as {
      days: Array<{ date: string; status: string; fitsGuests?: boolean }>;
    }
  ).days;
  const day = days.find((d) => d.status === 'open' && d.fitsGuests && !skip.includes(d.date));
  if (!day) throw new Error('no open day in the next 90 days for the demo menu');
  return day.date;
}

/** Dates that already have a booking in the next 90 days (the chef's list, every page). */
async function bookedDays(): Promise<string[]> {
  const from = new Date().toISOString().slice(0, 10);
  const to = new Date(Date.now() + 90 * 86_400_000).toISOString().slice(0, 10);
  const dates = new Set<string>();
  for (let page = 1; page <= 20; page += 1) {
    const res = await ctx.get(`${api}/orders`, {
      headers: auth(chefToken),
      params: { from, to, page, pageSize: 100 },
    });
    expect(res.status()).toBe(200);
    const { items, total } = (await res.json()) as {
      items: Array<{ eventDate: string }>;
      total: number;
    };
    items.forEach((o) => dates.add(o.eventDate));
    if (page * 100 >= total) break;
  }
  return [...dates];
}

/** The demo client books and pays the deposit on the local payment page. */
async function bookAndPay(
  client: string,
  menu: PublicMenu,
  eventDate: string,
  label: string,
): Promise<Booked> {
  const guests = Math.min(Math.max(menu.minGuests, 12), menu.maxGuests);
  const created = await ctx.post(`${api}/orders`, {
    headers: {
      ...auth(client),
      'Idempotency-Key': `orders-spec-${label.replace(/\W+/g, '-')}-${Date.now()}`,
    },
    data: {
      menuId: menu.id,
      eventDate,
      serviceTime: '19:30',
      venueAddressLines: ['Orangery of the Old Mill', '12 Quay of the Lys, Ghent'],
      occasion: `Orders spec — ${label}`,
      contactPhone: '+32 470 12 34 56',
      guestCount: guests,
      // A guest allergic to tree nuts: the demo menus' crumbles are made with almonds.
      guestRequirements: [{ label: 'Amira', table: '1', allergens: ['tree_nuts'], diets: [] }],
      guestDataConsent: true,
      acceptTerms: true,
    },
  });
  expect(created.status(), await created.text()).toBe(201);
  const order = (await created.json()) as Booked;
  const checkout = await ctx.post(`${api}/orders/${order.id}/checkout`, {
    headers: auth(client),
    data: { plan: 'deposit' },
  });
  expect(checkout.status(), await checkout.text()).toBe(200);
  const { checkoutUrl } = (await checkout.json()) as { checkoutUrl: string };
  const paid = await ctx.post(checkoutUrl, {
    form: { email: demo.client, card_number: '4242 4242 4242 4242' },
    maxRedirects: 0,
  });
  expect(paid.status()).toBe(303);
  await expect
    .poll(
      async () =>
        (
          (await (
            await ctx.get(`${api}/orders/${order.id}`, { headers: auth(client) })
          ).json()) as {
            status: string;
          }
        ).status,
      { timeout: 20_000 },
    )
    .toBe('requested');
  return order;
}

test.beforeAll(async () => {
  test.setTimeout(90_000);
  ctx = await request.newContext();
  const client = await login(demo.client);
  chefToken = await login(demo.chef);
  const menus = ((await (await ctx.get(`${api}/menus`)).json()) as { items: PublicMenu[] }).items;
  const menu = menus.find((m) => /garden/i.test(m.name)) ?? menus[0];
  if (!menu) throw new Error('the demo has no menu on sale');
  // A day with no booking yet, so both events show in the calendar's cell on a re-run too.
  const booked = await bookedDays();
  const first = await openDay(menu.id, Math.max(menu.minGuests, 12), booked);
  alreadyConfirmed = await bookAndPay(client, menu, first, 'confirmed in setup');
  toConfirm = await bookAndPay(client, menu, first, 'confirmed in the browser');

  // The chef confirms the first through the API — with a reason when the kitchen's checks object.
  let confirm = await ctx.post(`${api}/orders/${alreadyConfirmed.id}/confirm`, {
    headers: auth(chefToken),
    data: {},
  });
  if (confirm.status() === 409) {
    confirm = await ctx.post(`${api}/orders/${alreadyConfirmed.id}/confirm`, {
      headers: auth(chefToken),
      data: { overrideReason: 'Nut-free plate agreed with the host by phone' },
    });
  }
  expect(confirm.status(), await confirm.text()).toBe(200);

  const notes = await ctx.get(`${api}/orders/${toConfirm.id}/allergy-notes`, {
    headers: auth(chefToken),
  });
  expect(notes.status()).toBe(200);
  hasConflicts = ((await notes.json()) as { unresolved: unknown[] }).unresolved.length > 0;
});

test.afterAll(async () => {
  await ctx?.dispose();
});

/** A screenshot once dialogs and transitions have finished moving. */
async function still(page: Page, name: string) {
  // A cancelled animation rejects its `finished`: settled is enough.
  await page.evaluate(() => Promise.allSettled(document.getAnimations().map((a) => a.finished)));
  await snap(page, name);
}

async function signInAsChef(page: Page) {
  await page.goto(urls.admin);
  await page.getByLabel('E-mail').fill(demo.chef);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 2, name: 'Services today' })).toBeVisible();
}

test('the chef filters the inbox, opens an order, confirms a request through the gate, and sees the calendar', async ({
  page,
}) => {
  // The development server compiles each screen on its first visit; the machine is shared.
  test.setTimeout(240_000);
  page.setDefaultTimeout(30_000);
  await page.setViewportSize(desktop);
  await signInAsChef(page);

  // Orders: the inbox, then only the confirmed orders.
  await page.getByRole('link', { name: 'Orders', exact: true }).click();
  // The first visit compiles the screen's code on the development server: allow for it.
  await expect(page.getByRole('heading', { level: 1, name: 'Orders' })).toBeVisible({
    timeout: 30_000,
  });
  const inbox = page.getByRole('table', { name: 'Orders, newest booking first' });
  await expect(inbox.getByRole('link', { name: toConfirm.reference })).toBeVisible();
  await expect(
    page.getByRole('region', { name: /wait(s)? for your decision/ }).getByRole('link', {
      name: toConfirm.reference,
    }),
  ).toBeVisible();
  await still(page, 'admin-orders-inbox');

  // Search by reference: one row; Back returns to the whole list with the box emptied.
  await page.getByLabel('Search').fill(toConfirm.reference);
  await expect(page).toHaveURL(new RegExp(`[?&]q=${toConfirm.reference}`));
  await expect(inbox.locator('tbody tr')).toHaveCount(1);
  await page.goBack();
  await expect(page.getByLabel('Search')).toHaveValue('');
  await expect(inbox.getByRole('link', { name: alreadyConfirmed.reference })).toBeVisible();

  await page.getByLabel('Status').selectOption({ label: 'Confirmed' });
  await expect(page).toHaveURL(/[?&]status=confirmed/);
  await expect(inbox.getByRole('link', { name: alreadyConfirmed.reference })).toBeVisible();
  await expect(inbox.getByRole('link', { name: toConfirm.reference })).toHaveCount(0);
  const statuses = await inbox
    .locator('tbody tr')
    .evaluateAll((rows) => rows.map((r) => r.querySelectorAll('td')[5]?.textContent ?? ''));
  expect(statuses.length).toBeGreaterThan(0);
  expect(statuses.every((s) => s.includes('Confirmed'))).toBe(true);

  await inbox.getByRole('link', { name: alreadyConfirmed.reference }).click();
  await expect(
    page.getByRole('heading', { level: 1, name: alreadyConfirmed.reference }),
  ).toBeVisible();
  await expect(page.getByRole('button', { name: 'Mark as served…' })).toBeVisible();
  await expect(page.getByRole('region', { name: 'History' })).toContainText(
    'Status: To confirm → Confirmed',
  );
  await still(page, 'admin-order-detail');

  // The deposit's receipt, fetched with the chef's token and saved under the order's reference.
  const payments = page.getByRole('region', { name: 'Payments and refunds' });
  const [receipt] = await Promise.all([
    page.waitForEvent('download'),
    payments.getByRole('button', { name: /^PDF receipt for the deposit of .+$/ }).click(),
  ]);
  expect(receipt.suggestedFilename()).toMatch(new RegExp(`${alreadyConfirmed.reference}.*\\.pdf$`));
  const head = await new Promise<string>((resolve, reject) => {
    void receipt.createReadStream().then((stream) => {
      stream.once('data', (chunk: Buffer) => resolve(chunk.subarray(0, 5).toString('latin1')));
      stream.once('error', reject);
    }, reject);
  });
  expect(head).toBe('%PDF-');

  // Back keeps the filter.
  await page.goBack();
  await expect(page).toHaveURL(/[?&]status=confirmed/);
  await expect(page.getByLabel('Status')).toHaveValue('confirmed');

  // The request to confirm, found with the other filter: first its detail and dialog on a phone.
  await page.getByLabel('Status').selectOption({ label: 'To confirm' });
  await expect(page).toHaveURL(/[?&]status=requested/);
  await inbox.getByRole('link', { name: toConfirm.reference }).click();
  await expect(page.getByRole('heading', { level: 1, name: toConfirm.reference })).toBeVisible();
  await page.setViewportSize(phone);
  await expect(page.getByRole('region', { name: 'Who opened the guest details' })).toContainText(
    /Opened \d+ times?/,
  );
  await still(page, 'admin-order-detail-phone');
  await page.getByRole('button', { name: 'Confirm…' }).click();
  const dialog = page.getByRole('alertdialog', { name: `Confirm ${toConfirm.reference}?` });
  await expect(dialog).toBeVisible();
  await still(page, 'admin-order-confirm-phone');
  await dialog.getByRole('button', { name: 'Go back' }).click();
  await expect(dialog).toBeHidden();

  // Then, at desktop width, confirmed end to end.
  await page.setViewportSize(desktop);
  await page.getByRole('button', { name: 'Confirm…' }).click();
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('It joins the prep plan');
  await still(page, 'admin-order-confirm');
  await dialog.getByRole('button', { name: 'Confirm booking' }).click();

  if (hasConflicts) {
    await expect(dialog).toContainText('Not confirmed yet: the kitchen’s checks found problems');
    await expect(dialog).toContainText('This booking cannot be confirmed yet');
    await dialog.getByRole('button', { name: 'Confirm anyway' }).click();
    await expect(dialog).toContainText('Give the reason for confirming anyway');
    await dialog.getByLabel(/Why confirm anyway/).fill('Nut-free plate agreed with the host');
    await still(page, 'admin-order-confirm-gate');
    await dialog.getByRole('button', { name: 'Confirm anyway' }).click();
  }
  await expect(dialog).toBeHidden();
  await expect(page.getByRole('status').filter({ hasText: /is confirmed/ })).toContainText(
    toConfirm.reference,
  );
  await expect(page.getByRole('button', { name: 'Mark as served…' })).toBeVisible();
  const history = page.getByRole('region', { name: 'History' });
  await expect(history).toContainText('Status: To confirm → Confirmed');
  await expect(history).toContainText('Confirmed by the chef; added to the prep plan');
  await expect(history).toContainText(/\(chef\)/);
  if (hasConflicts) {
    await expect(history).toContainText('Reason: “Nut-free plate agreed with the host”');
  }
  await still(page, 'admin-order-confirmed');

  // The server agrees.
  const saved = await page.request.get(`${api}/orders/${toConfirm.id}`, {
    headers: auth(chefToken),
  });
  expect(((await saved.json()) as { status: string }).status).toBe('confirmed');

  // The inbox on a phone.
  await page.getByRole('link', { name: 'All orders' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Orders' })).toBeVisible();
  await expect(page).toHaveURL(/\/orders$/);
  await page.setViewportSize(phone);
  await expect(inbox.getByRole('link', { name: toConfirm.reference })).toBeVisible();
  await still(page, 'admin-orders-inbox-phone');

  // The calendar of the event's month: the grid, then the phone's list.
  const month = toConfirm.eventDate.slice(0, 7);
  await page.setViewportSize(desktop);
  await page.getByRole('link', { name: 'Calendar', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Calendar' })).toBeVisible({
    timeout: 30_000,
  });
  const label = new Intl.DateTimeFormat('en-GB', {
    month: 'long',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(Date.parse(`${month}-15T12:00:00Z`));
  for (let i = 0; i < 4; i += 1) {
    if (await page.getByRole('heading', { level: 2, name: label }).isVisible()) break;
    await page.getByRole('link', { name: 'Next month' }).click();
  }
  await expect(page.getByRole('heading', { level: 2, name: label })).toBeVisible();
  await expect(page).toHaveURL(new RegExp(`month=${month}|/calendar$`));
  const day = page.locator(`td[data-date="${toConfirm.eventDate}"]`);
  await expect(day.getByRole('link', { name: new RegExp(toConfirm.reference) })).toBeVisible();
  await expect(day).toContainText('Confirmed');
  await still(page, 'admin-calendar');
  await page.setViewportSize(phone);
  const item = page.locator(`li[data-date="${toConfirm.eventDate}"]`);
  await expect(item.getByRole('link', { name: new RegExp(toConfirm.reference) })).toBeVisible();
  await still(page, 'admin-calendar-phone');
});
