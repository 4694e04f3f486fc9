import { dirname, resolve } from 'node:path';
import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  DiskHealthIndicator,
  HealthCheck,
  HealthCheckService,
  MemoryHealthIndicator,
  TypeOrmHealthIndicator,
} from '@nestjs/terminus';
import { SkipThrottle } from '@nestjs/throttler';
import { Public } from '../auth/decorators/public.decorator.js';
import { Env } from '../config/env.js';

/** Readiness fails when the database does not answer within this. */
export const DATABASE_PING_TIMEOUT_MS = 1500;
/** … or when the disk holding the data folder is this full (writes, WAL, photos, backups). */
export const DISK_FULL_FRACTION = 0.95;
/** Liveness fails when the heap grows past this: a leak, for the supervisor to restart. */
export const HEAP_LIMIT_BYTES = 1024 * 1024 * 1024;

/**
 * Health for whatever supervises the process (@nestjs/terminus). While the process is stopping
 * every route, these included, answers 503 (ShutdownState), so a balancer stops sending work.
 * - `GET /api/health/live`: the process is sound (heap below the limit); no dependency checked,
 *   so a slow database never gets a healthy process restarted.
 * - `GET /api/health/ready` (and `GET /api/health`): it can serve — the database answers and the
 *   data folder's disk has room.
 */
@ApiTags('health')
@Public()
@SkipThrottle()
@Controller('health')
export class HealthController {
  private readonly dataFolder: string;

  constructor(
    env: Env,
    private readonly health: HealthCheckService,
    private readonly database: TypeOrmHealthIndicator,
    private readonly disk: DiskHealthIndicator,
    private readonly memory: MemoryHealthIndicator,
  ) {
    this.dataFolder = dirname(resolve(process.cwd(), env.DATABASE_PATH));
  }

  @Get('live')
  @HealthCheck()
  live() {
    return this.health.check([() => this.memory.checkHeap('heap', HEAP_LIMIT_BYTES)]);
  }

  /** The path every script and supervisor of this app already polls: the same as `ready`. */
  @Get()
  @HealthCheck()
  check() {
    return this.ready();
  }

  @Get('ready')
  @HealthCheck()
  ready() {
    return this.health.check([
      () => this.database.pingCheck('database', { timeout: DATABASE_PING_TIMEOUT_MS }),
      () =>
        this.disk.checkStorage('disk', {
          path: this.dataFolder,
          thresholdPercent: DISK_FULL_FRACTION,
        }),
    ]);
  }
}
