import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { assertDurableDatabase } from './database-health.js';
import { databaseTarget, dataSourceOptions, prepareDataSource } from './data-source.js';

/**
 * SQLite on a file (the default) or PostgreSQL at DATABASE_URL: migrations applied at start
 * (never `synchronize`), on SQLite the connection lock installed, and the durability settings
 * asserted before the first request.
 */
@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [Env],
      useFactory: (env: Env) => dataSourceOptions(databaseTarget(env)),
      dataSourceFactory: async (options) => {
        if (!options) throw new Error('No database options');
        const dataSource = await prepareDataSource(new DataSource(options));
        await assertDurableDatabase(dataSource);
        return dataSource;
      },
    }),
  ],
})
export class DatabaseModule {}
