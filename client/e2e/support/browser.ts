import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { type BrowserContext, chromium, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../../server/test/support/demo-accounts.js';

export { DEMO_PASSWORD };

// The flags keep headless chromium quiet on a machine with no outside network.
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function chromiumPath(): string {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].filter(
    (candidate): candidate is string => Boolean(candidate),
  );
  const found = candidates.find((candidate) => existsSync(candidate));
  if (!found) throw new Error('No chromium found: run `node client/e2e/ensure-chromium.mjs` first.');
  return found;
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A fresh browser profile: one per person at the screen, so sessions never leak between them. */
export async function openBrowser(baseUrl: string): Promise<BrowserSession> {
  const profile = mkdtempSync(path.join(tmpdir(), 'lockstep-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath(),
    headless: true,
    args: CHROMIUM_ARGS,
    baseURL: baseUrl,
    viewport: { width: 1366, height: 900 },
  });
  context.setDefaultTimeout(10_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, username: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Username').fill(username);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** The heading of the screen each demo account lands on: where its work waits. */
export const HOME_HEADINGS: Record<string, string> = {
  'amara.osei': 'My orders',
  'lin.park': 'Verification',
  'tomas.ortiz': 'Verification',
  'kai.mendes': 'PCA orders',
  'rosa.adeyemi': 'PCA orders',
  'mei.tan': 'Handover',
  'sam.rivera': 'Users',
};

/** Signs in and waits for the account's home screen (a nurse's by default, for accounts made in a test). */
export async function signInHome(
  page: Page,
  username: string,
  password = DEMO_PASSWORD,
  home = HOME_HEADINGS[username] ?? 'PCA orders',
): Promise<void> {
  await signIn(page, username, password);
  await page.getByRole('heading', { name: home, level: 1 }).waitFor();
}

/** Opens the Patients screen from the left navigation. */
export async function openPatients(page: Page): Promise<void> {
  await page.getByRole('navigation').getByRole('link', { name: 'Patients' }).click();
  await page.getByRole('heading', { name: 'Patients', level: 1 }).waitFor();
}

// Ignored by git; made by whichever test file saves something first.
const ARTIFACTS = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..', 'artifacts');

/** Saves a screenshot under client/e2e/artifacts for a person to look at after a run. */
export async function snapshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
}

/** Saves a file (a printed PDF, say) under client/e2e/artifacts, making the folder if need be. */
export function saveArtifact(file: string, data: Buffer): void {
  mkdirSync(ARTIFACTS, { recursive: true });
  writeFileSync(path.join(ARTIFACTS, file), data);
}
