import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, openBrowser, signIn, signInHome, snapshot as saveSnapshot, type BrowserSession } from './support/browser.js';
import { apiToken, callApi } from './support/api.js';
import { startFaleoloPca } from './support/demo-pca.js';
import { startServer, type RunningServer } from './support/server.js';
import { readyDialog } from './support/dialog.js';

// The demo's verified order for FALEOLO, Tavita (support/demo-pca.ts): the API starts it (both
// bedside checks) before the UI, so each observation here is the first of a fresh syringe.
type OrderSummary = { id: number; patientId: number; drugName: string; status: string };
type Message = { subject: string; to: string };

/** Both bedside checks through the API: the order becomes active with its syringe in use. */
async function startDemoPca(server: RunningServer): Promise<OrderSummary> {
  const kai = await apiToken(server.baseUrl, 'kai.mendes');
  const verified = await callApi<OrderSummary[]>(server.baseUrl, kai, 'GET', '/orders?status=verified');
  const order = verified.find((candidate) => candidate.drugName === 'hydromorphone');
  if (!order) throw new Error('The demo has no verified hydromorphone order');
  await startFaleoloPca(server.baseUrl, kai, order.id);
  const started = await callApi<OrderSummary>(server.baseUrl, kai, 'GET', `/orders/${order.id}`);
  expect(started.status).toBe('active');
  return started;
}

type Reading = {
  sedation: RegExp;
  respiratoryRate: string;
  spo2: string;
  pain: string;
  attempts: string;
  delivered: string;
  volume: string;
  remaining: string;
};

/** Typed in the form's own order: sedation and breathing before the pain score, then the pump. */
async function enterObservation(page: Page, reading: Reading): Promise<void> {
  await page.getByRole('radio', { name: reading.sedation }).check();
  await page.getByLabel('Respiratory rate').fill(reading.respiratoryRate);
  await page.getByLabel('SpO2').fill(reading.spo2);
  await page.locator('#observation-oxygenLitresPerMinute').fill('0'); // air
  await page.getByLabel('Pain score').fill(reading.pain);
  await page.getByLabel('Attempts').fill(reading.attempts);
  await page.getByLabel('Delivered').fill(reading.delivered);
  await page.getByLabel('Volume infused').fill(reading.volume);
  await page.getByLabel('Syringe left').fill(reading.remaining);
}

/** From the top of the page, so the full-page picture keeps the top bar in its place. */
async function snapshot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveSnapshot(page, name);
}

const SEDATION_3_ACTION = 'reduce the opioid dose by 25–50 % or notify the prescriber';

describe('observations: flags, usage charts and acknowledgement', () => {
  let server: RunningServer;
  let kai: BrowserSession;
  let sam: BrowserSession | undefined;
  let mei: BrowserSession | undefined;
  let order: OrderSummary;

  beforeAll(async () => {
    server = await startServer();
    order = await startDemoPca(server);
    kai = await openBrowser(server.baseUrl);
    await signInHome(kai.page, 'kai.mendes');
  });
  afterAll(async () => {
    await mei?.close();
    await sam?.close();
    await kai?.close();
    await server?.stop();
  });

  it('opens the PCA page from the patient page: tall-man drug, safe regimen, no flags yet', async () => {
    const { page } = kai;
    await page.goto(`/patients/${order.patientId}`);
    const link = page.getByRole('link', { name: 'PCA page: HYDROmorphone 0.2 mg/mL' });
    await link.waitFor();
    await snapshot(page, 'observations-patient-page');
    await link.click();
    await page.getByRole('heading', { name: 'PCA: FALEOLO, Tavita', level: 1 }).waitFor();
    expect(await page.getByTestId('pca-drug').innerText()).toBe('HYDROmorphone 0.2 mg/mL');
    const regimen = page.locator('dl[aria-label="Ordered regimen"]');
    expect(await regimen.innerText()).toMatch(
      /Demand dose\s+0\.2 mg[\s\S]*Lockout\s+10 min[\s\S]*Basal rate\s+0\.1 mg\/h[\s\S]*4-hour limit\s+6 mg/,
    );
    await page.getByText('No open flags.').waitFor();
    await page
      .getByTestId('next-observation')
      .getByText(/^Due at \d{2}:\d{2}$/)
      .waitFor();
    await page.getByText(/Cross-tolerance between opioids is incomplete/).waitFor();
    await snapshot(page, 'observations-pca-page-start');
  });

  it('records an observation with sedation 3: the urgent flag shows with its action', async () => {
    const { page } = kai;
    await page.getByRole('link', { name: 'Record observation' }).click();
    await page.getByRole('heading', { name: 'Record observation', level: 1 }).waitFor();
    await page.getByText('No observation yet for this PCA.').waitFor();
    await enterObservation(page, {
      sedation: /Frequently drowsy/,
      respiratoryRate: '12',
      spo2: '95',
      pain: '4',
      // One dose of 0.2 mg at 0.2 mg/mL is 1 mL: moments after the start the lockout allows only one.
      attempts: '6',
      delivered: '1',
      volume: '1',
      remaining: '49',
    });
    // Said before saving: sedation 3 is unacceptable, with the scale's action.
    await page.getByText('Urgent: saving raises an urgent flag').waitFor();
    await snapshot(page, 'observations-form-sedation-3');
    await page.getByRole('button', { name: 'Save observation' }).click();

    await page.getByRole('heading', { name: 'Observation saved' }).waitFor();
    const raised = page.getByRole('alert', { name: 'Urgent flag: Sedation level 3' });
    await raised.getByText('Urgent', { exact: true }).waitFor();
    await raised.getByText(SEDATION_3_ACTION, { exact: false }).waitFor();
    await snapshot(page, 'observations-urgent-flag-raised');

    await page.getByRole('link', { name: 'Open the PCA page' }).click();
    const open = page.getByRole('group', { name: 'Urgent flag: Sedation level 3' });
    await open.getByText(SEDATION_3_ACTION, { exact: false }).waitFor();
    await page.getByRole('heading', { name: 'Open flags (1)' }).waitFor();
  });

  it('e-mails the urgent flag', async () => {
    const token = await apiToken(server.baseUrl, 'sam.rivera');
    await expect
      .poll(
        async () =>
          (await callApi<Message[]>(server.baseUrl, token, 'GET', '/dev/mailbox')).find((message) =>
            message.subject.startsWith('URGENT: Sedation level 3'),
          )?.subject,
        {
          timeout: 10_000,
        },
      )
      .toMatch(/^URGENT: Sedation level 3 — Harbour bed H07$/);
  });

  it('checks pump totals as they are typed, then records a second observation', async () => {
    const { page } = kai;
    await page.getByRole('link', { name: 'Record observation' }).click();
    await page
      .getByTestId('last-observation')
      .getByText(/sedation 3, respiratory rate 12\/min/)
      .waitFor();
    await page.getByLabel('Attempts').fill('5');
    await page.getByText('At least 6: pump totals never go down within one syringe').waitFor();
    expect(await page.getByLabel('Attempts').getAttribute('aria-invalid')).toBe('true');
    await snapshot(page, 'observations-form-totals-check');
    await enterObservation(page, {
      sedation: /Slightly drowsy/,
      respiratoryRate: '14',
      spo2: '96',
      pain: '3',
      attempts: '9',
      delivered: '2',
      volume: '2',
      remaining: '48',
    });
    await page.getByRole('button', { name: 'Save observation' }).click();
    await page.getByRole('heading', { name: 'Observation saved' }).waitFor();
    await page.getByRole('link', { name: 'Open the PCA page' }).click();
    await page.getByRole('heading', { name: 'PCA: FALEOLO, Tavita', level: 1 }).waitFor();
  });

  it('draws the usage charts with the data, each with a title, a summary and a table', async () => {
    const { page } = kai;
    const attempts = page.getByRole('figure', { name: 'Attempts and doses delivered per hour' });
    const painSedation = page.getByRole('figure', { name: 'Pain score and sedation level' });
    const cumulative = page.getByRole('figure', { name: 'Cumulative dose (mg)' });
    for (const figure of [attempts, painSedation, cumulative]) await figure.locator('svg.recharts-surface').first().waitFor();
    await expect.poll(() => attempts.locator('.recharts-bar-rectangle').count()).toBeGreaterThan(0);
    await expect.poll(() => painSedation.locator('.recharts-line-dot').count()).toBe(4);
    await expect.poll(() => cumulative.locator('.recharts-line-curve').count()).toBe(1);
    await attempts
      .locator('figcaption')
      .getByText(/9 attempts, 2 doses delivered/)
      .waitFor();
    await painSedation
      .locator('figcaption')
      .getByText(/2 observations in the hours shown\. Latest at \d{2}:\d{2}: pain 3\/10, sedation 2/)
      .waitFor();
    await cumulative
      .locator('figcaption')
      .getByText(/^0\.4 mg given in the 12 hours shown/)
      .waitFor();

    await painSedation.getByRole('button', { name: 'Show as table' }).click();
    const rows = painSedation.getByRole('table').locator('tbody tr');
    // The table renders on the click: wait for it rather than counting at once.
    await expect.poll(() => rows.count()).toBe(2);
    expect(await rows.first().innerText()).toMatch(/4\s+3: Frequently drowsy/);

    await page.getByText('8 h', { exact: true }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('hours')).toBe('8');
    await cumulative
      .locator('figcaption')
      .getByText(/given in the 8 hours shown/)
      .waitFor();
    await snapshot(page, 'observations-pca-page-charts');
  });

  it('acknowledges the urgent flag with a note of what was done', async () => {
    const { page } = kai;
    await page.getByRole('button', { name: 'Acknowledge: Sedation level 3' }).click();
    const dialog = await readyDialog(page, 'Acknowledge flag');
    const note = dialog.getByLabel('What was done');
    await note.fill('ok');
    await expect.poll(() => note.inputValue()).toBe('ok');
    await dialog.getByRole('button', { name: 'Acknowledge flag' }).click();
    await dialog.getByText('Say what was done (at least 5 characters)').waitFor();
    await dialog.getByLabel('What was done').fill('Demand dose reduced by 25 % with Dr Osei; sedation rechecked at 2');
    await snapshot(page, 'observations-acknowledge');
    await dialog.getByRole('button', { name: 'Acknowledge flag' }).click();
    await dialog.waitFor({ state: 'hidden' });

    expect(await page.getByRole('group', { name: 'Urgent flag: Sedation level 3' }).count()).toBe(0);
    await page.getByRole('button', { name: /acknowledged flag/ }).click();
    const done = page.getByRole('group', { name: 'Urgent flag: Sedation level 3' });
    await done.getByText(/Acknowledged by Kai Mendes, .*: Demand dose reduced by 25 %/).waitFor();
    await snapshot(page, 'observations-flag-acknowledged');
  });

  it('sam.rivera proposes Harbour’s SpO2 threshold of 93 %, signed with a reason; nothing changes until a clinician signs it off', async () => {
    sam = await openBrowser(server.baseUrl);
    const { page } = sam;
    await signIn(page, 'sam.rivera');
    await page.getByRole('navigation').getByRole('link', { name: 'Ward policies' }).click();
    await page.getByRole('heading', { name: 'Ward policies', level: 1 }).waitFor();
    await page.getByRole('combobox', { name: 'Ward' }).click();
    await page.getByRole('option', { name: 'Harbour' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('ward')).not.toBeNull();
    const wardId = Number(new URL(page.url()).searchParams.get('ward'));
    const token = await apiToken(server.baseUrl, 'sam.rivera');
    const spo2Threshold = async () =>
      (await callApi<{ spo2Threshold: number }>(server.baseUrl, token, 'GET', `/wards/${wardId}/policy`)).spo2Threshold;

    const spo2 = page.getByLabel('SpO2 below');
    // Shipped default: urgent at 91 % or below (NEWS2 scale 1, Royal College of Physicians 2017).
    expect(await spo2.inputValue()).toBe('92');
    expect(await page.getByTestId('default-spo2Threshold').innerText()).toMatch(/^Shipped default\s+92 %$/);
    await spo2.fill('93');
    await page.getByRole('button', { name: 'Propose change' }).click();
    const dialog = await readyDialog(page, 'Propose a change to Harbour’s policy');
    const row = dialog.getByRole('table', { name: 'Settings to change' }).getByRole('row', { name: /SpO2 below/ });
    expect(await row.innerText()).toMatch(/SpO2 below\s+92 %\s+→\s*93 %/);
    // Reason and password are required, each said beside its field.
    await dialog.getByRole('button', { name: 'Sign and propose' }).click();
    await dialog.getByText('Give a reason of at least 10 characters').waitFor();
    await dialog.getByText('Enter your password to sign').waitFor();
    await dialog.getByLabel('Reason for the change').fill('Two near-misses on Harbour: flag SpO2 of 92 % as urgent too');
    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await snapshot(page, 'ward-policy-propose');
    await dialog.getByRole('button', { name: 'Sign and propose' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await page.getByText('Change proposed', { exact: true }).waitFor();

    // Pending: the ward still works to 92 %, the change shows above the form and holds another proposal.
    expect(await spo2Threshold()).toBe(92);
    const pending = page.getByRole('region', { name: 'Awaiting sign-off by a charge nurse or pharmacist' });
    await pending.waitFor();
    expect(await pending.innerText()).toContain('Proposed by Sam Rivera');
    expect(await pending.getByRole('row', { name: /SpO2 below/ }).innerText()).toMatch(/92 %\s+→\s*93 %/);
    expect(await spo2.inputValue()).toBe('92');
    await page.getByText(/^A change proposed by Sam Rivera is awaiting sign-off/).waitFor();
    await spo2.fill('94');
    expect(await page.getByRole('button', { name: 'Propose change' }).isDisabled()).toBe(true);
    await page.getByRole('button', { name: 'Undo changes' }).click();
    const waiting = await callApi<{ status: string; settings: { field: string; from: number; to: number }[] }[]>(
      server.baseUrl,
      token,
      'GET',
      `/wards/policy-changes?status=pending&wardId=${wardId}`,
    );
    expect(waiting).toHaveLength(1);
    expect(waiting[0]?.settings).toEqual([{ field: 'spo2Threshold', from: 92, to: 93 }]);
    await snapshot(page, 'ward-policy-pending');
  });

  it('mei.tan, charge nurse, signs the change off with her password: Harbour now flags below 93 %', async () => {
    mei = await openBrowser(server.baseUrl);
    const { page } = mei;
    await signInHome(page, 'mei.tan');
    await page.getByRole('navigation').getByRole('link', { name: 'Ward policy sign-off' }).click();
    await page.getByRole('heading', { name: 'Ward policy sign-off', level: 1 }).waitFor();
    const change = page.getByRole('article', { name: 'Harbour' });
    await change.getByText('Two near-misses on Harbour').waitFor();
    expect(await change.innerText()).toContain('Proposed by Sam Rivera');
    // Now, proposed and the shipped default side by side.
    expect(await change.getByRole('row', { name: /SpO2 below/ }).innerText()).toMatch(/92 %\s+→\s*93 %\s+92 %/);
    await snapshot(page, 'ward-policy-sign-off');
    await change.getByRole('button', { name: 'Sign off' }).click();
    const dialog = await readyDialog(page, 'Sign off Harbour’s policy change');
    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await dialog.getByRole('button', { name: 'Sign off' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await page.getByText('No ward policy change is waiting for sign-off.').waitFor();
  });

  it('sam.rivera sees the change applied in Recent changes, and a value past the floor is refused beside the field', async () => {
    if (!sam) throw new Error('sam.rivera signed in above');
    const { page } = sam;
    const wardId = Number(new URL(page.url()).searchParams.get('ward'));
    const token = await apiToken(server.baseUrl, 'sam.rivera');
    expect((await callApi<{ spo2Threshold: number }>(server.baseUrl, token, 'GET', `/wards/${wardId}/policy`)).spo2Threshold).toBe(93);
    await page.reload();
    const spo2 = page.getByLabel('SpO2 below');
    await expect.poll(() => spo2.inputValue()).toBe('93');
    await page.getByTestId('default-spo2Threshold').getByText('Changed locally').waitFor();
    expect(await page.getByRole('region', { name: 'Awaiting sign-off by a charge nurse or pharmacist' }).count()).toBe(0);
    // The change is audited, signed off by the charge nurse: the screen shows who changed what beneath the form.
    const recent = page.getByRole('region', { name: 'Recent changes' });
    await recent.getByText('→ 93').waitFor();
    expect(await recent.innerText()).toContain('Mei Tan');

    // Past the floor: 91 % or below is always urgent.
    await spo2.fill('91');
    await page.getByText(/^At least 92 %: SpO2 of 91 % or below is always urgent/).waitFor();
    expect(await spo2.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await spo2.getAttribute('aria-describedby')) ?? '';
    const messages = await Promise.all(
      describedBy
        .split(' ')
        .filter(Boolean)
        .map((id) => page.locator(`[id="${id}"]`).innerText()),
    );
    expect(messages.join(' ')).toContain('At least 92 %');
    await snapshot(page, 'ward-policy-harbour');
  });
});
