import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';
import { requestLoggerMiddleware } from './common/logging/request-logger.middleware.js';
import { setupOpenApi } from './common/openapi/openapi.setup.js';
import { requestContextMiddleware } from './common/request-context/request-context.js';
import { securityHeaders } from './common/security/security-headers.js';
import { serverTimingMiddleware } from './common/timing/server-timing.middleware.js';
import { createValidationPipe } from './common/validation/validation.pipe.js';
import type { Env } from './config/env.validation.js';

/** What main.ts and the API tests both apply, so tests exercise the app as it runs. */
export function configureApp(app: INestApplication): INestApplication {
  // Lockstep always runs on Express (platform-express); the cast reaches its extra methods.
  const express = app as NestExpressApplication;
  const config = app.get<ConfigService<Env, true>>(ConfigService);
  const bodyLimit = `${config.get('JSON_BODY_LIMIT_KB', { infer: true })}kb`;

  express.set('trust proxy', config.get('TRUST_PROXY', { infer: true }));
  // Order matters: the log line must see requests the body parser refuses, and the request
  // context must start after the parser (see request-context.ts).
  express.use(serverTimingMiddleware);
  express.use(requestLoggerMiddleware);
  express.use(securityHeaders());
  express.use('/api', noStore);
  express.useBodyParser('json', { limit: bodyLimit });
  express.useBodyParser('urlencoded', { limit: bodyLimit, extended: true });
  express.use(requestContextMiddleware);
  // No enableCors(): the client is served from this origin, so no other origin is let in.

  app.setGlobalPrefix('api');
  setupOpenApi(app);
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();
  return app;
}

/** Patient data must not stay in the browser's cache on a shared ward computer. */
function noStore(_req: Request, res: Response, next: NextFunction): void {
  res.setHeader('Cache-Control', 'no-store');
  next();
}
