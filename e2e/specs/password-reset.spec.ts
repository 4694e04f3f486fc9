import { expect, test, type Page } from '@playwright/test';
import { snap, urls } from '../support/env';

const mailUrl = process.env.NAPPE_MAIL_URL ?? 'http://localhost:1080';
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 900 };

interface InboxMessage {
  to: { address: string }[];
  subject: string;
  text?: string;
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

async function signIn(page: Page, email: string, password: string) {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

// "Forgot your password?" on the running system: the API queues the e-mail in its outbox, the
// worker sends it to the local mail sink (maildev), and its REST API hands the link back.
test('a client asks for a link, opens it from the e-mail, sets a new password and signs in with it; the old password fails', async ({
  page,
  request,
}) => {
  test.setTimeout(150_000);
  page.setDefaultNavigationTimeout(60_000);
  await page.setViewportSize(DESKTOP);
  const email = `reset-${Date.now()}@example.test`;
  const oldPassword = 'rhubarb fool with stem ginger';
  const newPassword = 'blackcurrant leaf and cold cream';

  // A client of our own for this run (the demo client's password stays as the other specs expect).
  // `request` keeps its own cookies: the browser page below is not signed in.
  const created = await request.post(`${urls.api}/auth/register`, {
    data: { name: 'Ines Faraday', email, password: oldPassword },
  });
  expect(created.status()).toBe(201);

  await page.goto(`${urls.storefront}/sign-in`);
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(
    page.getByRole('heading', { level: 1, name: 'Forgot your password?' }),
  ).toBeVisible();
  await snapBoth(page, 'storefront-forgot-password');
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send me a link' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Check your e-mail' })).toBeVisible();
  await expect(page.getByText(`If an account uses ${email}, we have sent it a link`)).toBeVisible();
  await snapBoth(page, 'storefront-reset-link-sent');

  // The outbox worker sends the e-mail; maildev's REST API holds it.
  let token = '';
  await expect
    .poll(
      async () => {
        const inbox = (await (await request.get(`${mailUrl}/email`)).json()) as InboxMessage[];
        const message = inbox.find(
          (m) => m.to.some((t) => t.address === email) && /new password/.test(m.subject),
        );
        const match = /\/reset-password\?token=([A-Za-z0-9_-]{43})/.exec(message?.text ?? '');
        token = match?.[1] ?? '';
        return token;
      },
      { timeout: 30_000, intervals: [1000] },
    )
    .not.toBe('');
  const link = `${urls.storefront}/reset-password?token=${token}`;

  await page.goto(link);
  await expect(
    page.getByRole('heading', { level: 1, name: 'Choose a new password' }),
  ).toBeVisible();
  await snapBoth(page, 'storefront-reset-password');
  // A password that is too easy to guess: the API's verdict, on the field.
  await page.getByLabel('New password', { exact: true }).fill('password1234');
  await page.getByRole('button', { name: 'Save the new password' }).click();
  await expect(page.getByText(/This password is too easy to guess/)).toBeVisible();
  await page.getByLabel('New password', { exact: true }).fill(newPassword);
  await page.getByRole('button', { name: 'Save the new password' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Password changed' })).toBeVisible();
  await snapBoth(page, 'storefront-password-changed');

  await page.getByRole('main').getByRole('link', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await signIn(page, email, oldPassword);
  await expect(page.getByText('Wrong e-mail or password.')).toBeVisible();
  await signIn(page, email, newPassword);
  await expect(page.getByRole('heading', { level: 1, name: 'My events' })).toBeVisible();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('link', { name: /Sign in/ }).first()).toBeVisible();

  // The same link a second time: used, said plainly, with a way to ask again.
  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill('another evening of plum tart');
  await page.getByRole('button', { name: 'Save the new password' }).click();
  await expect(
    page.getByRole('heading', { level: 1, name: 'This link cannot be used' }),
  ).toBeVisible();
  await expect(
    page.getByText('This reset link has expired or was already used. Ask for a new one.'),
  ).toBeVisible();
  await expect(page.getByRole('link', { name: 'Ask for a new link' })).toBeVisible();
  await snapBoth(page, 'storefront-reset-link-used');
});

test('the kitchen app links its Sign in to the same reset, for the chef and staff', async ({
  page,
}) => {
  page.setDefaultNavigationTimeout(60_000);
  await page.goto(`${urls.admin}/sign-in`);
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(
    page.getByRole('heading', { level: 1, name: 'Forgot your password?' }),
  ).toBeVisible();
  await snapBoth(page, 'admin-forgot-password');
  await page.goto(`${urls.admin}/reset-password?token=cut`);
  await expect(
    page.getByRole('heading', { level: 1, name: 'This link cannot be used' }),
  ).toBeVisible();
});
