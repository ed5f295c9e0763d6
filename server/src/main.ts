import 'reflect-metadata';
import { ConsoleLogger, Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { configureApp } from './app.setup.js';
import { DEMO_JWT_SECRET, validateEnv } from './config/env.validation.js';
import { clientDistPath, fromRepoRoot } from './config/paths.js';

async function bootstrap(): Promise<void> {
  // Check the settings before AppModule is imported (ConfigModule validates at import), so a bad
  // setting prints a short list instead of a stack trace.
  const env = validateEnv(process.env);
  const { AppModule } = await import('./app.module.js');
  const app = configureApp(await NestFactory.create(AppModule, { logger: createLogger(env.LOG_FORMAT) }));
  const logger = new Logger('Lockstep');
  if (env.JWT_SECRET === DEMO_JWT_SECRET) logger.warn('Using the DEMO JWT secret. Set JWT_SECRET before any real use.');
  if (!clientDistPath()) logger.warn('No built client found (client/dist): serving the API only.');
  await app.listen(env.PORT);
  logger.log(`Lockstep is listening on http://localhost:${env.PORT} (database ${fromRepoRoot(env.DATABASE_PATH)})`);
}

/**
 * One JSON object a line by default, for the hospital's log collector. Fields that could hold a
 * secret are masked wherever they turn up in a logged object, as a second line of defence: the
 * request log never includes bodies or headers in the first place.
 */
function createLogger(format: 'json' | 'text'): ConsoleLogger {
  return new ConsoleLogger({
    json: format === 'json',
    flattenParams: true,
    redact: ['password', 'passwordHash', 'accessToken', 'token', 'authorization', 'cookie', 'signature', 'JWT_SECRET', 'SMTP_URL'],
  });
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
