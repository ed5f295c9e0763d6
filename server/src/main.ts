import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { configureApp } from './app.setup.js';
import { DEMO_JWT_SECRET, validateEnv } from './config/env.validation.js';
import { clientDistPath, fromRepoRoot } from './config/paths.js';

async function bootstrap(): Promise<void> {
  // Check the settings before AppModule is imported (ConfigModule validates at import), so a bad
  // setting prints a short list instead of a stack trace.
  const env = validateEnv(process.env);
  const { AppModule } = await import('./app.module.js');
  const app = configureApp(await NestFactory.create(AppModule));
  const logger = new Logger('Lockstep');
  if (env.JWT_SECRET === DEMO_JWT_SECRET) logger.warn('Using the DEMO JWT secret. Set JWT_SECRET before any real use.');
  if (!clientDistPath()) logger.warn('No built client found (client/dist): serving the API only.');
  await app.listen(env.PORT);
  logger.log(`Lockstep is listening on http://localhost:${env.PORT} (database ${fromRepoRoot(env.DATABASE_PATH)})`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
