import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';

// The JavaScript a browser must fetch before the first screen: the entry script of the production
// index.html, the modules it preloads and everything they import statically. Screens load their own
// code later (route-level splitting), so this stays small however many screens there are.
const DIST = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist');
const BUDGET_GZIP_BYTES = 300 * 1024;

function initialScripts(): string[] {
  const html = readFileSync(path.join(DIST, 'index.html'), 'utf8');
  const entries = [
    ...html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g),
    ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g),
  ].map((match) => match[1]);
  const seen = new Set<string>();
  const visit = (url: string) => {
    const file = path.join(DIST, url.replace(/^\//, ''));
    if (seen.has(file)) return;
    seen.add(file);
    const code = readFileSync(file, 'utf8');
    // Static imports only: `import x from "./a.js"`, `import "./a.js"`, `export * from "./a.js"`; never `import("./a.js")`.
    for (const match of code.matchAll(/(?:\bimport|\bexport)\s*(?:[\w$*{}\s,]+from\s*)?["'](\.\/[^"']+\.js)["']/g))
      visit(path.posix.join(path.posix.dirname(url), match[1]));
  };
  entries.forEach(visit);
  return [...seen];
}

describe('production bundle', () => {
  it(`loads at most ${BUDGET_GZIP_BYTES / 1024} KB of JavaScript (gzip) before the first screen`, () => {
    expect(existsSync(path.join(DIST, 'index.html')), 'client/dist is missing: run `npm run build` first').toBe(true);
    const files = initialScripts();
    const sizes = files.map((file) => ({ file: path.basename(file), gzip: gzipSync(readFileSync(file), { level: 9 }).length }));
    const total = sizes.reduce((sum, { gzip }) => sum + gzip, 0);
    console.log(
      `Initial JavaScript: ${(total / 1024).toFixed(1)} KB gzip in ${files.length} files (${sizes.map((s) => `${s.file} ${(s.gzip / 1024).toFixed(1)}`).join(', ')})`,
    );
    expect(files.length).toBeGreaterThan(1);
    expect(total).toBeLessThanOrEqual(BUDGET_GZIP_BYTES);
  });
});
