import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';

// The JavaScript a browser must fetch before the first screen: the entry chunk of the production
// build and every chunk it imports statically, as Vite's build manifest lists them. Screens load
// their own code later (route-level splitting), so this stays small however many screens there are.
// It reads client/dist, which `npm run test:browser` builds before any test file runs (for this
// file alone, `npm run build -w client`); no test file builds or changes it.
const DIST = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist');
const MANIFEST = path.join(DIST, '.vite', 'manifest.json');
const BUDGET_GZIP_BYTES = 300 * 1024;

/** One chunk in Vite's build manifest (build.manifest in vite.config.ts), keyed by source or chunk name. */
interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}
type Manifest = Record<string, ManifestChunk>;

function readManifest(): { manifest: Manifest; entry: ManifestChunk } {
  const manifest = JSON.parse(readFileSync(MANIFEST, 'utf8')) as Manifest;
  const entries = Object.values(manifest).filter((chunk) => chunk.isEntry);
  expect(entries, 'one entry: index.html').toHaveLength(1);
  return { manifest, entry: entries[0] };
}

/** The files of these chunks and of every chunk they import statically, however deep. */
function staticFiles(manifest: Manifest, chunks: ManifestChunk[]): Set<string> {
  const seen = new Set<ManifestChunk>();
  const visit = (chunk: ManifestChunk) => {
    if (seen.has(chunk)) return;
    seen.add(chunk);
    for (const key of chunk.imports ?? []) visit(manifest[key]);
  };
  chunks.forEach(visit);
  return new Set([...seen].map((chunk) => chunk.file));
}

const gzipBytes = (file: string) => gzipSync(readFileSync(path.join(DIST, file)), { level: 9 }).length;
const kb = (bytes: number) => (bytes / 1024).toFixed(1);

describe('production bundle', () => {
  it(`loads at most ${BUDGET_GZIP_BYTES / 1024} KB of JavaScript (gzip) before the first screen`, () => {
    expect(existsSync(MANIFEST), 'client/dist is missing: run `npm run build -w client` first (`npm run test:browser` does)').toBe(true);
    const { manifest, entry } = readManifest();
    // The manifest describes this build: its entry is the script index.html starts.
    expect(readFileSync(path.join(DIST, 'index.html'), 'utf8')).toContain(`src="/${entry.file}"`);
    const files = [...staticFiles(manifest, [entry])];
    const sizes = files.map((file) => ({ file: path.basename(file), gzip: gzipBytes(file) }));
    const total = sizes.reduce((sum, { gzip }) => sum + gzip, 0);
    console.log(
      `Initial JavaScript: ${kb(total)} KB gzip in ${files.length} files (${sizes.map((s) => `${s.file} ${kb(s.gzip)}`).join(', ')})`,
    );
    expect(files.length).toBeGreaterThan(1);
    expect(total).toBeLessThanOrEqual(BUDGET_GZIP_BYTES);
  });

  it("loads each screen's own code only when the screen opens", () => {
    expect(existsSync(MANIFEST), 'client/dist is missing: run `npm run build -w client` first (`npm run test:browser` does)').toBe(true);
    const { manifest, entry } = readManifest();
    const initial = staticFiles(manifest, [entry]);
    const routes = (entry.dynamicImports ?? []).map((key) => manifest[key]);
    expect(routes.length).toBeGreaterThan(1);
    const lazy = routes.map((route) => {
      expect(initial.has(route.file), `${route.src} is loaded before the first screen`).toBe(false);
      const own = [...staticFiles(manifest, [route])].filter((file) => !initial.has(file));
      return { name: path.basename(route.src ?? route.file, '.tsx'), gzip: own.reduce((sum, file) => sum + gzipBytes(file), 0) };
    });
    console.log(
      `Lazy screens, JavaScript beyond the initial (gzip KB): ${lazy.map((route) => `${route.name} ${kb(route.gzip)}`).join(', ')}`,
    );
  });
});
