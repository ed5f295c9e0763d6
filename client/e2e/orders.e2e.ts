import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FREE_PATIENT } from '../../server/test/support/pca.js';
import { DEMO_PASSWORD, openBrowser, openPatients, signIn, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';
import { readyDialog } from './support/dialog.js';

// The demo Harbour morphine 1 mg/mL rule (invented demo values): demand soft 0.5–2 mg, hard 0.2–3 mg.
const SOFT_FINDING = 'Demand dose 2.5 mg is above the soft maximum 2 mg';
const QUERY = 'Demand dose of 2.5 mg is high for an opioid-naive patient: please start at 1 mg.';
// The order is for AMARU CONDORI (KB100983, Harbour bed H06), a demo patient with no PCA: a patient
// may have only one open PCA, and the demo's patient 1 (NOAH ACHTERBERG) has one awaiting verification.
const { name: PATIENT, bed: BED, weight: WEIGHT, identity } = FREE_PATIENT;
const MRN = identity.patientMrn;

async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect.poll(() => page.url()).toContain('/sign-in');
}

async function openNav(page: Page, name: string, heading: string): Promise<void> {
  await page.getByRole('navigation').getByRole('link', { name, exact: true }).click();
  await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
}

/** Types the password again in the open signing dialog and signs. */
async function signInDialog(page: Page, button: string): Promise<void> {
  const dialog = await readyDialog(page);
  await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
  await dialog.getByRole('button', { name: button }).click();
  await dialog.waitFor({ state: 'detached' });
}

/** A full-page snapshot from the top, so the fixed header sits where it belongs. */
async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await snapshot(page, name);
}

function orderIdFrom(url: string): number {
  const match = /\/orders\/(\d+)$/.exec(new URL(url).pathname);
  if (!match) throw new Error(`Not an order page: ${url}`);
  return Number(match[1]);
}

// Each step is a whole screen flow; on a busy two-core machine one can take over a minute.
const STEP_TIMEOUT_MS = 150_000;

describe('PCA order: sign, return with a query, revise, verify, release and label', () => {
  let server: RunningServer;
  let browser: BrowserSession;
  let firstId = 0;
  let revisedId = 0;
  let releaseCode = '';

  beforeAll(async () => {
    server = await startServer();
    browser = await openBrowser(server.baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  }, STEP_TIMEOUT_MS);

  it(
    'a prescriber writes an order from a standard set and explains the soft finding',
    async () => {
      const { page } = browser;
      await signInHome(page, 'amara.osei');
      await openPatients(page);
      await page.getByText(MRN).click();
      await page.getByRole('heading', { name: PATIENT, level: 1 }).waitFor();
      await page.getByRole('link', { name: 'New PCA order' }).click();
      await page.getByRole('heading', { name: 'New PCA order', level: 1 }).waitFor();
      await page.getByRole('region', { name: 'Patient' }).getByText('Opioid-naive').waitFor();

      await page.getByRole('button', { name: /^Adult morphine, morphine 1 mg\/mL/ }).click();
      const demand = page.getByRole('textbox', { name: 'Demand dose', exact: true });
      expect(await demand.inputValue()).toBe('1');
      expect(await page.getByRole('textbox', { name: '4-hour limit', exact: true }).inputValue()).toBe('30');
      await page.locator('[data-server-check="agrees"]').waitFor();
      await page.getByText('No findings: every value is inside its limits.').waitFor();

      // Past the hard maximum: blocked, said beside the field, in words as well as colour.
      await demand.fill('3.5');
      await page.getByText('Hard limit (blocks signing):').first().waitFor();
      // The demand dose and what it could give in an hour are both past a hard maximum.
      await page.getByText('Signing is blocked while values are marked as an error or outside a hard limit.').waitFor();
      // The live panel: 3.5 mg every 10 minutes could give 21 mg an hour (3.5 × ceil(60 ÷ 10),
      // docs/design.md), over the demo rule's 15 mg hard maximum; with the 4-hour limit emptied,
      // 84 mg in 4 hours, over its 40 mg.
      const fourHourField = page.getByRole('textbox', { name: '4-hour limit', exact: true });
      await fourHourField.fill('');
      const totals = page.getByRole('table', { name: 'What the pump could give' });
      const totalRow = (name: string) => totals.getByRole('row').filter({ hasText: name });
      await totalRow('Any other hour').getByText('21 mg').waitFor();
      await totalRow('Any other hour').getByText('Over hard maximum').waitFor();
      await totalRow('Any other 4 hours').getByText('84 mg').waitFor();
      await totalRow('Any other 4 hours').getByText('Over hard maximum').waitFor();
      await page.getByText('The pump could give up to 21 mg in an hour').first().waitFor();
      await page.getByRole('button', { name: 'Sign order' }).click();
      await page.getByText('Signing is blocked: correct').waitFor();
      await shot(page, 'order-hard-limit');
      await fourHourField.fill('30');

      await demand.fill('2.5');
      // 2.5 mg every 10 minutes could give 15 mg an hour, over the 10 mg soft maximum: the
      // prescriber holds it with the order's own 1-hour limit rather than give a second reason.
      await page.getByRole('textbox', { name: '1-hour limit', exact: true }).fill('10');
      // Beside the field (and in the live panel), before the server has even answered.
      const field = page.locator('div').filter({ has: demand }).filter({ hasText: SOFT_FINDING }).last();
      await field.getByText(SOFT_FINDING).waitFor();
      const reason = page.getByLabel('Reason for the demand dose outside the soft limit');
      await reason.waitFor();
      await page.locator('[data-server-check="agrees"]').waitFor();
      expect(await page.getByTestId('findings-summary').innerText()).toContain('1 outside a soft limit');
      await shot(page, 'order-soft-finding');

      // Signing without the reason puts the schema's message beside the reason.
      await page.getByRole('button', { name: 'Sign order' }).click();
      await page.getByText('Give a reason of at least 10 characters').waitFor();
      await reason.fill('Tolerated 2.5 mg in recovery without sedation');
      await page.getByRole('button', { name: 'Sign order' }).click();
      await page
        .getByRole('dialog')
        .getByText('morphine 1 mg/mL · demand 2.5 mg · lockout 10 min · 1-hour limit 10 mg · 4-hour limit 30 mg')
        .waitFor();
      await shot(page, 'order-sign-dialog');
      const dialog = await readyDialog(page);
      await dialog.getByLabel('Your password').fill('not-my-password');
      await dialog.getByRole('button', { name: 'Sign and send to pharmacy' }).click();
      await dialog.getByText('The password you signed with is not correct').waitFor();
      expect(await dialog.getByLabel('Your password').inputValue()).toBe('');
      await signInDialog(page, 'Sign and send to pharmacy');

      await page.getByRole('heading', { name: /^PCA order \d+$/, level: 1 }).waitFor();
      firstId = orderIdFrom(page.url());
      await page.getByText('Awaiting verification').first().waitFor();
      await page.getByText('Reason given: Tolerated 2.5 mg in recovery without sedation').waitFor();
      await shot(page, 'order-signed');
      await signOut(page);
    },
    STEP_TIMEOUT_MS,
  );

  it(
    'a pharmacist finds it in the queue and returns it with a query',
    async () => {
      const { page } = browser;
      await signIn(page, 'lin.park');
      await openNav(page, 'Verification', 'Verification');
      const rows = page.getByRole('table', { name: 'Orders awaiting verification' }).locator('tbody tr');
      // The demo's order for patient 1 waited longer, so it comes first.
      await expect.poll(() => rows.count()).toBe(2);
      expect(await rows.first().innerText()).toMatch(/\b4[5-9] min\b/);
      await shot(page, 'verification-queue');

      await rows.filter({ hasText: 'demand 2.5 mg' }).click();
      await page.getByRole('heading', { name: `Verify order ${firstId}`, level: 1 }).waitFor();
      await page.getByRole('region', { name: 'Patient' }).getByText(WEIGHT).waitFor();
      await page.getByRole('table', { name: 'Regimen against the limit rule' }).getByText('0.5–2 mg').waitFor();
      await shot(page, 'verification-detail');

      await page.getByRole('button', { name: 'Return with query' }).click();
      const returnDialog = await readyDialog(page);
      await returnDialog.getByLabel('Query for the prescriber').fill(QUERY);
      await returnDialog.getByRole('button', { name: 'Return to prescriber' }).click();
      await page.getByRole('heading', { name: 'Verification', level: 1 }).waitFor();
      await expect.poll(() => rows.count()).toBe(1);
      await signOut(page);
    },
    STEP_TIMEOUT_MS,
  );

  it(
    'the prescriber reads the query in My orders, revises to 1 mg and signs again',
    async () => {
      const { page } = browser;
      await signIn(page, 'amara.osei');
      await openNav(page, 'My orders', 'My orders');
      const row = page.getByRole('table', { name: 'My orders' }).locator('tbody tr').filter({ hasText: 'demand 2.5 mg' });
      await row.getByText(`Query: ${QUERY}`).waitFor();
      await shot(page, 'my-orders-returned');

      await row.getByRole('button', { name: `Revise order ${firstId}` }).click();
      await page.getByRole('heading', { name: `Revise PCA order ${firstId}`, level: 1 }).waitFor();
      await page.getByText(QUERY).waitFor();
      const demand = page.getByRole('textbox', { name: 'Demand dose', exact: true });
      expect(await demand.inputValue()).toBe('2.5');
      await demand.fill('1');
      await page.getByLabel('Reason for the demand dose outside the soft limit').waitFor({ state: 'detached' });
      await page.getByText('Changed. Was 2.5 mg in the returned version').waitFor();
      await page.locator('[data-server-check="agrees"]').waitFor();
      await shot(page, 'order-revise');
      await page.getByRole('button', { name: 'Sign order' }).click();
      await signInDialog(page, 'Sign and send to pharmacy');

      await page.getByRole('heading', { name: /^PCA order \d+$/, level: 1 }).waitFor();
      revisedId = orderIdFrom(page.url());
      expect(revisedId).toBeGreaterThan(firstId);
      await page.getByText(`Revises order ${firstId}`).waitFor();
      const changed = page.getByRole('table', { name: 'Regimen against the limit rule' }).locator('tr[data-changed]');
      await expect.poll(() => changed.count()).toBe(1);
      expect(await changed.innerText()).toContain('Demand dose');

      await page.getByRole('link', { name: 'Patients', exact: true }).click();
      await page.getByText(MRN).click();
      // The returned order, now superseded, and its revision.
      const patientOrders = page.getByRole('table', { name: 'PCA orders for this patient' }).locator('tbody tr');
      await expect.poll(() => patientOrders.count()).toBe(2);
      await patientOrders.filter({ hasText: 'Superseded' }).waitFor();
      await shot(page, 'patient-orders');
      await signOut(page);
    },
    STEP_TIMEOUT_MS,
  );

  it(
    'the pharmacist verifies the revision and releases a syringe with a printable label',
    async () => {
      const { page } = browser;
      await signIn(page, 'lin.park');
      await openNav(page, 'Verification', 'Verification');
      await page.getByRole('table', { name: 'Orders awaiting verification' }).locator('tbody tr').filter({ hasText: 'Revision' }).click();
      await page.getByRole('heading', { name: `Verify order ${revisedId}`, level: 1 }).waitFor();
      await page.locator('tr[data-changed]').getByText('2.5 mg').waitFor();
      await page.getByText(QUERY).waitFor();
      await shot(page, 'verification-revision');

      await page.getByRole('button', { name: 'Verify' }).click();
      await signInDialog(page, 'Sign and verify');
      await page.getByText('Verified').first().waitFor();

      await page.getByRole('button', { name: 'Release syringe' }).click();
      const dialog = await readyDialog(page);
      const volume = dialog.getByRole('textbox', { name: 'Volume', exact: true });
      expect(await dialog.getByLabel('Concentration').inputValue()).toBe('1');
      expect(await volume.inputValue()).toBe('50');
      await dialog.getByLabel('Batch').fill('B2403-17');
      const expiry = new Date(Date.now() + 7 * 24 * 3600_000);
      const pad = (n: number) => String(n).padStart(2, '0');
      await dialog.getByLabel('Expiry').fill(`${expiry.getFullYear()}-${pad(expiry.getMonth() + 1)}-${pad(expiry.getDate())}T18:00`);
      await dialog.getByLabel('Prepared by').fill('Lin Park');
      await dialog.getByLabel('Checked by').fill('Tomas Ortiz');
      await volume.fill('10');
      await dialog.getByLabel('Reason for the unusual volume').waitFor();
      await volume.fill('50');
      await dialog.getByLabel('Reason for the unusual volume').waitFor({ state: 'detached' });
      await dialog.getByRole('button', { name: 'Release syringe' }).click();

      releaseCode = (await dialog.getByTestId('release-code').innerText()).trim();
      expect(releaseCode).toMatch(/^[234679ACDEFGHJKMNPQRTUVWXYZ]{3}-[234679ACDEFGHJKMNPQRTUVWXYZ]{3}$/);
      await shot(page, 'release-code');

      await dialog.getByRole('link', { name: 'Print label' }).click();
      await page.getByRole('heading', { name: 'Syringe label', level: 1 }).waitFor();
      const label = page.getByRole('article', { name: 'Syringe label' });
      expect(await label.getByTestId('label-release-code').innerText()).toBe(releaseCode);
      const text = await label.innerText();
      expect(text).toContain(PATIENT);
      expect(text).toContain(`MRN ${MRN}`);
      expect(text).toContain(`Harbour, bed ${BED}`);
      expect(text).toContain('morphine 1 mg/mL');
      expect(text).toContain('50 mg in 50 mL');
      expect(text).toContain('Batch B2403-17');
      expect(text).toContain('For PCA use by this patient only.');
      await shot(page, 'release-label');
      await page.emulateMedia({ media: 'print' });
      expect(await page.getByRole('navigation').isVisible()).toBe(false);
      expect(await page.getByRole('button', { name: 'Print label' }).isVisible()).toBe(false);
      await shot(page, 'release-label-print');
      await page.emulateMedia({ media: 'screen' });
      await signOut(page);
    },
    STEP_TIMEOUT_MS,
  );

  it("the admin's mailbox holds the e-mails to pharmacy, prescriber and nurse-in-charge", async () => {
    const { page } = browser;
    await signIn(page, 'sam.rivera');
    await openNav(page, 'Mailbox', 'Mailbox');
    const table = page.getByRole('table', { name: 'Sent e-mails' });
    await table.getByText(`PCA order ${firstId} awaiting verification`).waitFor();
    await table.getByText(`PCA order ${revisedId} awaiting verification`).waitFor();
    await table.getByText(`PCA order ${firstId} returned with a query`).waitFor();
    await table.getByText(`PCA syringe released for Harbour bed ${BED}`).waitFor();
    const rows = await table.locator('tbody tr').allInnerTexts();
    expect(rows.some((row) => row.includes('pharmacy.') && row.includes('awaiting verification'))).toBe(true);
    expect(rows.some((row) => row.includes('amara.osei@') && row.includes('returned with a query'))).toBe(true);
    expect(rows.some((row) => row.includes('nurse-in-charge.') && row.includes('syringe released'))).toBe(true);

    await table.getByRole('button', { name: new RegExp(`Show the text of “PCA syringe released for Harbour bed ${BED}`) }).click();
    await table.getByText(`release code ${releaseCode}`).waitFor();
    await shot(page, 'mailbox');
  });

  it(
    'a weight-based ward offers only its per-kg set, worked out for the weight',
    async () => {
      const { page } = browser;
      await page.getByRole('button', { name: 'Sign out' }).click();
      await signInHome(page, 'amara.osei');
      await openPatients(page);
      await page.getByText('KB102248').click();
      await page.getByRole('link', { name: 'New PCA order' }).click();
      await page.getByRole('heading', { name: 'New PCA order', level: 1 }).waitFor();
      const sets = page.getByRole('group', { name: 'Standard order sets' }).getByRole('button');
      await expect.poll(() => sets.allInnerTexts()).toEqual(['Paediatric morphine (per kg), morphine 1 mg/mL']);
      await sets.first().click();
      // APAGBI good practice: morphine PCA bolus 10–20 mcg/kg; 0.02 mg/kg × 24.5 kg = 0.49 mg.
      expect(await page.getByRole('textbox', { name: 'Demand dose', exact: true }).inputValue()).toBe('0.49');
      await page.getByText('(soft 0.245–0.49 mg for 24.5 kg)').waitFor();
      await page.locator('[data-server-check="agrees"]').waitFor();
      await shot(page, 'order-per-kg');
    },
    STEP_TIMEOUT_MS,
  );
});
