import { expect, test, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { demo, DEMO_PASSWORD, snap, urls } from '../support/env';

const mailUrl = process.env.NAPPE_MAIL_URL ?? 'http://localhost:1080';
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 900 };

interface InboxMessage {
  to: { address: string }[];
  subject: string;
  text?: string;
}

// The chef's studio screens against the running system: Insights, Settings, Team invitations
// and the invited member's Accept-invitation page. Sign-in is rate limited, so the chef signs in
// once for the whole file and the screens share one page.

let chefContext: BrowserContext;
let chef: Page;

async function newDesktopPage(browser: Browser) {
  const context = await browser.newContext({ viewport: DESKTOP });
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  // The admin app may be served live from source: a first visit compiles its modules.
  page.setDefaultNavigationTimeout(60_000);
  return { context, page };
}

/** A screenshot at desktop width, then the same screen at phone width. */
async function snapBoth(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.setViewportSize(DESKTOP);
  await snap(page, `${name}-desktop`);
  await page.setViewportSize(PHONE);
  await snap(page, `${name}-phone`);
  await page.setViewportSize(DESKTOP);
}

test.describe.configure({ mode: 'serial' });

test.beforeAll(async ({ browser }) => {
  test.setTimeout(120_000);
  ({ context: chefContext, page: chef } = await newDesktopPage(browser));
  await chef.goto(`${urls.admin}/sign-in`);
  await chef.getByLabel('E-mail').fill(demo.chef);
  await chef.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await chef.getByRole('button', { name: 'Sign in' }).click();
  await expect(chef.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await expect(chef).not.toHaveURL(/sign-in/);
});

test.afterAll(async () => {
  await chefContext?.close();
});

test('the chef opens Insights: the next two weeks, alerts and charts with their figures in words', async () => {
  test.setTimeout(90_000);
  await chef.goto(`${urls.admin}/insights`);
  // A screen served live from source compiles on its first visit (recharts included): wait longer.
  await expect(chef.getByRole('heading', { level: 1, name: 'The studio in figures' })).toBeVisible({
    timeout: 60_000,
  });
  // The seed books confirmed events over the next two weeks, some with allergy conflicts.
  const upcoming = chef.getByRole('region', { name: /^Next 14 days \(\d+\)$/ });
  await expect(upcoming).toBeVisible();
  await expect(upcoming.getByRole('link').first()).toHaveAttribute('href', /^\/orders\//);
  await expect(chef.getByRole('region', { name: /^Needs your attention/ })).toBeVisible();
  for (const chart of ['Revenue by month', 'Plates by week']) {
    const region = chef.getByRole('region', { name: chart });
    await expect(region).toBeVisible();
    // The drawing is there for the eye; its table is there for screen readers.
    await expect(region.locator('svg.recharts-surface')).toBeVisible();
    await expect(region.getByRole('table')).toHaveCount(1);
  }
  // Food cost is drawn once events have been served (the seed's are all ahead); the table is always there.
  await expect(
    chef.getByRole('region', { name: 'Food cost over time' }).getByRole('table'),
  ).toHaveCount(1);
  await snapBoth(chef, 'admin-insights');
});

test('the chef changes a setting, sees it saved, and restores it', async () => {
  test.setTimeout(90_000);
  await chef.goto(`${urls.admin}/studio/settings`);
  const spare = chef.getByLabel('Spare plates');
  await expect(spare).toBeVisible({ timeout: 60_000 });
  const original = await spare.inputValue();
  const changed = String(Number(original) >= 100 ? Number(original) - 1 : Number(original) + 1);

  await spare.fill(changed);
  await expect(chef.getByText('Unsaved changes')).toBeVisible();
  await snapBoth(chef, 'admin-settings');
  await chef.getByRole('button', { name: 'Save settings' }).click();
  await expect(chef.getByText('Settings saved: spare plates.')).toBeVisible();

  await chef.reload();
  await expect(chef.getByLabel('Spare plates')).toHaveValue(changed);

  await chef.getByLabel('Spare plates').fill(original);
  await chef.getByRole('button', { name: 'Save settings' }).click();
  await expect(chef.getByText('Settings saved: spare plates.')).toBeVisible();
  await chef.reload();
  await expect(chef.getByLabel('Spare plates')).toHaveValue(original);
});

test('the chef invites staff; the link from the e-mail signs the new member in as staff', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const email = `staff2-${Date.now()}@nappe.test`;
  const name = 'Sami Okafor';

  await chef.goto(`${urls.admin}/studio/team`);
  const invite = chef.getByRole('region', { name: 'Invite a team member' });
  await expect(invite).toBeVisible({ timeout: 60_000 });
  await invite.getByLabel('Name').fill(name);
  await invite.getByLabel('E-mail').fill(email);
  await invite.getByLabel('Role').selectOption('staff');
  await invite.getByRole('button', { name: 'Send invitation' }).click();
  await expect(
    chef.getByText(`Invitation sent to ${email}. The link in the e-mail works once, for 7 days.`),
  ).toBeVisible();
  await expect(
    chef.getByRole('list', { name: 'Pending invitations' }).getByText(email),
  ).toBeVisible();
  await snapBoth(chef, 'admin-team');

  // The outbox worker sends the e-mail; maildev's REST API holds it.
  let link = '';
  await expect
    .poll(
      async () => {
        const inbox = (await (await chef.request.get(`${mailUrl}/email`)).json()) as InboxMessage[];
        const message = inbox.find((m) => m.to.some((t) => t.address === email));
        const token = /\/accept-invitation\?token=([A-Za-z0-9_-]{43})/.exec(message?.text ?? '');
        link = token ? `${urls.admin}/accept-invitation?token=${token[1]}` : '';
        return link;
      },
      { timeout: 30_000, intervals: [1000] },
    )
    .not.toBe('');

  // A new browser with nobody signed in, as the invited person's own.
  const { context: newcomerContext, page: newcomer } = await newDesktopPage(browser);
  try {
    await newcomer.goto(link);
    await expect(newcomer.getByRole('heading', { level: 1, name: 'Join the team' })).toBeVisible({
      timeout: 60_000,
    });
    await snapBoth(newcomer, 'admin-accept-invitation');
    await newcomer.getByLabel('Your name').fill(name);
    await newcomer.getByLabel('Choose a password').fill('copper pans and quince paste at dawn');
    await newcomer.getByRole('button', { name: 'Join the team' }).click();

    await expect(newcomer).toHaveURL(`${urls.admin}/`);
    await expect(newcomer.getByRole('heading', { level: 1, name: /Sami/ })).toBeVisible();
    const account = newcomer.getByRole('complementary', { name: 'Kitchen app' });
    await expect(account.getByText(email)).toBeVisible();
    await expect(account.getByText('Staff', { exact: true })).toBeVisible();
    // Staff have no Studio section.
    await expect(newcomer.getByRole('link', { name: 'Settings' })).toHaveCount(0);
    await snap(newcomer, 'admin-accepted-today-desktop');

    // The same link a second time: used, said plainly.
    await newcomer.goto(link);
    await newcomer.getByLabel('Your name').fill(name);
    await newcomer.getByLabel('Choose a password').fill('copper pans and quince paste at dawn');
    await newcomer.getByRole('button', { name: 'Join the team' }).click();
    await expect(newcomer.getByText(/This invitation has already been used/)).toBeVisible();
  } finally {
    await newcomerContext.close();
  }

  // Tidy up: the chef removes the new member (after confirming), so runs do not pile up accounts.
  await chef.goto(`${urls.admin}/studio/team`);
  const table = chef.getByRole('table', { name: 'Accounts at the studio' });
  await expect(table).toBeVisible();
  for (let page = 1; page < 20; page += 1) {
    if ((await table.getByText(email).count()) > 0) break;
    await chef.getByRole('button', { name: 'Next page' }).click();
  }
  const row = table.getByRole('row').filter({ hasText: email });
  await row.getByRole('button', { name: `Remove ${name}` }).click();
  const dialog = chef.getByRole('alertdialog', { name: `Remove ${name} from the team?` });
  await expect(dialog.getByText(/next request/)).toBeVisible();
  await dialog.getByRole('button', { name: 'Remove from the team' }).click();
  await expect(chef.getByText(`${name} was removed from the team.`)).toBeVisible();
});
