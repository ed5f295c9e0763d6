import 'reflect-metadata';
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fromRepoRoot } from '../config/paths.js';
import { DataSource } from 'typeorm';
import { validateEnv } from '../config/env.validation.js';
import { dataSourceOptions } from './data-source-options.js';
import { seedDemoDataIfEmpty } from './seed/demo-seed.js';

/** `npm run db:reset`: deletes the database file, runs the migrations and seeds the demo data. */
async function reset(): Promise<void> {
  const env = validateEnv(process.env);
  const file = fromRepoRoot(env.DATABASE_PATH);
  mkdirSync(path.dirname(file), { recursive: true });
  for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
  const dataSource = new DataSource(dataSourceOptions(file));
  await dataSource.initialize();
  const started = performance.now();
  await seedDemoDataIfEmpty(dataSource);
  const ms = Math.round(performance.now() - started);
  await dataSource.destroy();
  console.log(`Reset ${file}: schema migrated and the demo hospital seeded in ${ms} ms, its times counted back from now.`);
}

reset().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
