import type { DataSource } from 'typeorm';

type Transaction = DataSource['manager']['transaction'];

/**
 * TypeORM's better-sqlite3 driver runs every query on one shared connection, so two overlapping
 * `transaction()` calls interleave on it: the second fails to BEGIN (a 500), and the first one's
 * rollback can keep or undo the other's writes. Queue them so each transaction runs alone, in the
 * order the requests arrived. SQLite allows one writer at a time anyway, so nothing is lost.
 */
export function serialiseTransactions(dataSource: DataSource): DataSource {
  const manager = dataSource.manager;
  const run = manager.transaction.bind(manager) as (...args: unknown[]) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  manager.transaction = ((...args: unknown[]) => {
    const next = tail.then(() => run(...args));
    tail = next.catch(() => undefined);
    return next;
  }) as Transaction;
  return dataSource;
}
