import type { Logger } from 'typeorm';

/**
 * Counts the SQL statements TypeORM sends, so tests can prove a screen costs a fixed number of
 * queries however many patients it shows. Logs nothing.
 */
export class QueryCounter implements Logger {
  count = 0;

  logQuery(): void {
    this.count++;
  }

  logQueryError(): void {}
  logQuerySlow(): void {}
  logSchemaBuild(): void {}
  logMigration(): void {}
  log(): void {}

  /** Runs `work` and answers how many statements it sent. */
  async measure(work: () => Promise<unknown>): Promise<number> {
    const before = this.count;
    await work();
    return this.count - before;
  }
}

export const queryCounter = new QueryCounter();
