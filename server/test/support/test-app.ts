import 'reflect-metadata';
import { rmSync } from 'node:fs';
import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';
import { DEMO_PASSWORD } from './demo-accounts.js';

export { DEMO_PASSWORD, DEMO_USER_BY_ROLE } from './demo-accounts.js';

export interface TestApp {
  app: INestApplication;
  http: App;
  databasePath: string;
  /** Signs in and returns the bearer token. */
  tokenFor(username: string, password?: string): Promise<string>;
  close(): Promise<void>;
}

/**
 * The real application on this test file's temporary SQLite file (see setup-env.ts), migrated and
 * seeded with the demo data, exactly as `npm start` builds it (same module, pipes and filters).
 * One app per test file.
 */
export async function createTestApp(): Promise<TestApp> {
  const directory = process.env.LOCKSTEP_TEST_DIRECTORY!;
  const databasePath = process.env.DATABASE_PATH!;

  const app = configureApp(await NestFactory.create(AppModule, { logger: false }));
  await app.init();
  const http = app.getHttpServer() as App;

  return {
    app,
    http,
    databasePath,
    async tokenFor(username, password = DEMO_PASSWORD) {
      const response = await request(http).post('/api/auth/login').send({ username, password });
      if (response.status !== 200) throw new Error(`Sign-in as ${username} failed: ${response.status}`);
      return response.body.accessToken as string;
    },
    async close() {
      await app.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
