import { spawn } from 'node:child_process';
import path from 'node:path';
import { REPO_ROOT } from './paths.js';
import { median } from './stats.js';

export type FirstRender = { firstMs: number; repeatMedianMs: number; repeatMs: number[] } | { error: string };

/** Installs chromium when it may (client/e2e/ensure-chromium.mjs), then times the board in it. */
export async function measureFirstRender(
  baseUrl: string,
  wardId: number,
  rows: number,
  runs: number,
  username: string,
): Promise<FirstRender> {
  const ensured = await run([path.join(REPO_ROOT, 'client', 'e2e', 'ensure-chromium.mjs')]);
  if (ensured.code !== 0) return { error: 'no chromium (see node client/e2e/ensure-chromium.mjs)' };
  let result: FirstRender = { error: 'not run' };
  // Once more on failure: on a busy machine one opening can miss the browser's timeout.
  for (let attempt = 0; attempt < 2 && 'error' in result; attempt++) {
    const measured = await run([
      path.join(REPO_ROOT, 'client', 'bench', 'first-render.mjs'),
      baseUrl,
      String(wardId),
      String(rows),
      String(runs),
      username,
    ]);
    result = parse(measured.stdout, measured.code);
  }
  return result;
}

function parse(stdout: string, code: number): FirstRender {
  try {
    const result = JSON.parse(stdout.trim().split('\n').at(-1) ?? '') as { firstMs: number; repeatMs: number[] } | { error: string };
    return 'error' in result ? result : { ...result, repeatMedianMs: median(result.repeatMs) };
  } catch {
    return { error: `first-render.mjs printed no result (exit ${code}): ${stdout.slice(-300)}` };
  }
}

function run(args: string[]): Promise<{ code: number; stdout: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, args, { cwd: REPO_ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
    let stdout = '';
    child.stdout.on('data', (chunk) => (stdout += String(chunk)));
    child.once('exit', (code) => resolve({ code: code ?? 1, stdout }));
  });
}
