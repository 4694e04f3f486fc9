// `npm run test:pg`: the API's whole test suite on PostgreSQL. Starts the private server
// (postgres.mjs; installs Debian's postgresql first when it is missing), runs the API's vitest with
// DB_TYPE=postgres — each test app then gets a database of its own on that server — and stops the
// server again (unless it was already running before, for someone else).
// Arguments go to vitest: `npm run test:pg -- test/booking.e2e-spec.ts`.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { ROOT } from './lib/system.mjs';
import { dropTestDatabases, postgresConfig, startPostgres, stopPostgres } from './postgres.mjs';

const started = performance.now();
const config = postgresConfig();
const { url, alreadyRunning } = startPostgres(config);
dropTestDatabases(config);
console.log(`PostgreSQL ready on 127.0.0.1:${config.port}; running the API's tests on it…`);

// Ctrl-C reaches vitest too; this process stays to stop the server after it.
process.on('SIGINT', () => undefined);
process.on('SIGTERM', () => undefined);

// Two test files at a time: on PostgreSQL a test mostly waits for the server (a process of its
// own, and a commit waits for its fsync), so a second worker about halves the run on two cores
// (measured here: 8.1 min with one worker, 3.5 to 4.6 min with two). Each file has its own
// databases, and advisory locks are per database.
const args = process.argv.slice(2);
const workers = args.some((a) => a.startsWith('--maxWorkers')) ? [] : ['--maxWorkers=2'];

let status;
try {
  const result = spawnSync('npx', ['vitest', 'run', ...workers, ...args], {
    cwd: join(ROOT, 'api'),
    stdio: 'inherit',
    env: { ...process.env, DB_TYPE: 'postgres', DATABASE_URL: url },
  });
  status = result.status ?? 1;
} finally {
  if (!alreadyRunning) stopPostgres(config);
}
const seconds = ((performance.now() - started) / 1000).toFixed(1);
console.log(`API tests on PostgreSQL ${status === 0 ? 'passed' : 'FAILED'} in ${seconds} s`);
process.exit(status);
