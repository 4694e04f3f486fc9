// `npm test`: everything CI checks, in the order that fails fastest.
//   1. lint and type-check every workspace
//   2. unit tests of every workspace, and the API's e2e tests (supertest on a temporary SQLite file)
//   2b. the API's tests again on PostgreSQL (a private server; installed with apt-get if missing)
//   3. the browser suite in Chromium against the running system
//   4. the durability drill: SIGKILL the API under bookings, five times; nothing acknowledged lost
// Set NAPPE_SKIP_BROWSER=1 to leave out step 3, NAPPE_SKIP_POSTGRES=1 to leave out step 2b, while
// developing (CI never does).
import { spawnSync } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import { ROOT } from './lib/system.mjs';

const steps = [
  ['lint', ['npm', 'run', 'lint', '--silent']],
  ['typecheck', ['npm', 'run', 'typecheck', '--silent']],
  ['unit and API tests', ['npm', 'run', 'test', '--workspaces', '--if-present', '--silent']],
];
if (process.env.NAPPE_SKIP_POSTGRES !== '1') {
  steps.push(['API tests on PostgreSQL', ['node', 'docker-free-scripts/test-postgres.mjs']]);
}
if (process.env.NAPPE_SKIP_BROWSER !== '1') {
  steps.push(['browser tests', ['node', 'docker-free-scripts/browser-tests.mjs']]);
  // Runs on the API build the browser step just made.
  steps.push([
    'durability drill (SIGKILL under writes)',
    ['node', 'docker-free-scripts/crash-drill.mjs'],
  ]);
}

const timings = [];
for (const [name, [command, ...args]] of steps) {
  const start = performance.now();
  console.log(`\n▶ ${name}`);
  const result = spawnSync(command, args, { cwd: ROOT, stdio: 'inherit' });
  const seconds = ((performance.now() - start) / 1000).toFixed(1);
  timings.push(`${name}: ${seconds} s`);
  if (result.status !== 0) {
    console.error(`\n✖ ${name} failed (exit ${result.status}) after ${seconds} s`);
    process.exit(result.status ?? 1);
  }
}
console.log(`\n✔ all checks passed — ${timings.join(' · ')}`);
