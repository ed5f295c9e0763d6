import path from 'node:path';
import { fileURLToPath } from 'node:url';

// This file runs as server/dist-bench/bench/paths.js.
export const SERVER_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const REPO_ROOT = path.resolve(SERVER_ROOT, '..');
