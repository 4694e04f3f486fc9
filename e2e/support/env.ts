/** Where the system under test is; set by docker-free-scripts/browser-tests.mjs. */
export const urls = {
  storefront: process.env.NAPPE_STOREFRONT_URL ?? 'http://localhost:5173',
  admin: process.env.NAPPE_ADMIN_URL ?? 'http://localhost:5174',
  api: process.env.NAPPE_API_URL ?? 'http://localhost:3000/api',
};

export const DEMO_PASSWORD = 'plated-demo-2026';
export const demo = {
  chef: 'chef@nappe.test',
  staff: 'staff@nappe.test',
  client: 'client@nappe.test',
};

/** Screenshots people look at, kept under test-results/screens. */
export const shot = (name: string) => `test-results/screens/${name}.png`;

/** Waits until the page's web fonts have loaded, so screenshots show the real type. */
export async function fontsReady(page: import('@playwright/test').Page): Promise<void> {
  await page.evaluate(async () => {
    await document.fonts.ready;
  });
}

/** A full-page screenshot under test-results/screens, taken once the fonts are in. */
export async function snap(page: import('@playwright/test').Page, name: string): Promise<void> {
  await fontsReady(page);
  await page.screenshot({ path: shot(name), fullPage: true });
}
