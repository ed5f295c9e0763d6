import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, openBrowser, signIn, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';

// The demo's verified order: TAVITA FALEOLO (Harbour bed H07), HYDROmorphone 0.2 mg/mL, demand
// 0.2 mg, lockout 10 min, basal 0.1 mg/h, 4-hour limit 6 mg, a ready 50 mL syringe HK3-7QT.
type Entry = { lockout: string };
const CORRECT: Entry = { lockout: '10' };

/** The API as the signed-in person, from inside the page (their token never leaves the tab). */
function apiAs<T>(page: Page, path: string): Promise<T> {
  return page.evaluate(async (target) => {
    const session = JSON.parse(sessionStorage.getItem('lockstep.session') ?? '{}') as { accessToken?: string };
    const response = await fetch(target, { headers: { Authorization: `Bearer ${session.accessToken ?? ''}` } });
    return (await response.json()) as T;
  }, path);
}

function orderIdOf(page: Page): number {
  const match = /\/bedside\/(\d+)\//.exec(new URL(page.url()).pathname);
  if (!match) throw new Error(`Not a bedside address: ${page.url()}`);
  return Number(match[1]);
}

const stepHeading = (page: Page, name: string | RegExp) => page.getByRole('heading', { level: 2, name });

/** One nurse's entry of the pump, typed into the empty form of the current step. */
async function enterPump(page: Page, entry: Entry): Promise<void> {
  await page.getByRole('combobox', { name: 'Drug' }).click();
  await page.getByRole('option', { name: 'HYDROmorphone' }).click();
  await page.getByLabel('Concentration').fill('0.2');
  await page.getByLabel('Syringe volume').fill('50');
  await page.getByLabel('Demand dose').fill('0.2');
  await page.getByLabel('Lockout').fill(entry.lockout);
  await page.getByLabel('Basal rate').fill('0.1');
  await page.getByLabel('4-hour limit').fill('6');
}

/** Steps 1–3 of a check, as kai.mendes: wristband, syringe label, first entry. */
async function identifyScanAndEnter(page: Page, entry: Entry, snapshotPrefix?: string): Promise<void> {
  await stepHeading(page, 'Identify the patient').waitFor();
  // Never prefilled: the identifiers come from the wristband, not from the screen.
  expect(await page.getByLabel('MRN').inputValue()).toBe('');
  expect(await page.getByText('KB100672').count()).toBe(0);
  await page.getByLabel('MRN').fill('KB100672');
  await page.getByLabel('Date of birth').fill('1979-07-28');
  if (snapshotPrefix) await snapshot(page, `${snapshotPrefix}-identify`);
  await page.getByLabel('Date of birth').press('Enter');

  await stepHeading(page, 'Check the syringe').waitFor();
  // The focus moved to the release code: a scanner (or typing) goes straight in, Enter goes on.
  await expect
    .poll(() => page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.labels?.[0]?.textContent ?? ''))
    .toMatch(/^Release code/);
  await page.keyboard.type('hk3 7qt');
  await page.keyboard.press('Enter');

  await stepHeading(page, 'First check: Kai Mendes').waitFor();
  await enterPump(page, entry);
  if (snapshotPrefix) await snapshot(page, `${snapshotPrefix}-first-check`);
  await page.getByRole('button', { name: 'Save first check' }).click();
}

const NUMBER_LABELS = [
  'Concentration',
  'Syringe volume',
  'Loading dose',
  'Demand dose',
  'Lockout',
  'Basal rate',
  '1-hour limit',
  '4-hour limit',
];

/** The first entry is gone: the second nurse starts from an empty form, never a prefilled one. */
async function expectEmptySecondEntry(page: Page): Promise<void> {
  await stepHeading(page, 'Second check: a second nurse').waitFor();
  expect(await page.getByRole('combobox', { name: 'Drug' }).inputValue()).toBe('');
  for (const label of NUMBER_LABELS) expect(await page.getByLabel(label).inputValue(), label).toBe('');
}

/** Step 4: rosa.adeyemi signs in on the same screen and enters the pump blind. */
async function secondNurse(page: Page, entry: Entry, snapshotName?: string): Promise<void> {
  await page.getByLabel('Second nurse username').fill('rosa.adeyemi');
  await page.getByLabel('Second nurse password').fill(DEMO_PASSWORD);
  await enterPump(page, entry);
  if (snapshotName) await snapshot(page, snapshotName);
  await page.getByRole('button', { name: 'Sign and compare' }).click();
}

describe('bedside: blind two-nurse check, a mismatch, a match, and discontinue with a discrepancy', () => {
  let server: RunningServer;
  let kai: BrowserSession;
  let sam: BrowserSession | undefined;
  let orderId = 0;

  beforeAll(async () => {
    server = await startServer();
    kai = await openBrowser(server.baseUrl);
    await signInHome(kai.page, 'kai.mendes');
  });
  afterAll(async () => {
    await sam?.close();
    await kai?.close();
    await server?.stop();
  });

  it('lists the verified order, waiting for a bedside check', async () => {
    const { page } = kai;
    await page.getByRole('navigation').getByRole('link', { name: 'PCA orders' }).click();
    await page.getByRole('heading', { name: 'PCA orders', level: 1 }).waitFor();
    const row = page.getByRole('row', { name: /FALEOLO, Tavita/ });
    await row.getByText('HYDROmorphone 0.2 mg/mL').waitFor();
    await row.getByText('Verified').waitFor();
    await row.getByText('demand 0.2 mg · lockout 10 min · basal 0.1 mg/h · 4-hour limit 6 mg').waitFor();
    await row.getByText('Needs a bedside check to start').waitFor();
    await snapshot(page, 'bedside-orders');
    await row.getByRole('link', { name: 'Start bedside check' }).click();
    await page.getByRole('heading', { name: 'Bedside check', level: 1 }).waitFor();
    orderId = orderIdOf(page);
  });

  it('a first entry with the lockout typed as 6 does not match, and nothing starts', async () => {
    const { page } = kai;
    await identifyScanAndEnter(page, { lockout: '6' }, 'bedside');

    await expectEmptySecondEntry(page);
    await snapshot(page, 'bedside-second-check');
    // The first nurse cannot be the second check too.
    await page.getByLabel('Second nurse username').fill('kai.mendes');
    await page.getByLabel('Second nurse password').fill(DEMO_PASSWORD);
    await enterPump(page, CORRECT);
    await page.getByRole('button', { name: 'Sign and compare' }).click();
    await page.getByText('You cannot be both people: a different colleague signs here').waitFor();
    await secondNurse(page, CORRECT);

    await stepHeading(page, 'Not matched — nothing started').waitFor();
    const table = page.getByRole('table', { name: 'Settings to correct on the pump' });
    await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
    const lockout = table.getByRole('row', { name: /Lockout/ });
    expect(await lockout.innerText()).toMatch(/Lockout\s+First check \(Kai Mendes\)\s+6 min\s+10 min\s+10 min/);
    await snapshot(page, 'bedside-mismatch');
    expect((await apiAs<{ status: string; releases: { status: string }[] }>(page, `/api/orders/${orderId}`)).status).toBe('verified');
    expect((await apiAs<{ releases: { status: string }[] }>(page, `/api/orders/${orderId}`)).releases.map((r) => r.status)).toEqual([
      'ready',
    ]);
  });

  it('a new check, with both entries right, matches and starts the PCA', async () => {
    const { page } = kai;
    await page.getByRole('button', { name: 'Start a new check' }).click();
    await identifyScanAndEnter(page, CORRECT);
    await expectEmptySecondEntry(page);
    await secondNurse(page, CORRECT);

    await stepHeading(page, 'Matched — PCA started').waitFor();
    await page.getByText(/The PCA started at \d{1,2} [A-Z][a-z]{2} \d{4}, \d{2}:\d{2}/).waitFor();
    await page.getByRole('region', { name: 'Patient and order' }).getByText('Active').waitFor();
    await snapshot(page, 'bedside-matched');
    expect((await apiAs<{ status: string }>(page, `/api/orders/${orderId}`)).status).toBe('active');

    await page.getByRole('link', { name: 'Back to PCA orders' }).last().click();
    const row = page.getByRole('row', { name: /FALEOLO, Tavita/ });
    await row.getByText('Active').waitFor();
    for (const action of ['Clinician bolus', 'Change syringe', 'Discontinue']) await row.getByRole('link', { name: action }).waitFor();
    expect(await row.getByRole('link', { name: 'Start bedside check' }).count()).toBe(0);
    await snapshot(page, 'bedside-orders-active');
  });

  it('discontinues with witnessed waste; a 5 mL discrepancy raises a review flag', async () => {
    const { page } = kai;
    await page
      .getByRole('row', { name: /FALEOLO, Tavita/ })
      .getByRole('link', { name: 'Discontinue' })
      .click();
    await stepHeading(page, 'Reason and final volumes').waitFor();
    await page.getByRole('textbox', { name: 'Reason' }).fill('Pain controlled on oral analgesia; acute pain team stopped the PCA');
    await page.getByLabel('Final volume infused').fill('30');
    await page.getByLabel('Volume wasted').fill('15');
    await page.getByRole('button', { name: 'Next: confirm' }).click();

    await stepHeading(page, 'Confirm and co-sign').waitFor();
    await page.getByText('Discrepancy: 5 mL unaccounted for').waitFor();
    // A wrong witness password is shown beside the field; kai stays signed in.
    await page.getByLabel('Witness username').fill('rosa.adeyemi');
    await page.getByLabel('Witness password').fill('not-her-password');
    await page.getByRole('button', { name: 'Sign and discontinue' }).click();
    await page.getByText('Username or password is incorrect').waitFor();
    await stepHeading(page, 'Confirm and co-sign').waitFor();
    await page.getByLabel('Witness password').fill(DEMO_PASSWORD);
    await snapshot(page, 'bedside-discontinue-confirm');
    await page.getByRole('button', { name: 'Sign and discontinue' }).click();

    await stepHeading(page, 'PCA discontinued').waitFor();
    const reconciliation = page.getByRole('table', { name: 'Reconciliation of syringe HK3-7QT' });
    for (const text of ['50 mL', '30 mL', '15 mL', '5 mL unaccounted for']) await reconciliation.getByText(text, { exact: true }).waitFor();
    const flag = page.getByRole('alert').filter({ hasText: 'Flag: Review' });
    await flag.getByText(/5 mL unaccounted for/).waitFor();
    await flag.getByText(/Pharmacy to review the controlled-drug record/).waitFor();
    await page.getByRole('region', { name: 'Patient and order' }).getByText('Discontinued').waitFor();
    await snapshot(page, 'bedside-discontinued');
  });

  it('e-mails the ward pharmacy about the discrepancy', async () => {
    sam = await openBrowser(server.baseUrl);
    await signIn(sam.page, 'sam.rivera');
    await sam.page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
    type Message = { to: string; subject: string; text: string };
    await expect
      .poll(
        async () =>
          (await apiAs<Message[]>(sam!.page, '/api/dev/mailbox')).find((message) =>
            message.subject.startsWith('Reconciliation discrepancy'),
          )?.subject,
        {
          timeout: 10_000,
        },
      )
      .toBe(`Reconciliation discrepancy: PCA order ${orderId}, Harbour bed H07`);
  });
});
