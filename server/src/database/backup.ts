import { existsSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

export type BackupResult = { file: string; bytes: number };

// better-sqlite3's largest step.
const ALL_PAGES = 0x7fffffff;

/** `lockstep-2026-12-02T07-58-01-123Z.sqlite`: sorts by time and is a valid file name everywhere. */
export function backupFileName(at: Date): string {
  return `lockstep-${at.toISOString().replace(/[:.]/g, '-')}.sqlite`;
}

/**
 * An online backup with SQLite's backup API: a consistent copy of the live database, taken while
 * the server keeps reading and writing. It is written under a `.partial` name and renamed only
 * once it is complete and passes `integrity_check`, so a backup file is never half written.
 */
export async function backupDatabase(
  databaseFile: string,
  directory: string,
  options: { at?: Date; pagesPerStep?: number } = {},
): Promise<BackupResult> {
  if (!existsSync(databaseFile)) throw new Error(`There is no database at ${databaseFile}`);
  mkdirSync(directory, { recursive: true });
  const file = path.join(directory, backupFileName(options.at ?? new Date()));
  if (existsSync(file)) throw new Error(`${file} already exists`);
  const partial = `${file}.partial`;
  rmSync(partial, { force: true });

  const source = new Database(databaseFile, { readonly: true, fileMustExist: true });
  try {
    // By default every page in one step: in WAL mode this reader does not block the server's
    // writes, and a copy taken in one step never restarts because a write came between steps.
    const pages = options.pagesPerStep ?? ALL_PAGES;
    await source.backup(partial, { progress: () => pages });
  } finally {
    source.close();
  }

  const copy = new Database(partial, { fileMustExist: true });
  let integrity: unknown;
  try {
    // The live file runs in WAL mode; a backup is one self-contained file.
    copy.pragma('journal_mode = DELETE');
    integrity = copy.pragma('integrity_check', { simple: true });
  } finally {
    copy.close();
  }
  if (integrity !== 'ok') {
    rmSync(partial, { force: true });
    throw new Error(`The backup failed its integrity check: ${String(integrity)}`);
  }
  renameSync(partial, file);
  return { file, bytes: statSync(file).size };
}
