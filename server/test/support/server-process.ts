import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { spawnServer, type SpawnedServer } from './spawn-server.js';

const SERVER_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const BUILT = [path.join(SERVER_ROOT, 'dist', 'main.js'), path.join(SERVER_ROOT, '..', 'shared', 'dist', 'index.js')];

/**
 * The built server (server/dist/main.js, as `npm start` runs it) on the given SQLite file, which it
 * migrates and seeds when new. The file outlives the process, so a test can restart on it.
 */
export function startBuiltServer(databasePath: string): Promise<SpawnedServer> {
  const missing = BUILT.filter((file) => !existsSync(file));
  if (missing.length > 0) {
    throw new Error(
      `The built server is missing (${missing.join(', ')}): run \`npm run test:crash\` at the repository root, which builds first.`,
    );
  }
  return spawnServer({
    script: BUILT[0],
    cwd: SERVER_ROOT,
    env: (port) => ({ NODE_ENV: 'test', PORT: String(port), DEMO: 'true', DATABASE_PATH: databasePath }),
  });
}
