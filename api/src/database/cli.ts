import 'reflect-metadata';
import * as argon2 from 'argon2';
import { EnvError, validateEnv } from '../config/env.js';
import { assertDurableDatabase } from './database-health.js';
import { databaseTarget, openDataSource } from './data-source.js';
import { seedDemo, SeedRefusedError } from './demo-seed.js';

/**
 * `node dist/database/cli.js migrate` — apply pending migrations.
 * `node dist/database/cli.js seed`    — migrate, then seed the demo studio into an empty database.
 * `node dist/database/cli.js revert`  — undo the last migration.
 */
async function main(command: string | undefined): Promise<void> {
  const env = validateEnv(process.env);
  const dataSource = await openDataSource(databaseTarget(env));
  try {
    await assertDurableDatabase(dataSource);
    switch (command) {
      case 'migrate':
        console.log(
          `Database ready ${env.DB_TYPE === 'postgres' ? 'on PostgreSQL' : `at ${env.DATABASE_PATH}`} (migrations applied).`,
        );
        break;
      case 'revert':
        await dataSource.undoLastMigration({ transaction: 'each' });
        console.log('Reverted the last migration.');
        break;
      case 'seed': {
        const hash = (p: string) =>
          argon2.hash(p, {
            type: argon2.argon2id,
            memoryCost: env.ARGON2_MEMORY_KIB,
            timeCost: 2,
            parallelism: 1,
          });
        const result = await seedDemo(dataSource, hash, env.NODE_ENV);
        console.log(
          result.seeded
            ? 'Seeded the demo studio and accounts.'
            : `Seed skipped: ${result.reason}.`,
        );
        break;
      }
      default:
        throw new Error(`Unknown command "${command}". Use migrate, seed or revert.`);
    }
  } finally {
    await dataSource.destroy();
  }
}

main(process.argv[2]).catch((error: unknown) => {
  if (error instanceof EnvError || error instanceof SeedRefusedError) console.error(error.message);
  else console.error(error);
  process.exit(1);
});
