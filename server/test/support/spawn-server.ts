import { spawn } from 'node:child_process';
import { closeSync, openSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';

// Node built-ins only: the browser tests import this by a relative path and the benchmark
// compiles it into dist-bench, so it takes every path from its caller.

export type SpawnOptions = {
  /** The Node script to run, e.g. server/dist/main.js. */
  script: string;
  args?: string[];
  cwd: string;
  /** Settings laid over this process's environment, given the free port the server is to use. */
  env: (port: number) => Record<string, string>;
  /** Where the server's output goes; kept in memory when absent. */
  logFile?: string;
  /** How long the server may take to answer /api/health. */
  startupMs?: number;
  /** After SIGTERM, SIGKILL when the server is still running this much later; never when absent. */
  killAfterMs?: number;
};

export type SpawnedServer = {
  baseUrl: string;
  /** Everything the server printed so far, for failure messages. */
  output(): string;
  /** SIGKILL: no shutdown hooks, no checkpoint, no flush. Resolves once the process is gone. */
  kill(): Promise<void>;
  /** SIGTERM, as an operator would stop it. Resolves once the process is gone. */
  stop(): Promise<void>;
};

/** Starts a server script as a child process on a free port and waits until it answers /api/health. */
export async function spawnServer(options: SpawnOptions): Promise<SpawnedServer> {
  const port = await freePort();
  const log = options.logFile === undefined ? null : openSync(options.logFile, 'w');
  const child = spawn(process.execPath, [options.script, ...(options.args ?? [])], {
    cwd: options.cwd,
    env: { ...process.env, ...options.env(port) },
    stdio: log === null ? ['ignore', 'pipe', 'pipe'] : ['ignore', log, log],
  });
  if (log !== null) closeSync(log);
  const printed: string[] = [];
  child.stdout?.on('data', (chunk) => printed.push(String(chunk)));
  child.stderr?.on('data', (chunk) => printed.push(String(chunk)));
  const output = () => (options.logFile === undefined ? printed.join('') : readFileSync(options.logFile, 'utf8'));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const running = () => child.exitCode === null && child.signalCode === null;

  const end = (signal: NodeJS.Signals, killAfterMs?: number) => {
    if (running()) {
      child.kill(signal);
      if (killAfterMs !== undefined) setTimeout(() => running() && child.kill('SIGKILL'), killAfterMs).unref();
    }
    return exited;
  };

  const baseUrl = `http://127.0.0.1:${port}`;
  const startupMs = options.startupMs ?? 30_000;
  const deadline = Date.now() + startupMs;
  for (;;) {
    if (!running()) throw new Error(`The server exited early:\n${output()}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await end('SIGKILL');
      throw new Error(`The server did not answer /api/health within ${startupMs / 1000} s:\n${output()}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return { baseUrl, output, kill: () => end('SIGKILL'), stop: () => end('SIGTERM', options.killAfterMs) };
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
