import os from 'node:os';
import Database from 'better-sqlite3';

export type Machine = { cpu: string; cores: number; memoryGb: number; os: string; node: string; sqlite: string; loadAverage: string };

/** What the figures were measured on, and how busy it was when the run began. */
export function describeMachine(): Machine {
  const db = new Database(':memory:');
  const sqlite = db.prepare('SELECT sqlite_version() AS version').pluck().get() as string;
  db.close();
  return {
    cpu: os.cpus()[0]?.model.trim() ?? 'unknown',
    cores: os.availableParallelism(),
    memoryGb: Math.round(os.totalmem() / 1e9),
    os: `${os.type()} ${os.release()} (${os.arch()})`,
    node: process.version,
    sqlite,
    loadAverage: os
      .loadavg()
      .map((load) => load.toFixed(1))
      .join(', '),
  };
}
