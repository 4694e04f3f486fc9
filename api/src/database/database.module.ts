import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Env } from '../config/env.js';
import { assertDurableSqlite } from './database-health.js';
import { dataSourceOptions, openDataSource } from './data-source.js';

/**
 * SQLite on a file: migrations applied at start (never `synchronize`), the connection lock
 * installed, and the durability pragmas asserted before the first request.
 */
@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [Env],
      useFactory: (env: Env) => dataSourceOptions(env.DATABASE_PATH),
      dataSourceFactory: async (options) => {
        const dataSource = await openDataSource(String(options?.database));
        await assertDurableSqlite(dataSource);
        return dataSource;
      },
    }),
  ],
})
export class DatabaseModule {}
