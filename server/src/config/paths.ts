import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root: two levels above this file in both src/ and dist/ layouts. */
export const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');

/**
 * Relative paths in settings are taken from the repository root, so `npm start` (which runs in the
 * server folder) and a shell at the root mean the same file.
 */
export function fromRepoRoot(setting: string): string {
  return path.resolve(REPO_ROOT, setting);
}

/** The built client, served by Nest on the same port, or null when it has not been built. */
export function clientDistPath(): string | null {
  const candidate = fromRepoRoot(process.env.CLIENT_DIST_PATH ?? 'client/dist');
  return existsSync(path.join(candidate, 'index.html')) ? candidate : null;
}
