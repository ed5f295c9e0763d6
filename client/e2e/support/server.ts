import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');

export interface RunningServer {
  baseUrl: string;
  stop(): Promise<void>;
}

/**
 * Starts the built app (server/dist, serving client/dist) as `npm start` would, on a free port and
 * a fresh SQLite file seeded with the demo data. One per test file keeps files independent.
 */
export async function startServer(): Promise<RunningServer> {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-e2e-'));
  const port = await freePort();
  const child = spawn(process.execPath, [path.join(REPO_ROOT, 'server', 'dist', 'main.js')], {
    cwd: path.join(REPO_ROOT, 'server'),
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), DEMO: 'true', DATABASE_PATH: path.join(directory, 'e2e.sqlite') },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  child.stdout?.on('data', (chunk) => output.push(String(chunk)));
  child.stderr?.on('data', (chunk) => output.push(String(chunk)));

  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, child, output);
  return {
    baseUrl,
    async stop() {
      await stopChild(child);
      rmSync(directory, { recursive: true, force: true });
    },
  };
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: string[]): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited early:\n${output.join('')}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  child.kill('SIGKILL');
  throw new Error(`The server did not answer /api/health within 30 s:\n${output.join('')}`);
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
    setTimeout(() => child.kill('SIGKILL'), 5_000).unref();
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
