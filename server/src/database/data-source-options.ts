import { fromRepoRoot } from '../config/paths.js';
import type { DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities.js';
import { MIGRATIONS } from './migrations/index.js';
import { queryCounter } from './query-counter.js';

/** One definition of the database for Nest, the reset script and the tests. */
export function dataSourceOptions(databasePath: string): DataSourceOptions {
  return {
    type: 'better-sqlite3',
    database: fromRepoRoot(databasePath),
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: true,
    migrationsTransactionMode: 'each',
    synchronize: false,
    enableWAL: true,
    // Sync the log on every commit: an answered clinical write survives a power cut, not only a crash.
    prepareDatabase: (db: { pragma(source: string): unknown }) => {
      db.pragma('synchronous = FULL');
    },
    // A writer waits this long for another writer instead of failing with SQLITE_BUSY.
    timeout: 5000,
    logger: queryCounter,
  };
}
