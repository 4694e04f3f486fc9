import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { ThrottlerModule } from '@nestjs/throttler';
import { DataSource } from 'typeorm';
import { AllergyNotesModule } from './allergy-notes/allergy-notes.module.js';
import { AuthModule } from './auth/auth.module.js';
import { ShutdownState } from './common/shutdown.js';
import { PrepModule } from './prep/prep.module.js';
import { PrivacyModule } from './privacy/privacy.module.js';
import { ClockModule } from './common/clock.js';
import { JwtAuthGuard } from './auth/guards/jwt-auth.guard.js';
import { RolesGuard } from './auth/guards/roles.guard.js';
import { AppThrottlerGuard } from './auth/guards/throttler.guard.js';
import { ConfigModule } from './config/config.module.js';
import { Env } from './config/env.js';
import { DatabaseModule } from './database/database.module.js';
import { PostgresThrottlerStorage } from './database/postgres-throttler-storage.js';
import { FilesModule } from './files/files.module.js';
import { HealthModule } from './health/health.module.js';
import { KitchenModule } from './kitchen/kitchen.module.js';
import { OrdersModule } from './orders/orders.module.js';
import { StudioModule } from './studio/studio.module.js';
import { UsersModule } from './users/users.module.js';
import { InsightsModule } from './insights/insights.module.js';

@Module({
  imports: [
    ConfigModule,
    ClockModule,
    DatabaseModule,
    ThrottlerModule.forRootAsync({
      inject: [Env, DataSource],
      useFactory: (env: Env, dataSource: DataSource) => ({
        throttlers: [{ name: 'default', ttl: 60_000, limit: env.THROTTLE_LIMIT }],
        // Several API processes may share a PostgreSQL database: count in it, so the limits hold
        // between them. One process owns a SQLite file: counting in memory is enough.
        storage: env.DB_TYPE === 'postgres' ? new PostgresThrottlerStorage(dataSource) : undefined,
      }),
    }),
    AuthModule,
    UsersModule,
    StudioModule,
    KitchenModule,
    FilesModule,
    OrdersModule,
    InsightsModule,
    AllergyNotesModule,
    PrepModule,
    PrivacyModule,
    HealthModule,
  ],
  providers: [
    ShutdownState,
    // Order matters: throttle first, then authenticate, then authorise.
    { provide: APP_GUARD, useClass: AppThrottlerGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule {}
