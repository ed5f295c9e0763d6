import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signIn, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

// The demo hospital as a new user finds it after `npm start`: Harbour in the middle of a shift.
// VALDIVIA, Ines (H05) has an open urgent sedation flag; LINDQVIST, Margit (H11) is overdue for
// her observation; HALDORSEN, Sunniva (H08) has a syringe that empties this shift.

const boardRows = (page: Page) => page.getByRole('table', { name: 'Handover board' }).locator('tbody tr');

describe('the demo hospital on first open', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('the charge nurse lands on Harbour’s board: running PCAs, most at risk first', async () => {
    const { page } = browser;
    await signIn(page, 'mei.tan');
    await page.getByRole('heading', { name: 'Handover', level: 1 }).waitFor();
    await page
      .getByTestId('board-shift')
      .filter({ hasText: /^Harbour · (Day|Night) shift, / })
      .waitFor();
    await expect.poll(() => boardRows(page).count()).toBeGreaterThanOrEqual(8);
    const rows = await boardRows(page).allInnerTexts();
    // Urgent flag first, then the overdue observation, then the syringe that empties this shift.
    expect(rows[0]).toContain('VALDIVIA, Ines');
    expect(rows[0]).toMatch(/Urgent/);
    expect(rows[1]).toContain('LINDQVIST, Margit');
    expect(rows[1]).toMatch(/Overdue/);
    expect(rows[2]).toContain('HALDORSEN, Sunniva');
    expect(rows.some((row) => row.includes('Reconciliation discrepancy'))).toBe(true);
    expect(rows.some((row) => row.includes('Awaiting bedside check'))).toBe(true);
    await snapshot(page, 'demo-board');
  });

  it('a nurse lands on her PCA orders with a bedside check to do and observations due, and opens a running PCA’s charts', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(page, 'kai.mendes');
    await page.getByRole('heading', { name: 'PCA orders', level: 1 }).waitFor();
    const orders = page.getByRole('table', { name: 'PCA orders' });
    await orders.getByRole('link', { name: 'Start bedside check' }).first().waitFor();
    await orders
      .getByText(/Observation overdue by/)
      .first()
      .waitFor();
    await expect.poll(() => orders.getByRole('link', { name: 'Record observation' }).count()).toBeGreaterThanOrEqual(5);
    await snapshot(page, 'demo-nurse-pca-orders');

    await orders.getByRole('link', { name: /open the PCA page for WHITLOCK, Ezra/ }).click();
    await page.getByRole('heading', { name: 'PCA: WHITLOCK, Ezra', level: 1 }).waitFor();
    const attempts = page.getByRole('figure', { name: 'Attempts and doses delivered per hour' });
    const painSedation = page.getByRole('figure', { name: 'Pain score and sedation level' });
    const cumulative = page.getByRole('figure', { name: 'Cumulative dose (mg)' });
    for (const figure of [attempts, painSedation, cumulative]) await figure.locator('svg.recharts-surface').first().waitFor();
    // Twelve hours of hourly observations drawn from the seeded data.
    await expect.poll(() => attempts.locator('.recharts-bar-rectangle').count()).toBeGreaterThanOrEqual(10);
    await expect.poll(() => painSedation.locator('.recharts-line-dot').count()).toBeGreaterThanOrEqual(20);
    await painSedation
      .locator('figcaption')
      .getByText(/1[12] observations in the hours shown/)
      .waitFor();
    await cumulative
      .locator('figcaption')
      .getByText(/mg given in the 12 hours shown/)
      .waitFor();
    await page
      .getByText(/oral morphine/i)
      .first()
      .waitFor();
    await snapshot(page, 'demo-pca-page');
  });

  it('the pharmacist lands on a queue with work, the prescriber on a returned order', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(page, 'lin.park');
    await page.getByRole('heading', { name: 'Verification', level: 1 }).waitFor();
    await page.getByText('ACHTERBERG, Noah').first().waitFor();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(page, 'amara.osei');
    await page.getByRole('heading', { name: 'My orders', level: 1 }).waitFor();
    await page.getByText('RAGHUNATHAN, Dev').first().waitFor();
    await page
      .getByText(/Returned/)
      .first()
      .waitFor();
  });
});
