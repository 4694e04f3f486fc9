// `npm run demo`: build, migrate, seed the demo studio, start everything, print where it is.
// Ctrl-C stops every process.
import { performance } from 'node:perf_hooks';
import {
  assertPortsFree,
  buildAll,
  DEMO_ACCOUNTS,
  DEMO_PASSWORD,
  migrateAndSeed,
  startSystem,
  systemConfig,
  waitUntilReady,
} from './lib/system.mjs';

const started = performance.now();
// `npm run dev`: the same system with both apps served from source by Vite (edits show at once).
const live = process.argv.includes('--live');
const config = systemConfig();
try {
  await assertPortsFree(Object.values(config.ports));
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  console.error(
    'Is the demo already running? Stop it with Ctrl-C, or move ports with NAPPE_*_PORT.',
  );
  process.exit(1);
}

if (process.env.NAPPE_SKIP_BUILD !== '1') {
  console.log(live ? 'Building shared and api…' : 'Building shared, api, storefront and admin…');
  buildAll({ live });
}
console.log(`Preparing the database at ${config.databasePath}…`);
migrateAndSeed(config);

const system = startSystem(config, { live });
let stopping = false;
const stop = () => {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping Nappe…');
  system.stop();
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);

system.result.then(
  () => process.exit(0),
  () => process.exit(stopping ? 0 : 1),
);

try {
  await waitUntilReady(config);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  stop();
  process.exitCode = 1;
}

if (!stopping) {
  const { urls } = config;
  const seconds = ((performance.now() - started) / 1000).toFixed(1);
  /** @param {string} s */
  const pad = (s) => s.padEnd(12);
  console.log(`
  Nappe is running (ready in ${seconds} s). Ctrl-C stops everything.

  ${pad('Storefront')}${urls.storefront}      clients browse, book and pay
  ${pad('Admin')}${urls.admin}      the chef and staff
  ${pad('API')}${urls.api}  (OpenAPI: ${urls.apiDocs})
  ${pad('Mail inbox')}${urls.mail}      every e-mail the system sends
  ${pad('Payments')}${urls.payments}     local test payment service (no real money)

  Demo accounts (password ${DEMO_PASSWORD}):
${DEMO_ACCOUNTS.map((a) => `    ${pad(a.role)}${a.email.padEnd(20)} → ${urls[/** @type {'admin' | 'storefront'} */ (a.app)]}`).join('\n')}
`);
}
