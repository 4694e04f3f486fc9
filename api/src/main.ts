import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module.js';
import { configureApp } from './configure-app.js';
import { EnvError, validateEnv, type Env } from './config/env.js';

async function bootstrap(): Promise<void> {
  let env: Env;
  try {
    env = validateEnv(process.env);
  } catch (error) {
    if (error instanceof EnvError) {
      console.error(error.message);
      process.exit(78); // EX_CONFIG
    }
    throw error;
  }
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    rawBody: true,
    bodyParser: false,
    logger: env.LOG_LEVEL === 'silent' ? false : ['warn', 'error', 'fatal'],
  });
  configureApp(app, env);
  await app.listen(env.PORT, env.HOST);
  if (env.LOG_LEVEL !== 'silent')
    console.log(`API listening on http://${env.HOST}:${env.PORT}/api`);
}

bootstrap().catch((error: unknown) => {
  console.error('The API could not start:', error instanceof Error ? error.message : error);
  process.exit(1);
});
