import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, openPatients, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

// The built client uses the default idle sign-out: 15 minutes, with a warning a minute before.
// Playwright's clock runs the page's time forward without waiting for it.

const warning = (page: Page) => page.getByRole('dialog', { name: 'Are you still there?' });

describe('idle sign-out on a shared ward computer', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
    await browser.page.clock.install();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('warns a minute before, with a countdown and "Stay signed in" ready to press', async () => {
    const { page } = browser;
    await signInHome(page, 'kai.mendes');
    await openPatients(page);
    await page.getByText('KB100231').click();
    await page.getByRole('heading', { name: 'ACHTERBERG, Noah', level: 1 }).waitFor();

    await page.clock.fastForward('13:50');
    await page.clock.runFor(2_000);
    expect(await warning(page).count()).toBe(0);

    await page.clock.fastForward('00:15');
    await warning(page).waitFor();
    expect(await page.getByTestId('idle-countdown').innerText()).toMatch(/^0:[45]\d$/);
    // Focus starts on the button, so Enter keeps the session; the dialog is named by its title.
    await expect.poll(() => page.evaluate(() => document.activeElement?.textContent ?? '')).toBe('Stay signed in');
    await snapshot(page, 'idle-warning');
  });

  it('"Stay signed in" keeps the session and starts the 15 minutes again', async () => {
    const { page } = browser;
    await warning(page).getByRole('button', { name: 'Stay signed in' }).click();
    await warning(page).waitFor({ state: 'detached' });

    await page.clock.fastForward('13:00');
    await page.clock.runFor(2_000);
    expect(await warning(page).count()).toBe(0);
    await page.getByRole('heading', { name: 'ACHTERBERG, Noah', level: 1 }).waitFor();
  });

  it('signs out after 15 minutes without activity and says why; the next person starts from home', async () => {
    const { page } = browser;
    await page.clock.fastForward('01:05');
    await warning(page).waitFor();
    // Moving the mouse is not enough once the warning shows: it needs an answer.
    await page.mouse.move(10, 10);
    await page.mouse.move(200, 300);
    await page.clock.fastForward('01:00');
    await expect.poll(() => new URL(page.url()).pathname).toBe('/sign-in');
    expect(new URL(page.url()).searchParams.get('redirectTo')).toBeNull();
    await page.getByText('Signed out after 15 minutes without activity. Sign in again to carry on.').waitFor();
    await snapshot(page, 'idle-signed-out');

    await signInHome(page, 'rosa.adeyemi');
    expect(new URL(page.url()).pathname).toBe('/bedside');
  });
});
