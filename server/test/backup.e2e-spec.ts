import { readdirSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import Database from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase, backupFileName } from '../src/database/backup.js';
import { CALM_OBSERVATION as OBSERVATION } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

describe('database backup (npm run db:backup)', () => {
  let t: TestApp;
  let live: DataSource;
  let backups: string;

  const tables = async (): Promise<string[]> =>
    (await live.query(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name`)).map(
      (row: { name: string }) => row.name,
    );
  const liveCounts = async (): Promise<Record<string, number>> => {
    const counts: Record<string, number> = {};
    for (const table of await tables()) counts[table] = Number((await live.query(`SELECT COUNT(*) AS n FROM "${table}"`))[0].n);
    return counts;
  };
  const openCopy = (file: string) => new Database(file, { readonly: true, fileMustExist: true });

  beforeAll(async () => {
    t = await createTestApp();
    live = t.app.get(DataSource);
    backups = path.join(process.env.LOCKSTEP_TEST_DIRECTORY!, 'backups');
  });
  afterAll(() => t.close());

  it('writes a timestamped copy that opens, passes integrity_check and has the same rows in every table', async () => {
    const at = new Date('2026-03-04T05:06:07.089Z');
    const { file, bytes } = await backupDatabase(t.databasePath, backups, { at });
    expect(path.basename(file)).toBe('lockstep-2026-03-04T05-06-07-089Z.sqlite');
    expect(bytes).toBeGreaterThan(0);
    expect(readdirSync(backups)).toEqual([backupFileName(at)]);

    const copy = openCopy(file);
    try {
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(copy.pragma('foreign_key_check')).toEqual([]);
      expect(copy.pragma('journal_mode', { simple: true })).toBe('delete');
      const counts = await liveCounts();
      expect(Object.keys(counts).length).toBeGreaterThan(10);
      for (const [table, n] of Object.entries(counts))
        expect(copy.prepare(`SELECT COUNT(*) AS n FROM "${table}"`).get(), table).toEqual({ n });
    } finally {
      copy.close();
    }
    await expect(backupDatabase(t.databasePath, backups, { at })).rejects.toThrow('already exists');
  });

  it('backs up online while observations are being written: a consistent copy holding every write answered before it began', async () => {
    const tokens = {
      prescriber: await t.tokenFor(DEMO_USER_BY_ROLE.prescriber),
      pharmacist: await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist),
      nurse: await t.tokenFor(DEMO_USER_BY_ROLE.nurse),
    };
    const order = await activeOrder(t.http, tokens, await t.addPatient());
    await t.app.listen(0, '127.0.0.1');
    const baseUrl = `http://127.0.0.1:${((t.app.getHttpServer() as Server).address() as AddressInfo).port}`;
    const record = async (): Promise<{ id: number; answeredAt: number }> => {
      const response = await fetch(`${baseUrl}/api/orders/${order.id}/observations`, {
        method: 'POST',
        headers: { Authorization: `Bearer ${tokens.nurse}`, 'Content-Type': 'application/json' },
        body: JSON.stringify(OBSERVATION),
      });
      expect(response.status).toBe(201);
      return { id: ((await response.json()) as { id: number }).id, answeredAt: performance.now() };
    };

    const before = await Promise.all(Array.from({ length: 10 }, record));
    let backupStarted = 0;
    let backupEnded = 0;
    const writes = (async () => {
      const written: { id: number; answeredAt: number }[] = [];
      for (let wave = 0; wave < 12; wave++) written.push(...(await Promise.all(Array.from({ length: 4 }, record))));
      return written;
    })();
    // One page per step spreads the copy over many turns of the event loop: writes land between
    // its steps and SQLite starts it again, yet the file it ends with must be one moment's state.
    const backup = (async () => {
      backupStarted = performance.now();
      const result = await backupDatabase(t.databasePath, backups, { pagesPerStep: 1 });
      backupEnded = performance.now();
      return result;
    })();
    const [during, { file }] = await Promise.all([writes, backup]);
    expect(
      during.filter((write) => write.answeredAt > backupStarted && write.answeredAt < backupEnded).length,
      'writes answered while the backup ran',
    ).toBeGreaterThan(0);

    const copy = openCopy(file);
    try {
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      const copied = copy.prepare('SELECT * FROM observations WHERE orderId = ? ORDER BY id').all(order.id) as { id: number }[];
      const ids = new Set(copied.map((row) => row.id));
      expect(before.filter((write) => !ids.has(write.id))).toEqual([]);
      expect(during.filter((write) => write.answeredAt < backupStarted && !ids.has(write.id))).toEqual([]);
      // Every copied row is the live row, unchanged: a snapshot, not a mixture.
      const copiedTotal = copy.prepare('SELECT COUNT(*) AS n FROM observations').get() as { n: number };
      expect(copiedTotal.n).toBeLessThanOrEqual(Number((await live.query('SELECT COUNT(*) AS n FROM observations'))[0].n));
      for (const row of copied)
        expect(Object.values(row)).toEqual(Object.values((await live.query('SELECT * FROM observations WHERE id = ?', [row.id]))[0]));
    } finally {
      copy.close();
    }
  });
});
