import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DataSource, type DataSourceOptions, EntitySchema } from 'typeorm';
import { serialiseTransactions } from './serial-transactions.js';

const Item = new EntitySchema<{ id: number; name: string }>({
  name: 'item',
  columns: { id: { type: Number, primary: true, generated: true }, name: { type: String } },
});
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('serialiseTransactions', () => {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-tx-'));
  let dataSource: DataSource;

  beforeAll(async () => {
    const options: DataSourceOptions = {
      type: 'better-sqlite3',
      database: path.join(directory, 'tx.sqlite'),
      entities: [Item],
      synchronize: true,
    };
    dataSource = serialiseTransactions(await new DataSource(options).initialize());
  });
  afterAll(async () => {
    await dataSource.destroy();
    rmSync(directory, { recursive: true, force: true });
  });

  it('runs overlapping transactions one after the other, so a rollback undoes only its own writes', async () => {
    const failing = dataSource.transaction(async (manager) => {
      await manager.insert(Item, { name: 'rolled back' });
      await pause(30);
      throw new Error('fails after writing');
    });
    const succeeding = dataSource.transaction(async (manager) => {
      await pause(5);
      await manager.insert(Item, { name: 'kept' });
      return 'committed';
    });

    await expect(failing).rejects.toThrow('fails after writing');
    await expect(succeeding).resolves.toBe('committed');
    expect((await dataSource.getRepository(Item).find()).map((item) => item.name)).toEqual(['kept']);
  });

  it('keeps going after a failed transaction', async () => {
    await expect(dataSource.transaction(() => Promise.reject(new Error('no')))).rejects.toThrow('no');
    await expect(dataSource.transaction(async (manager) => manager.count(Item))).resolves.toBe(1);
  });
});
