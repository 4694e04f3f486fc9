import { ForeignKey, getMetadataArgsStorage, Index, type ColumnType } from 'typeorm';
import type { DatabaseType } from '../config/env.js';

/**
 * The database the entities are declared for, read from `process.env.DB_TYPE` when this module is
 * first imported. It has to be read here, not from the validated `Env`: TypeORM's decorators run
 * when the entity modules load, before Nest has built anything. `main.ts`, the CLI and the tests
 * all read the same `process.env`, and `dataSourceOptions` refuses to open a database of another
 * type than this one (the columns would be declared for the wrong database).
 *
 * Anything other than `postgres` means SQLite, the default; `validateEnv` rejects unknown values.
 */
export const SCHEMA_DB_TYPE: DatabaseType =
  process.env.DB_TYPE === 'postgres' ? 'postgres' : 'sqlite';

const onPostgres = SCHEMA_DB_TYPE === 'postgres';

/**
 * A point in time. SQLite has no date type: TypeORM's `datetime` stores UTC text. PostgreSQL has
 * no `datetime`; `timestamptz` stores an instant (PostgreSQL docs, 8.5.1.3: converted to UTC on
 * the way in), which is what a JavaScript `Date` is.
 */
export const TIMESTAMP: ColumnType = onPostgres ? 'timestamptz' : 'datetime';

/** The default of a column set to "now" by the database, as each database's migrations write it. */
export const NOW_DEFAULT: () => string = onPostgres ? () => 'now()' : () => "datetime('now')";

export interface OutsideDeclarations {
  /** Properties whose column holds a point in time (given the portable TIMESTAMP type). */
  timestamps?: string[];
  foreignKeys?: Array<{
    property: string;
    target: () => new () => unknown;
    onDelete: 'CASCADE' | 'RESTRICT' | 'SET NULL';
  }>;
  indexes?: Array<{ name: string; properties: string[]; unique?: boolean }>;
}

/**
 * Declares schema facts for an entity whose file another change owns, the way its decorators
 * would. Each declaration is skipped when the entity already makes it, so moving them into the
 * entity later needs no change here beyond deleting the call.
 */
export function declareSchemaOutsideEntity(
  entity: new () => unknown,
  { timestamps = [], foreignKeys = [], indexes = [] }: OutsideDeclarations,
): void {
  const storage = getMetadataArgsStorage();
  for (const property of timestamps) {
    const column = storage.columns.find((c) => c.target === entity && c.propertyName === property);
    if (column && column.options.type !== TIMESTAMP) column.options.type = TIMESTAMP;
  }
  for (const fk of foreignKeys) {
    const declared = storage.foreignKeys.some(
      (f) => f.target === entity && f.propertyName === fk.property,
    );
    if (!declared)
      ForeignKey(fk.target, { onDelete: fk.onDelete })(entity.prototype as object, fk.property);
  }
  for (const index of indexes) {
    if (storage.indices.some((i) => i.target === entity && i.name === index.name)) continue;
    Index(index.name, index.properties, { unique: index.unique ?? false })(entity);
  }
}
