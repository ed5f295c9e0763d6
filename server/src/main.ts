import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import { clientDistPath } from './config/paths.js';
import { DEMO_JWT_SECRET, type Env } from './config/env.validation.js';

async function bootstrap(): Promise<void> {
  const app = configureApp(await NestFactory.create(AppModule, { bodyParser: true }));
  const config = app.get<ConfigService<Env, true>>(ConfigService);
  const logger = new Logger('Lockstep');
  if (config.get('JWT_SECRET', { infer: true }) === DEMO_JWT_SECRET) {
    logger.warn('Using the DEMO JWT secret. Set JWT_SECRET before any real use.');
  }
  if (!clientDistPath()) logger.warn('No built client found (client/dist): serving the API only.');
  const port = config.get('PORT', { infer: true });
  await app.listen(port);
  logger.log(`Lockstep is listening on http://localhost:${port} (database ${config.get('DATABASE_PATH', { infer: true })})`);
}

bootstrap().catch((error: unknown) => {
  // Config errors are already a readable list; print them without a stack.
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
