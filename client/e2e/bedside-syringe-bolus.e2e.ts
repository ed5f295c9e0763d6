import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CreateOrderRequest } from '@lockstep/shared';
import { FREE_PATIENT, ORDER as PCA_ORDER, RELEASE, ROSA, SETTINGS } from '../../server/test/support/pca.js';
import { DEMO_PASSWORD, openBrowser, openPatients, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { apiToken, callApi, patientIdByMrn } from './support/api.js';
import { startServer, type RunningServer } from './support/server.js';

// An active morphine PCA for AMARU CONDORI (KB100983, born 1998-10-14, Harbour bed H06), a demo
// patient with no PCA (a patient may have only one open PCA, and the demo's patient 1 has one
// awaiting verification), set up through the API: the PCA of server/test/support/pca.ts
// (1 mg/mL, demand 1 mg, lockout 10 min, 4-hour limit 30 mg) with a clinician bolus of up to 3 mg (over the demo library's soft maximum
// of 2 mg, so the prescriber gave a reason).
const ORDER: CreateOrderRequest = {
  ...PCA_ORDER,
  clinicianBolusDose: 3,
  overrides: [{ field: 'clinicianBolusDose', reason: 'Larger boluses agreed with the acute pain team' }],
};

/** Prescribed, verified, released, started by kai and rosa; then a second syringe is released. */
async function activeOrderWithSpareSyringe(baseUrl: string): Promise<{ id: number; spareCode: string }> {
  const [amara, lin, kai] = await Promise.all(['amara.osei', 'lin.park', 'kai.mendes'].map((name) => apiToken(baseUrl, name)));
  const patientId = await patientIdByMrn(baseUrl, amara, FREE_PATIENT.identity.patientMrn);
  const order = await callApi<{ id: number }>(baseUrl, amara, 'POST', '/orders', { ...ORDER, patientId });
  await callApi(baseUrl, lin, 'POST', `/orders/${order.id}/verify`, { signature: { password: DEMO_PASSWORD } });
  const first = await callApi<{ releaseCode: string }>(baseUrl, lin, 'POST', `/orders/${order.id}/releases`, RELEASE);
  const check = await callApi<{ id: number }>(baseUrl, kai, 'POST', `/orders/${order.id}/bedside-checks`, {
    ...FREE_PATIENT.identity,
    releaseCode: first.releaseCode,
    settings: SETTINGS,
  });
  await callApi(baseUrl, kai, 'POST', `/orders/${order.id}/bedside-checks/${check.id}/second`, { ...ROSA, settings: SETTINGS });
  const spare = await callApi<{ releaseCode: string }>(baseUrl, lin, 'POST', `/orders/${order.id}/releases`, {
    ...RELEASE,
    secondSyringeReason: 'Replacement for the running syringe',
  });
  return { id: order.id, spareCode: spare.releaseCode };
}

const stepHeading = (page: Page, name: string | RegExp) => page.getByRole('heading', { level: 2, name });
const orderRow = (page: Page) => page.getByRole('row', { name: new RegExp(FREE_PATIENT.name) });

async function enterMorphinePump(page: Page): Promise<void> {
  await page.getByRole('combobox', { name: 'Drug' }).click();
  await page.getByRole('option', { name: 'morphine', exact: true }).click();
  await page.getByLabel('Concentration').fill('1');
  await page.getByLabel('Syringe volume').fill('50');
  await page.getByLabel('Demand dose').fill('1');
  await page.getByLabel('Lockout').fill('10');
  await page.getByLabel('Basal rate').fill('0');
  await page.getByLabel('4-hour limit').fill('30');
}

describe('bedside: clinician bolus over the soft limit, and a syringe change with a new check', () => {
  let server: RunningServer;
  let kai: BrowserSession;
  let spareCode = '';

  beforeAll(async () => {
    server = await startServer();
    ({ spareCode } = await activeOrderWithSpareSyringe(server.baseUrl));
    kai = await openBrowser(server.baseUrl);
    await signInHome(kai.page, 'kai.mendes');
  });
  afterAll(async () => {
    await kai?.close();
    await server?.stop();
  });

  it('leads from the patient page to the patient’s PCA tasks', async () => {
    const { page } = kai;
    await openPatients(page);
    await page.getByText(FREE_PATIENT.identity.patientMrn).click();
    await page.getByRole('link', { name: 'Bedside PCA tasks' }).click();
    await page.getByRole('heading', { name: 'PCA orders', level: 1 }).waitFor();
    await page.getByText('Showing one patient’s PCA orders.').waitFor();
    await orderRow(page).getByText('Active').waitFor();
    expect(await page.locator('table[aria-label="PCA orders"] tbody tr').count()).toBe(1);
  });

  it('gives a witnessed bolus, asking for a reason over the ward’s soft limit', async () => {
    const { page } = kai;
    await orderRow(page).getByRole('link', { name: 'Clinician bolus' }).click();
    await stepHeading(page, 'Bolus and reason').waitFor();
    await page.getByText('Ordered clinician bolus: at most 3 mg of morphine').waitFor();
    await page.getByLabel('Bolus (mg)').fill('3.5');
    await page.getByRole('textbox', { name: 'Reason' }).fill('Breakthrough pain on movement, score 8');
    await page.getByRole('button', { name: 'Next: witness' }).click();
    await page.getByText('The most this order allows is 3 mg').waitFor();
    await page.getByLabel('Bolus (mg)').fill('2.5');
    await page.getByRole('button', { name: 'Next: witness' }).click();

    await stepHeading(page, 'Witness co-signs').waitFor();
    await page.getByLabel('Witness username').fill('rosa.adeyemi');
    await page.getByLabel('Witness password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign and record bolus' }).click();

    // 2.5 mg is over the ward's soft maximum of 2 mg: the server sends the nurse back for a reason.
    await stepHeading(page, 'Bolus and reason').waitFor();
    await page.getByText("2.5 mg is outside the ward's soft limit for a clinician bolus: give a reason").waitFor();
    await snapshot(page, 'bedside-bolus-soft-limit');
    await page.getByLabel('Reason for going outside the ward’s soft limit').fill('Opioid-tolerant; agreed with the acute pain team');
    await page.getByRole('button', { name: 'Next: witness' }).click();
    await page.getByLabel('Witness password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign and record bolus' }).click();

    await stepHeading(page, 'Clinician bolus recorded').waitFor();
    await page.getByText('2.5 mg morphine').waitFor();
    await page.getByText('Rosa Adeyemi').waitFor();
    await snapshot(page, 'bedside-bolus-recorded');
  });

  it('changes the syringe with witnessed waste, then a new blind check starts the new one', async () => {
    const { page } = kai;
    await page.getByRole('link', { name: 'Back to PCA orders' }).last().click();
    await orderRow(page).getByRole('link', { name: 'Change syringe' }).click();
    await stepHeading(page, 'The old syringe').waitFor();
    await page.getByLabel('Volume infused').fill('45');
    await page.getByLabel('Volume wasted').fill('4.8');
    await page.getByRole('button', { name: 'Next: new syringe' }).click();

    await stepHeading(page, 'The new syringe and the witness').waitFor();
    await page.getByLabel('New syringe release code').fill(spareCode.toLowerCase().replace('-', ''));
    await page.getByText('Discrepancy: 0.2 mL unaccounted for').waitFor();
    await page.getByLabel('Witness username').fill('rosa.adeyemi');
    await page.getByLabel('Witness password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign and finish old syringe' }).click();

    await stepHeading(page, /^Old syringe .+ finished$/).waitFor();
    await page.getByText('Within the ward’s tolerance: nothing to report.').waitFor();
    await snapshot(page, 'bedside-syringe-changed');
    await page.getByRole('link', { name: 'Start bedside check for the new syringe' }).click();

    await stepHeading(page, 'Identify the patient').waitFor();
    await page.getByLabel('MRN').fill(FREE_PATIENT.identity.patientMrn);
    await page.getByLabel('Date of birth').fill(FREE_PATIENT.identity.patientDateOfBirth);
    await page.getByRole('button', { name: 'Next: syringe' }).click();
    await page.getByLabel('Release code').fill(spareCode);
    await page.getByRole('button', { name: 'Next: first check' }).click();
    await enterMorphinePump(page);
    await page.getByRole('button', { name: 'Save first check' }).click();
    await stepHeading(page, 'Second check: a second nurse').waitFor();
    await page.getByLabel('Second nurse username').fill('rosa.adeyemi');
    await page.getByLabel('Second nurse password').fill(DEMO_PASSWORD);
    await enterMorphinePump(page);
    await page.getByRole('button', { name: 'Sign and compare' }).click();

    await stepHeading(page, 'Matched — new syringe started').waitFor();
    await page.getByRole('link', { name: 'Back to PCA orders' }).last().click();
    await expect.poll(() => orderRow(page).getByRole('link', { name: 'Change syringe' }).count()).toBe(1);
  });
});
