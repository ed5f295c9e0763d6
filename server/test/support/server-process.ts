import { type ChildProcess, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const SERVER_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const BUILT = [path.join(SERVER_ROOT, 'dist', 'main.js'), path.join(SERVER_ROOT, '..', 'shared', 'dist', 'index.js')];

export interface ServerProcess {
  baseUrl: string;
  /** Everything the server printed, for failure messages. */
  output: string[];
  /** SIGKILL: no shutdown hooks, no checkpoint, no flush. Resolves once the process is gone. */
  kill(): Promise<void>;
  /** SIGTERM, as an operator would stop it. */
  stop(): Promise<void>;
}

/**
 * The built server (server/dist/main.js, as `npm start` runs it) as a child process on a free port
 * and the given SQLite file, which it migrates and seeds when new. Like the browser tests'
 * client/e2e/support/server.ts, but the file outlives the process so a test can restart on it.
 */
export async function startBuiltServer(databasePath: string): Promise<ServerProcess> {
  const missing = BUILT.filter((file) => !existsSync(file));
  if (missing.length > 0) {
    throw new Error(
      `The built server is missing (${missing.join(', ')}): run \`npm run test:crash\` at the repository root, which builds first.`,
    );
  }
  const port = await freePort();
  const child = spawn(process.execPath, [BUILT[0]], {
    cwd: SERVER_ROOT,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), DEMO: 'true', DATABASE_PATH: databasePath },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  child.stdout?.on('data', (chunk) => output.push(String(chunk)));
  child.stderr?.on('data', (chunk) => output.push(String(chunk)));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));

  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, child, output);
  const end = (signal: NodeJS.Signals) => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    return exited;
  };
  return { baseUrl, output, kill: () => end('SIGKILL'), stop: () => end('SIGTERM') };
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: string[]): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited early:\n${output.join('')}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  child.kill('SIGKILL');
  throw new Error(`The server did not answer /api/health within 30 s:\n${output.join('')}`);
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
