import 'reflect-metadata';
import { mkdirSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { fromRepoRoot } from '../../config/paths.js';
import { hashPassword } from '../../users/passwords.js';
import { dataSourceOptions } from '../data-source-options.js';
import { DEMO_PASSWORD } from '../seed/demo-staff.js';
import { Random } from './random.js';
import { writeHospital } from './scale-hospital.js';
import { parseScaleOptions } from './scale-options.js';
import { ScaleWriter } from './scale-writer.js';

/**
 * `npm run seed:scale -- --wards 30 --beds 1000 --active 300 --days 30 [--out file] [--seed n]`:
 * (re)writes a separate SQLite file with an invented hospital at scale for the benchmark. The
 * schema comes from the real migrations; the rows go in through prepared statements in one
 * transaction.
 */
async function seedScale(): Promise<void> {
  const options = parseScaleOptions(process.argv.slice(2));
  const file = fromRepoRoot(options.out);
  mkdirSync(path.dirname(file), { recursive: true });
  for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });

  // Made once and shared by every account, outside the timing: it is deliberately slow.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const started = performance.now();
  const dataSource = new DataSource(dataSourceOptions(file));
  await dataSource.initialize();
  await dataSource.destroy();
  const migrated = performance.now();

  const db = new Database(file);
  // Checked once at the end instead of three lookups for every observation.
  db.pragma('foreign_keys = OFF');
  const writer = new ScaleWriter(db);
  db.transaction(() => writeHospital(writer, new Random(options.seed), options, passwordHash, Date.now()))();
  const broken = db.pragma('foreign_key_check') as unknown[];
  if (broken.length > 0) throw new Error(`The scale dataset breaks ${broken.length} foreign keys, e.g. ${JSON.stringify(broken[0])}`);
  const written = performance.now();
  db.pragma('wal_checkpoint(TRUNCATE)');
  db.close();

  const rows = [...writer.counts.values()].reduce((sum, n) => sum + n, 0);
  const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;
  console.log(
    `Scale dataset: ${options.wards} wards, ${options.beds} beds, ${options.active} active PCAs, ${options.days} days (seed ${options.seed})`,
  );
  for (const [table, count] of writer.counts) console.log(`  ${table.padEnd(24)} ${count.toLocaleString('en-GB').padStart(9)}`);
  console.log(`Wrote ${rows.toLocaleString('en-GB')} rows to ${file} (${(statSync(file).size / 1e6).toFixed(0)} MB)`);
  console.log(
    `Time: ${seconds(written - started)} (migrations ${seconds(migrated - started)}, one insert transaction ${seconds(written - migrated)})`,
  );
}

seedScale().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
