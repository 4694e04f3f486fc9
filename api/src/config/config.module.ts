import { Global, Module } from '@nestjs/common';
import { Env, validateEnv } from './env.js';

/** Provides the validated environment (`Env`) everywhere. Tests override the provider. */
@Global()
@Module({
  providers: [{ provide: Env, useFactory: () => validateEnv(process.env) }],
  exports: [Env],
})
export class ConfigModule {}
