import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { spawnServer } from '../../../server/test/support/spawn-server.js';

const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
// What `npm run test:browser` builds before any test file runs; a file run on its own needs it too.
const BUILT = ['server/dist/main.js', 'shared/dist/index.js', 'client/dist/index.html'].map((file) => path.join(REPO_ROOT, file));

export interface RunningServer {
  baseUrl: string;
  stop(): Promise<void>;
}

/**
 * Starts the built app (server/dist, serving client/dist) as `npm start` would, on a free port and
 * a fresh SQLite file seeded with the demo data. One per test file keeps files independent.
 */
export async function startServer(): Promise<RunningServer> {
  const missing = BUILT.filter((file) => !existsSync(file));
  if (missing.length > 0) {
    throw new Error(
      `The built app is missing (${missing.join(', ')}): run \`npm run build\` at the repository root (\`npm run test:browser\` does).`,
    );
  }
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-e2e-'));
  const server = await spawnServer({
    script: BUILT[0],
    cwd: path.join(REPO_ROOT, 'server'),
    env: (port) => ({ NODE_ENV: 'test', PORT: String(port), DEMO: 'true', DATABASE_PATH: path.join(directory, 'e2e.sqlite') }),
    killAfterMs: 5_000,
  });
  return {
    baseUrl: server.baseUrl,
    async stop() {
      await server.stop();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
