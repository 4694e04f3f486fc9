// A private PostgreSQL server for the API's PostgreSQL path, from Debian's packages, no containers.
//
//   node docker-free-scripts/postgres.mjs start   install (apt-get) if missing, create the cluster,
//                                                 start it, create role and database, print the URL
//   node docker-free-scripts/postgres.mjs stop    stop it (the data stays)
//   node docker-free-scripts/postgres.mjs status  say whether it runs, and its URL
//
// Both commands are idempotent: `start` on a running server only makes sure of the role and the
// database. It never touches the system cluster (`15 main`, port 5432): the cluster lives in its
// own directory and listens on 127.0.0.1 only, on its own port.
//
// Settings (environment):
//   NAPPE_PG_DIR       where the cluster, its socket and its log live (default /tmp/nappe-postgres)
//   NAPPE_PG_PORT      port on 127.0.0.1 (default 5433)
//   NAPPE_PG_PASSWORD  password of the `nappe` role (default: a fixed local-only one)
import { spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { userInfo } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

export const DEFAULT_PG_DIR = '/tmp/nappe-postgres';
export const DEFAULT_PG_PORT = 5433;
/** For a server on loopback that lives in /tmp; set NAPPE_PG_PASSWORD anywhere else. */
export const DEFAULT_PG_PASSWORD = 'nappe-local-only';
export const PG_ROLE = 'nappe';
export const PG_DATABASE = 'nappe';
const DEBIAN_PG_ROOT = '/usr/lib/postgresql';

/**
 * @typedef {{ dir: string, dataDir: string, logFile: string, port: number, password: string }} PgConfig
 */

/**
 * The server's settings from the environment, checked.
 * @param {NodeJS.ProcessEnv} env
 * @returns {PgConfig}
 */
export function postgresConfig(env = process.env) {
  const dir = env.NAPPE_PG_DIR?.trim() || DEFAULT_PG_DIR;
  if (!dir.startsWith('/')) throw new Error(`NAPPE_PG_DIR must be an absolute path (got ${dir})`);
  const rawPort = env.NAPPE_PG_PORT?.trim() || String(DEFAULT_PG_PORT);
  const port = Number(rawPort);
  if (!/^\d+$/.test(rawPort) || port < 1024 || port > 65535)
    throw new Error(`NAPPE_PG_PORT must be a port number from 1024 to 65535 (got ${rawPort})`);
  const password = env.NAPPE_PG_PASSWORD ?? DEFAULT_PG_PASSWORD;
  if (password.length < 8) throw new Error('NAPPE_PG_PASSWORD must be at least 8 characters');
  return { dir, dataDir: join(dir, 'data'), logFile: join(dir, 'server.log'), port, password };
}

/**
 * The URL the API connects with (`DATABASE_URL`): role `nappe`, database `nappe`, on loopback.
 * @param {PgConfig} config
 * @param {string} [database]
 */
export function databaseUrl(config, database = PG_DATABASE) {
  const url = new URL(`postgres://127.0.0.1:${config.port}/`);
  url.username = PG_ROLE;
  // Encoded first: the URL setter leaves `%` (and a few others) as they are, which a reader
  // would then take for an escape.
  url.password = encodeURIComponent(config.password);
  url.pathname = `/${database}`;
  return url.href;
}

/**
 * The newest PostgreSQL among Debian's installed versions (`/usr/lib/postgresql/<version>`), or
 * null when none has `initdb`.
 * @param {string[]} versions directory names
 * @param {(version: string) => boolean} hasInitdb
 */
export function pickVersion(versions, hasInitdb) {
  const usable = versions.filter((v) => /^\d+(\.\d+)?$/.test(v) && hasInitdb(v));
  usable.sort((a, b) => Number(b) - Number(a));
  return usable[0] ?? null;
}

/**
 * A string as an SQL literal: single quotes doubled (PostgreSQL docs, 4.1.2.1 "String Constants").
 * @param {string} value
 */
export function sqlLiteral(value) {
  if (value.includes('\0')) throw new Error('An SQL string cannot contain a NUL character');
  return `'${value.replaceAll("'", "''")}'`;
}

/**
 * Lines appended to the cluster's postgresql.conf: loopback only, our port, the socket in our
 * own directory (no /var/run/postgresql needed), room for the test suite's pools. Durability stays
 * at PostgreSQL's defaults (fsync, synchronous_commit, full_page_writes on), which the API checks
 * at boot.
 * @param {PgConfig} config
 */
export function clusterSettings(config) {
  return [
    '# nappe: a private server for development and tests',
    "listen_addresses = '127.0.0.1'",
    `port = ${config.port}`,
    `unix_socket_directories = ${sqlLiteral(config.dir)}`,
    'max_connections = 200',
    "timezone = 'UTC'",
  ].join('\n');
}

/**
 * Makes sure of the `nappe` role (login, the configured password, may create databases: the test
 * suite gives every app its own) and of the `nappe` database. Safe to run again.
 * @param {PgConfig} config
 */
export function bootstrapSql(config) {
  const password = sqlLiteral(config.password);
  return [
    `DO $$ BEGIN
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${PG_ROLE}') THEN
    CREATE ROLE ${PG_ROLE} LOGIN CREATEDB PASSWORD ${password};
  ELSE
    ALTER ROLE ${PG_ROLE} LOGIN CREATEDB PASSWORD ${password};
  END IF;
END $$;`,
    `SELECT 'CREATE DATABASE ${PG_DATABASE} OWNER ${PG_ROLE}'
  WHERE NOT EXISTS (SELECT 1 FROM pg_database WHERE datname = '${PG_DATABASE}') \\gexec`,
  ].join('\n');
}

// ------------------------------------------------------------------------------------------------
// Side effects below: installing, running as the server's user, pg_ctl.

const isRoot = () => process.getuid?.() === 0;

/** The server runs as `postgres` when we are root (PostgreSQL refuses root), else as ourselves. */
const serverUser = () => (isRoot() ? 'postgres' : userInfo().username);

/**
 * Runs a command as the server's user. Returns the result; throws on failure unless `allowFail`.
 * @param {string} command
 * @param {string[]} args
 * @param {{ input?: string, allowFail?: boolean, quiet?: boolean }} [options]
 */
function asServerUser(command, args, { input, allowFail = false, quiet = false } = {}) {
  const [cmd, argv] = isRoot()
    ? ['runuser', ['-u', 'postgres', '--', command, ...args]]
    : [command, args];
  const result = spawnSync(cmd, argv, {
    input,
    encoding: 'utf8',
    stdio: ['pipe', 'pipe', 'pipe'],
    cwd: '/',
  });
  if (result.status !== 0 && !allowFail) {
    const output = `${result.stdout ?? ''}${result.stderr ?? ''}`.trim();
    throw new Error(`${command} ${args.join(' ')} failed (exit ${result.status}):\n${output}`);
  }
  if (!quiet && result.stdout?.trim()) process.stdout.write(result.stdout);
  return result;
}

/** Installs Debian's postgresql with apt-get when no version of it is present. */
function ensureInstalled() {
  const find = () => {
    const versions = existsSync(DEBIAN_PG_ROOT) ? readdirSync(DEBIAN_PG_ROOT) : [];
    return pickVersion(versions, (v) => existsSync(join(DEBIAN_PG_ROOT, v, 'bin', 'initdb')));
  };
  let version = find();
  if (version) return join(DEBIAN_PG_ROOT, version, 'bin');
  if (!isRoot())
    throw new Error(
      'PostgreSQL is not installed; run as root once, or: apt-get install postgresql',
    );
  console.log("Installing Debian's postgresql with apt-get…");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [
    ['update', '-qq'],
    ['install', '-y', '-qq', 'postgresql'],
  ]) {
    const result = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (result.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed`);
  }
  version = find();
  if (!version) throw new Error('apt-get installed postgresql, but no initdb was found');
  return join(DEBIAN_PG_ROOT, version, 'bin');
}

/**
 * @param {string} bin
 * @param {PgConfig} config
 */
function isRunning(bin, config) {
  if (!existsSync(join(config.dataDir, 'PG_VERSION'))) return false;
  return (
    asServerUser(join(bin, 'pg_ctl'), ['status', '-D', config.dataDir], {
      allowFail: true,
      quiet: true,
    }).status === 0
  );
}

/**
 * @param {string} bin
 * @param {PgConfig} config
 */
function ensureCluster(bin, config) {
  if (existsSync(join(config.dataDir, 'PG_VERSION'))) return;
  mkdirSync(config.dir, { recursive: true, mode: 0o700 });
  if (isRoot()) {
    const ids = spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' });
    const gid = spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' });
    chownSync(config.dir, Number(ids.stdout.trim()), Number(gid.stdout.trim()));
  }
  console.log(`Creating a PostgreSQL cluster in ${config.dataDir}…`);
  // Local socket: only the server's own OS user (peer); TCP: passwords (SCRAM).
  asServerUser(
    join(bin, 'initdb'),
    [
      '-D',
      config.dataDir,
      '--username',
      serverUser(),
      '--auth-local=peer',
      '--auth-host=scram-sha-256',
      '--encoding=UTF8',
      '--locale=C.UTF-8',
    ],
    { quiet: true },
  );
  asServerUser('sh', ['-c', `cat >> '${join(config.dataDir, 'postgresql.conf')}'`], {
    input: `\n${clusterSettings(config)}\n`,
  });
}

/**
 * Starts the server (if it is not running) and makes sure of the role and database.
 * @param {PgConfig} config
 * @returns {{ url: string, alreadyRunning: boolean }}
 */
export function startPostgres(config = postgresConfig()) {
  const bin = ensureInstalled();
  ensureCluster(bin, config);
  const alreadyRunning = isRunning(bin, config);
  if (!alreadyRunning) {
    asServerUser(
      join(bin, 'pg_ctl'),
      ['start', '-D', config.dataDir, '-l', config.logFile, '-w', '-t', '60'],
      { quiet: true },
    );
  }
  asServerUser(
    join(bin, 'psql'),
    [
      '-h',
      config.dir,
      '-p',
      String(config.port),
      '-d',
      'postgres',
      '-X',
      '-q',
      '-v',
      'ON_ERROR_STOP=1',
    ],
    { input: bootstrapSql(config), quiet: true },
  );
  return { url: databaseUrl(config), alreadyRunning };
}

/** SQL that drops the databases test runs create (`nappe_test_…`) and a crashed run left behind. */
export function dropTestDatabasesSql() {
  return `SELECT format('DROP DATABASE %I WITH (FORCE)', datname) FROM pg_database
  WHERE datname LIKE 'nappe\\_test\\_%' \\gexec`;
}

/**
 * Drops what earlier test runs left behind (each test drops its own database when it ends; a
 * killed run cannot).
 * @param {PgConfig} config
 */
export function dropTestDatabases(config = postgresConfig()) {
  const bin = ensureInstalled();
  asServerUser(
    join(bin, 'psql'),
    [
      '-h',
      config.dir,
      '-p',
      String(config.port),
      '-d',
      'postgres',
      '-X',
      '-q',
      '-v',
      'ON_ERROR_STOP=1',
    ],
    { input: dropTestDatabasesSql(), quiet: true },
  );
}

/**
 * Stops the server if it runs (fast shutdown: sessions end, everything committed is kept).
 * @param {PgConfig} config
 * @returns {boolean} whether it was running
 */
export function stopPostgres(config = postgresConfig()) {
  const versions = existsSync(DEBIAN_PG_ROOT) ? readdirSync(DEBIAN_PG_ROOT) : [];
  const version = pickVersion(versions, (v) =>
    existsSync(join(DEBIAN_PG_ROOT, v, 'bin', 'initdb')),
  );
  if (!version) return false;
  const bin = join(DEBIAN_PG_ROOT, version, 'bin');
  if (!isRunning(bin, config)) return false;
  asServerUser(join(bin, 'pg_ctl'), ['stop', '-D', config.dataDir, '-m', 'fast', '-w'], {
    quiet: true,
  });
  return true;
}

/** @param {string[]} argv */
function main(argv) {
  const command = argv[0];
  const config = postgresConfig();
  switch (command) {
    case 'start': {
      const { url, alreadyRunning } = startPostgres(config);
      console.log(alreadyRunning ? 'PostgreSQL was already running.' : 'PostgreSQL started.');
      console.log(`  data and log: ${config.dir}`);
      console.log(`  DATABASE_URL=${url}`);
      console.log(`  run the API on it: DB_TYPE=postgres DATABASE_URL=${url} npm start -w api`);
      return;
    }
    case 'stop':
      console.log(stopPostgres(config) ? 'PostgreSQL stopped.' : 'PostgreSQL was not running.');
      return;
    case 'status': {
      const versions = existsSync(DEBIAN_PG_ROOT) ? readdirSync(DEBIAN_PG_ROOT) : [];
      const version = pickVersion(versions, (v) =>
        existsSync(join(DEBIAN_PG_ROOT, v, 'bin', 'initdb')),
      );
      const running = version !== null && isRunning(join(DEBIAN_PG_ROOT, version, 'bin'), config);
      console.log(running ? `running: DATABASE_URL=${databaseUrl(config)}` : 'not running');
      process.exitCode = running ? 0 : 3;
      return;
    }
    default:
      console.error('Usage: node docker-free-scripts/postgres.mjs start|stop|status');
      process.exitCode = 64; // EX_USAGE
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  try {
    main(process.argv.slice(2));
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  }
}
