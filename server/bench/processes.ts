import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { spawnServer } from '../test/support/spawn-server.js';
import { SERVER_ROOT } from './paths.js';

export type RunningServer = { baseUrl: string; logFile: string; stop(): Promise<void> };

// Each run's server logs, kept until the next run (server/data is ignored by git).
const logDirectory = path.join(SERVER_ROOT, 'data', 'bench-logs');

/**
 * The built server (server/dist/main.js, serving client/dist) on a dataset, as in production:
 * NODE_ENV=production with a fresh JWT secret, no demo seeding, JSON request log to a file.
 */
export function startLockstep(databasePath: string, name: string): Promise<RunningServer> {
  return start(name, path.join(SERVER_ROOT, 'dist', 'main.js'), [], (port) => ({
    NODE_ENV: 'production',
    JWT_SECRET: randomBytes(32).toString('hex'),
    DEMO: 'false',
    PORT: String(port),
    DATABASE_PATH: databasePath,
  }));
}

/** The bare node:http + better-sqlite3 board server (baseline-server.ts). */
export function startBaseline(databasePath: string): Promise<RunningServer> {
  return start('baseline', path.join(SERVER_ROOT, 'dist-bench', 'bench', 'baseline-server.js'), [databasePath], (port) => ({
    PORT: String(port),
  }));
}

async function start(name: string, script: string, args: string[], env: (port: number) => Record<string, string>): Promise<RunningServer> {
  mkdirSync(logDirectory, { recursive: true });
  const logFile = path.join(logDirectory, `${name}.log`);
  const server = await spawnServer({ script, args, cwd: SERVER_ROOT, env, logFile, startupMs: 60_000, killAfterMs: 10_000 });
  return { baseUrl: server.baseUrl, logFile, stop: server.stop };
}
