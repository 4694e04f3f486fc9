import { expect, request, test, type Locator, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, snap, urls } from '../support/env';

/**
 * Allergy notes against the seeded demo (api/src/database/demo-orders-seed.ts): the summer
 * garden party (Garden Supper, 40 guests) has Elise, allergic to tree nuts, with no change yet
 * to her Pistachio Frost, whose crumble holds almonds and whose parfait holds pistachios —
 * both "nuts" under Regulation (EU) No 1169/2011, Annex II item 8. The spec changes her plate
 * and removes the change again, so it leaves the data as it found it.
 */

async function signIn(page: Page, email: string) {
  await page.goto(urls.admin);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Signed in: the app's shell is there (Today's own content is another screen's business).
  await expect(page).not.toHaveURL(/sign-in/);
  await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
}

async function noSideways(page: Page) {
  const overflow = await page.evaluate(
    () => document.documentElement.scrollWidth - window.innerWidth,
  );
  expect(overflow, 'the page scrolls sideways').toBeLessThanOrEqual(0);
}

/** The event card on the list: a menu and a guest count pick one seeded event. */
function eventCard(page: Page, menu: string, guests: number): Locator {
  return page
    .getByRole('listitem')
    .filter({ has: page.getByRole('heading', { level: 3, name: new RegExp(menu) }) })
    .filter({ hasText: `${guests} guests` });
}

/** The event whose notes the chef changed, while a change of this spec may be left on it. */
let changedOrderId: string | null = null;

/** Removes Elise's change through the API if a failed run left one behind. */
test.afterAll(async () => {
  if (!changedOrderId) return;
  const api = await request.newContext();
  try {
    const login = await api.post(`${urls.api}/auth/login`, {
      data: { email: demo.chef, password: DEMO_PASSWORD },
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const headers = { Authorization: `Bearer ${accessToken}` };
    const base = `${urls.api}/orders/${changedOrderId}`;
    const notes = (await (await api.get(`${base}/allergy-notes`, { headers })).json()) as {
      guests: Array<{
        guestId: number;
        label: string;
        plates: Array<{ dessertId: string; substitution: unknown }>;
      }>;
    };
    const elise = notes.guests.find((g) => g.label === 'Elise');
    for (const plate of elise?.plates ?? []) {
      if (plate.substitution) {
        await api.delete(`${base}/guests/${elise!.guestId}/substitutions/${plate.dessertId}`, {
          headers,
        });
      }
    }
  } finally {
    await api.dispose();
  }
});

test('the chef finds the tree-nut guest flagged against the almond crumble, changes her plate and sees it clear', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  try {
    await signIn(page, demo.chef);
    await page.getByRole('link', { name: 'Allergy notes' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Allergy notes' })).toBeVisible();
    const garden = eventCard(page, 'Garden Supper', 40);
    await expect(garden.getByText('1 plate to resolve')).toBeVisible();
    await snap(page, 'allergy-notes-list');

    await garden.getByRole('link', { name: /^Open notes/ }).click();
    const orderId = new URL(page.url()).pathname.split('/').pop()!;
    const elise = page.getByRole('article', { name: 'Elise' });
    await expect(elise.getByText('Allergy: Tree nuts')).toBeVisible();
    const frost = elise.getByRole('region', { name: 'Pistachio Frost' });
    await expect(frost.getByText('Conflicts — to resolve')).toBeVisible();
    // The flag names the crumble, the allergen and the ingredient that brings it.
    const crumble = frost
      .getByRole('list', { name: 'Conflicts of Pistachio Frost for Elise' })
      .getByRole('listitem')
      .filter({ hasText: 'Brown-butter almond crumble' });
    await expect(crumble).toContainText(
      'Brown-butter almond crumble — contains tree nuts (almonds)',
    );
    await expect(crumble).toContainText('From Almond flour, blanched');
    await snap(page, 'allergy-notes-event-chef');

    // Replace the crumble: checked again, the parfait's pistachios still conflict.
    await frost.getByRole('button', { name: 'Record a change: Elise, Pistachio Frost' }).click();
    const form = page.getByRole('form', { name: 'Change Elise’s Pistachio Frost' });
    await form
      .getByRole('combobox', { name: 'What happens to Brown-butter almond crumble' })
      .selectOption('replace');
    await form
      .getByRole('combobox', { name: 'Replace Brown-butter almond crumble with' })
      .selectOption({ label: 'Brown-butter rye crumble' });
    await snap(page, 'allergy-notes-substitution-form');
    changedOrderId = orderId;
    await form.getByRole('button', { name: 'Save and check again' }).click();
    await expect(
      frost.getByText(
        'Checked again: Elise’s Pistachio Frost still conflicts (Frozen pistachio parfait).',
      ),
    ).toBeVisible();
    await expect(frost.getByText('Changed — still conflicts')).toBeVisible();

    // Leave out the parfait as well: the flag clears.
    await frost.getByRole('button', { name: 'Edit the change: Elise, Pistachio Frost' }).click();
    await form
      .getByRole('combobox', { name: 'What happens to Frozen pistachio parfait' })
      .selectOption('leave_out');
    await form.getByRole('button', { name: 'Save and check again' }).click();
    await expect(
      frost.getByText('Checked again: nothing on Elise’s changed Pistachio Frost conflicts now.'),
    ).toBeVisible();
    await expect(frost.getByText('Changed — cleared')).toBeVisible();
    await expect(elise.getByText('Every plate fits')).toBeVisible();
    await expect(
      page.getByRole('list', { name: 'This event at a glance' }).getByText('No conflict left'),
    ).toBeVisible();
    await snap(page, 'allergy-notes-substitution-cleared');

    // The chef sees who opened the guests' data.
    const log = page.getByRole('region', { name: 'Who opened the guests’ data' });
    await expect(log.getByText('Opened the allergy notes').first()).toBeVisible();

    // Remove the change again, after confirming: the data is as the spec found it.
    await frost.getByRole('button', { name: 'Remove the change' }).click();
    const dialog = page.getByRole('alertdialog');
    await expect(dialog.getByText('Remove the change to Elise’s Pistachio Frost?')).toBeVisible();
    await dialog.getByRole('button', { name: 'Remove the change' }).click();
    await expect(
      frost.getByText('Change removed: Elise’s Pistachio Frost conflicts again.'),
    ).toBeVisible();
    await expect(frost.getByText('Conflicts — to resolve')).toBeVisible();
    changedOrderId = null;

    // The same screen at phone width.
    await page.setViewportSize({ width: 390, height: 844 });
    await expect(elise.getByText('Allergy: Tree nuts')).toBeVisible();
    await noSideways(page);
    await snap(page, 'allergy-notes-event-chef-phone');
  } finally {
    await context.close();
  }
});

test('staff open the briefing on a phone: by table, what changes and why, no edit controls', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const context = await browser.newContext({
    viewport: { width: 390, height: 844 },
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
    acceptDownloads: true,
  });
  const page = await context.newPage();
  try {
    await signIn(page, demo.staff);
    await page.getByRole('button', { name: 'Open menu' }).click();
    await page.getByRole('link', { name: 'Allergy notes' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Allergy notes' })).toBeVisible();
    await noSideways(page);
    await snap(page, 'allergy-notes-list-staff-phone');

    // The wedding: 60 guests on the Celebration Trio.
    await eventCard(page, 'Celebration Trio', 60)
      .getByRole('link', { name: /^Staff briefing/ })
      .click();
    await expect(page.getByRole('heading', { level: 1, name: 'Wedding dinner' })).toBeVisible();
    await expect(page.getByRole('heading', { level: 2, name: 'Table 3' })).toBeVisible();
    const seat = page.getByRole('article', { name: 'Table 3, seat 4' });
    await expect(
      seat.getByText('Replace Brown-butter almond crumble with Brown-butter rye crumble'),
    ).toBeVisible();
    await expect(
      seat.getByText('NOT RESOLVED — ask the chef before serving').first(),
    ).toBeVisible();
    await expect(
      page.getByRole('button', { name: /Record a change|Edit the change|Remove/ }),
    ).toHaveCount(0);
    await noSideways(page);
    await snap(page, 'staff-briefing-phone');

    // The PDF comes through the session (a Bearer token), as a download.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download PDF' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^allergy-briefing-N-\d{4}-\d{4}\.pdf$/);

    // On paper: the briefing only, without the app's bar and buttons.
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByRole('button', { name: 'Download PDF' })).toBeHidden();
    await expect(page.getByRole('button', { name: 'Open menu' })).toBeHidden();
    await snap(page, 'staff-briefing-print');
    await page.emulateMedia({ media: 'screen' });

    // The event's notes: staff read everything, with no control to change a plate.
    await page.getByRole('link', { name: 'The event’s allergy notes' }).click();
    const guest = page.getByRole('article', { name: 'Table 3, seat 4' });
    await expect(guest.getByText('Allergy: Nuts')).toBeVisible();
    await expect(
      page.getByText('Read-only: the chef records the changes to a guest’s plate.'),
    ).toBeVisible();
    await expect(
      page.getByRole('button', { name: /Record a change|Edit the change|Remove/ }),
    ).toHaveCount(0);
    await expect(page.getByRole('combobox')).toHaveCount(0);
    await expect(page.getByRole('heading', { name: 'Who opened the guests’ data' })).toHaveCount(0);
    await noSideways(page);
    await snap(page, 'allergy-notes-event-staff-phone');
  } finally {
    await context.close();
  }
});
