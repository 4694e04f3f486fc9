import { AsyncLocalStorage } from 'node:async_hooks';
import type { DataSource, EntityManager, QueryRunner } from 'typeorm';

/**
 * TypeORM's SQLite drivers share ONE connection between every request. Left alone, two
 * concurrent `transaction()` calls collide ("cannot start a transaction within a transaction")
 * and — worse — a query from another request issued while a transaction is open silently
 * becomes part of it and is lost if it rolls back.
 *
 * This serializer puts one lock in front of the connection. An async context that holds the
 * lock (a transaction's callback and everything it awaits) passes straight through; every
 * other caller waits its turn. It wraps:
 *   - `manager.transaction()` (and so `dataSource.transaction()`),
 *   - the implicit transactions of `save` / `remove` / `softRemove` / `recover`,
 *   - every `query()` of the shared query runner (plain reads, inserts, updates).
 *
 * Rule that follows: never await network or other slow work inside a transaction.
 */
export class SqliteSerializer {
  private readonly holder = new AsyncLocalStorage<symbol>();
  private tail: Promise<void> = Promise.resolve();
  private waiting = 0;

  /** Runs `work` with exclusive use of the connection; re-entrant within the same async context. */
  async exclusive<T>(work: () => Promise<T>): Promise<T> {
    if (this.holder.getStore() !== undefined) return work();
    let release!: () => void;
    const turn = new Promise<void>((resolve) => (release = resolve));
    const previous = this.tail;
    this.tail = previous.then(() => turn);
    this.waiting += 1;
    await previous;
    this.waiting -= 1;
    try {
      return await this.holder.run(Symbol('sqlite-lock'), work);
    } finally {
      release();
    }
  }

  /** How many callers are queued for the connection right now (for diagnostics and tests). */
  get queueLength(): number {
    return this.waiting;
  }

  install(dataSource: DataSource): void {
    const marker = Symbol.for('nappe.sqlite-serializer');
    const ds = dataSource as DataSource & { [marker]?: boolean };
    if (ds[marker]) return;
    ds[marker] = true;

    this.wrapManager(dataSource.manager);

    const driver = dataSource.driver as unknown as {
      createQueryRunner: (mode: 'master' | 'slave') => QueryRunner;
    };
    const createQueryRunner = driver.createQueryRunner.bind(driver);
    const wrapped = new WeakSet<QueryRunner>();
    driver.createQueryRunner = (mode) => {
      const runner = createQueryRunner(mode);
      if (!wrapped.has(runner)) {
        wrapped.add(runner);
        const query = runner.query.bind(runner) as (...args: unknown[]) => Promise<unknown>;
        (runner as { query: (...args: unknown[]) => Promise<unknown> }).query = (...args) =>
          this.exclusive(() => query(...args));
      }
      return runner;
    };
  }

  private wrapManager(manager: EntityManager): void {
    const m = manager as unknown as Record<string, (...args: unknown[]) => Promise<unknown>>;
    for (const method of ['transaction', 'save', 'remove', 'softRemove', 'recover'] as const) {
      const original = m[method]!.bind(manager);
      m[method] = (...args: unknown[]) => this.exclusive(() => original(...args));
    }
  }
}
