// Browser tests: start the real system on its own ports and a fresh database, run the
// Playwright suite in Debian's Chromium against it, stop everything. Never skips: a missing
// browser is a failure with the command that installs it.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  assertPortsFree,
  buildAll,
  migrateAndSeed,
  ROOT,
  startSystem,
  systemConfig,
  waitUntilReady,
} from './lib/system.mjs';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!existsSync(CHROMIUM)) {
  console.error(`Chromium not found at ${CHROMIUM}. Install it with: apt-get install -y chromium`);
  process.exit(1);
}

const dataDir = mkdtempSync(join(tmpdir(), 'nappe-browser-'));
const testEnv = {
  NAPPE_API_PORT: '3100',
  NAPPE_STOREFRONT_PORT: '5183',
  NAPPE_ADMIN_PORT: '5184',
  NAPPE_SMTP_PORT: '1125',
  NAPPE_MAIL_WEB_PORT: '1180',
  NAPPE_PAYMENT_PORT: '12121',
  DATABASE_PATH: join(dataDir, 'nappe.sqlite'),
};
const config = systemConfig({ ...process.env, ...testEnv });

await assertPortsFree(Object.values(config.ports));
if (process.env.NAPPE_SKIP_BUILD !== '1') buildAll();
migrateAndSeed(config);
const system = startSystem(config, {
  quiet: process.env.NAPPE_SYSTEM_LOGS !== '1',
  env: { LOG_LEVEL: 'warn' },
});
let status = 1;
try {
  await waitUntilReady(config);
  const result = spawnSync(
    'npx',
    ['playwright', 'test', '--config', 'e2e/playwright.config.ts', ...process.argv.slice(2)],
    {
      cwd: ROOT,
      stdio: 'inherit',
      env: {
        ...process.env,
        CHROMIUM_PATH: CHROMIUM,
        NAPPE_STOREFRONT_URL: config.urls.storefront,
        NAPPE_ADMIN_URL: config.urls.admin,
        NAPPE_API_URL: config.urls.api,
        NAPPE_MAIL_URL: config.urls.mail,
        NAPPE_PAYMENTS_URL: config.urls.payments,
      },
    },
  );
  status = result.status ?? 1;
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
} finally {
  system.stop();
  await system.result.catch(() => undefined);
  rmSync(dataDir, { recursive: true, force: true });
}
process.exit(status);
