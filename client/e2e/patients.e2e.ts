import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, openPatients, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

// The demo hospital's admitted patients, on every ward (server/src/database/seed/demo-data.ts).
const DEMO_PATIENT_COUNT = 21;

describe('ward patient list', () => {
  let server: RunningServer;
  let browser: BrowserSession;

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
    await signInHome(browser.page, 'amara.osei');
    await openPatients(browser.page);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  const bodyRows = () => browser.page.locator('table tbody tr');

  it('lists every demo patient', async () => {
    await browser.page.getByText('KB100231').waitFor();
    expect(await bodyRows().count()).toBe(DEMO_PATIENT_COUNT);
  });

  it('searches by name and by MRN', async () => {
    const { page } = browser;
    const search = page.getByRole('textbox', { name: /search/i });
    await search.fill('lindqvist');
    await expect.poll(() => bodyRows().count()).toBe(1);
    await search.fill('KB102');
    await expect.poll(() => bodyRows().count()).toBe(3);
    await search.fill('');
    await expect.poll(() => bodyRows().count()).toBe(DEMO_PATIENT_COUNT);
  });

  it('filters by ward', async () => {
    const { page } = browser;
    await page.getByRole('combobox', { name: /ward/i }).click();
    await page.getByRole('option', { name: 'Wren' }).click();
    await expect.poll(() => bodyRows().count()).toBe(3);
    await snapshot(page, 'patients-wren');
    await page.getByRole('combobox', { name: /ward/i }).click();
    await page.getByRole('option', { name: 'All wards' }).click();
    await expect.poll(() => bodyRows().count()).toBe(DEMO_PATIENT_COUNT);
  });

  it('sorts by a column header', async () => {
    const { page } = browser;
    const header = page.getByRole('button', { name: /MRN/ });
    await header.click();
    const first = await bodyRows().first().innerText();
    await header.click();
    const firstAfter = await bodyRows().first().innerText();
    expect(firstAfter).not.toBe(first);
  });

  it('opens a patient page with the details the bedside needs', async () => {
    const { page } = browser;
    await page.getByText('KB102248').click();
    await page.getByRole('heading', { level: 1, name: /OKONKWO-BRANDT|Okonkwo-Brandt/ }).waitFor();
    await page.getByText('24.5 kg').first().waitFor();
    await page
      .getByText(/Ibuprofen/)
      .first()
      .waitFor();
    await snapshot(page, 'patient-page');
  });
});
