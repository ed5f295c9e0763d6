import { type ChildProcess, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { closeSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
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
  const port = await freePort();
  mkdirSync(logDirectory, { recursive: true });
  const logFile = path.join(logDirectory, `${name}.log`);
  const log = openSync(logFile, 'w');
  const child = spawn(process.execPath, [script, ...args], {
    cwd: SERVER_ROOT,
    env: { ...process.env, ...env(port) },
    stdio: ['ignore', log, log],
  });
  closeSync(log);
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, child, logFile);
  return { baseUrl, logFile, stop: () => stop(child) };
}

async function waitForHealth(baseUrl: string, child: ChildProcess, logFile: string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited early:\n${readFileSync(logFile, 'utf8')}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill('SIGKILL');
  throw new Error(`The server did not answer /api/health within 60 s; its log: ${logFile}`);
}

function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
    setTimeout(() => child.kill('SIGKILL'), 10_000).unref();
  });
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}
