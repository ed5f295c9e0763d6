// @ts-check
// The handover board's first render in headless chromium, for `npm run bench`:
//   node client/bench/first-render.mjs <base url> <ward id> <rows> <runs> <username>
// Signs in through the sign-in page, then opens the board `runs` + 1 times. Each time is from
// the start of the navigation to the moment every row of the board is on screen. The first
// opening also loads the board's code; the rest reload the page with the browser's cache.
// Prints one line of JSON: {"firstMs": n, "repeatMs": [n, ...]} or {"error": "..."}.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';

const [baseUrl, ward, rows, runs, username] = process.argv.slice(2);
const executablePath = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].find(
  (candidate) => candidate && existsSync(candidate),
);
if (!executablePath) {
  console.log(JSON.stringify({ error: 'no chromium (node client/e2e/ensure-chromium.mjs installs it)' }));
  process.exit(0);
}

const profile = mkdtempSync(path.join(tmpdir(), 'lockstep-render-'));
const context = await chromium.launchPersistentContext(profile, {
  executablePath,
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
  baseURL: baseUrl,
  viewport: { width: 1366, height: 900 },
});
try {
  context.setDefaultTimeout(60_000);
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto('/sign-in');
  await page.getByLabel('Username').fill(username);
  await page.getByLabel('Password').fill('lockstep-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

  /** Milliseconds from the navigation's start until the board shows all its rows. */
  const open = async () => {
    await page.goto(`/handover?ward=${ward}`, { waitUntil: 'commit' });
    const handle = await page.waitForFunction(
      (expected) => document.querySelectorAll('table[aria-label="Handover board"] tbody tr').length >= expected && performance.now(),
      Number(rows),
      { polling: 'raf' },
    );
    return Math.round(Number(await handle.jsonValue()));
  };
  const firstMs = await open();
  const repeatMs = [];
  for (let i = 0; i < Number(runs); i++) repeatMs.push(await open());
  console.log(JSON.stringify({ firstMs, repeatMs }));
} catch (error) {
  console.log(JSON.stringify({ error: error instanceof Error ? error.message.split('\n')[0] : String(error) }));
} finally {
  await context.close();
  rmSync(profile, { recursive: true, force: true });
}
