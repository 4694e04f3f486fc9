import {
  HttpStatus,
  type INestApplication,
  UnsupportedMediaTypeException,
  ValidationPipe,
} from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import type { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { ShutdownState } from './common/shutdown.js';
import { corsOrigins, type Env } from './config/env.js';

/** Largest JSON body we accept (guest lists included); larger → 413. */
export const JSON_BODY_LIMIT = '256kb';

/** Routes that take something other than JSON (webhooks read the raw body themselves). */
const NON_JSON_PREFIXES = ['/api/payments/webhook'];

/** Photo uploads take multipart/form-data, on these routes only. */
const MULTIPART_ROUTES = [/^\/api\/(desserts|menus)\/[^/]+\/photo$/];

/**
 * Everything that makes the app the app, shared by `main.ts` and the e2e tests so both run
 * the same middleware in the same order.
 */
export function configureApp(
  app: NestExpressApplication,
  env: Env,
  options: { logStream?: { write(line: string): void } } = {},
): INestApplication {
  app.use(app.get(ShutdownState).middleware);
  app.setGlobalPrefix('api');
  app.set('trust proxy', false);
  // "simple" query parsing: no nested objects from `?a[b]=…`; a repeated parameter becomes an
  // array and fails validation of a scalar field (400).
  app.set('query parser', 'simple');
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT });
  app.useBodyParser('urlencoded', { limit: JSON_BODY_LIMIT, extended: false });

  app.use(
    pinoHttp(
      {
        level: env.LOG_LEVEL,
        // Log the request line and outcome only: never headers, cookies, tokens or bodies
        // (bodies can hold guests' health data).
        serializers: {
          req: (req: { id: unknown; method: string; url: string }) => ({
            id: req.id,
            method: req.method,
            path: req.url.split('?')[0],
          }),
          res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
        },
        customLogLevel: (_req, res, err) =>
          err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
      },
      // Standard output unless a test captures the log lines (to check no guest data reaches them).
      options.logStream,
    ),
  );

  const isProduction = env.NODE_ENV === 'production';
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // Swagger UI (outside production) needs its own inline styles; the API serves nothing else.
          'style-src': ["'self'", "'unsafe-inline'"],
          'frame-ancestors': ["'none'"],
        },
      },
      strictTransportSecurity: isProduction
        ? { maxAge: 31_536_000, includeSubDomains: true }
        : false,
      referrerPolicy: { policy: 'no-referrer' },
    }),
  );

  const allowed = new Set(corsOrigins(env));
  app.enableCors({
    origin: (origin, callback) => callback(null, origin !== undefined && allowed.has(origin)),
    credentials: true,
    methods: ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'],
    allowedHeaders: ['Authorization', 'Content-Type', 'Idempotency-Key', 'X-Request-Id'],
    maxAge: 600,
  });

  app.use(cookieParser());
  app.use(requireJsonBodies);

  app.useGlobalPipes(
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      errorHttpStatusCode: HttpStatus.BAD_REQUEST,
      stopAtFirstError: false,
    }),
  );

  if (!isProduction) {
    const config = new DocumentBuilder()
      .setTitle('Nappe API')
      .setDescription('Bookings, kitchen planning and allergy notes for a plated-dessert studio.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build();
    const document = SwaggerModule.createDocument(app, config);
    SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
  }

  app.enableShutdownHooks();
  return app;
}

/** A body in any type but JSON is refused with 415 (OWASP ASVS 5.0 V4.1.1), except on raw-body routes. */
function requireJsonBodies(req: Request, _res: Response, next: NextFunction): void {
  const hasBody =
    Number(req.headers['content-length'] ?? 0) > 0 ||
    req.headers['transfer-encoding'] !== undefined;
  if (!hasBody || !['POST', 'PUT', 'PATCH', 'DELETE'].includes(req.method)) return next();
  if (NON_JSON_PREFIXES.some((p) => req.path.startsWith(p))) return next();
  if (req.is('application/json')) return next();
  if (req.is('multipart/form-data') && MULTIPART_ROUTES.some((r) => r.test(req.path))) {
    return next();
  }
  next(new UnsupportedMediaTypeException('Send the body as application/json.'));
}
