import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { afterEach, describe, expect, it } from 'vitest';
import { dataSourceOptions } from '../src/database/data-source-options.js';
import { DEMO_PATIENTS } from '../src/database/seed/demo-data.js';
import { seedDemoDataIfEmpty } from '../src/database/seed/demo-seed.js';

describe('database', () => {
  const directories: string[] = [];
  afterEach(() => directories.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

  async function openFresh(): Promise<DataSource> {
    const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-db-'));
    directories.push(directory);
    const dataSource = new DataSource(dataSourceOptions(path.join(directory, 'test.sqlite')));
    return dataSource.initialize();
  }

  it('migrations build exactly the schema the entities describe (nothing left to generate)', async () => {
    const dataSource = await openFresh();
    const pending = await dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((query) => query.query)).toEqual([]);
    await dataSource.destroy();
  });

  it('runs with WAL journal and foreign keys on', async () => {
    const dataSource = await openFresh();
    expect(await dataSource.query('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
    expect(await dataSource.query('PRAGMA foreign_keys')).toEqual([{ foreign_keys: 1 }]);
    await dataSource.destroy();
  });

  it('seeds the demo scenario once, and never twice', async () => {
    const dataSource = await openFresh();
    expect(await seedDemoDataIfEmpty(dataSource)).toBe(true);
    expect(await seedDemoDataIfEmpty(dataSource)).toBe(false);
    const [counts] = await dataSource.query(
      `SELECT (SELECT count(*) FROM wards) AS wards, (SELECT count(*) FROM users) AS users,
              (SELECT count(*) FROM patients) AS patients, (SELECT count(*) FROM drugs) AS drugs`,
    );
    expect(counts).toEqual({ wards: 4, users: 7, patients: DEMO_PATIENTS.length, drugs: 3 });
    await dataSource.destroy();
  });

  it('rolls every migration back cleanly', async () => {
    const dataSource = await openFresh();
    for (let i = 0; i < dataSource.migrations.length; i++) await dataSource.undoLastMigration();
    const tables = await dataSource.query(
      `SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT IN ('migrations', 'sqlite_sequence')`,
    );
    expect(tables).toEqual([]);
    await dataSource.destroy();
  });
});
