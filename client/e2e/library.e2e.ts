import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { startServer, type RunningServer } from './support/server.js';
import { readyDialog } from './support/dialog.js';

// Cedar's demo library (invented values) with one change: morphine demand soft max 2 → 1.8 mg.
const HEADER = 'drug,concentration_per_ml,dose_unit,per_kg,parameter,hard_min,soft_min,soft_max,hard_max';
const ROWS = [
  'morphine,1,mg,no,loading_dose,,,5,10',
  'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3',
  'morphine,1,mg,no,lockout_minutes,5,6,15,30',
  'morphine,1,mg,no,basal_rate_per_hour,,,1,2',
  'morphine,1,mg,no,one_hour_limit,,,10,15',
  'morphine,1,mg,no,four_hour_limit,,,30,40',
  'morphine,1,mg,no,clinician_bolus_dose,,,2,4',
  'hydromorphone,0.2,mg,no,loading_dose,,,1,2',
  'hydromorphone,0.2,mg,no,demand_dose,0.05,0.1,0.4,0.6',
  'hydromorphone,0.2,mg,no,lockout_minutes,5,6,15,30',
  'hydromorphone,0.2,mg,no,basal_rate_per_hour,,,0.2,0.4',
  'hydromorphone,0.2,mg,no,one_hour_limit,,,2,3',
  'hydromorphone,0.2,mg,no,four_hour_limit,,,6,8',
  'hydromorphone,0.2,mg,no,clinician_bolus_dose,,,0.4,0.8',
  'fentanyl,10,mcg,no,loading_dose,,,50,100',
  'fentanyl,10,mcg,no,demand_dose,2,5,20,30',
  'fentanyl,10,mcg,no,lockout_minutes,4,5,10,20',
  'fentanyl,10,mcg,no,basal_rate_per_hour,,,20,50',
  'fentanyl,10,mcg,no,one_hour_limit,,,100,150',
  'fentanyl,10,mcg,no,four_hour_limit,,,300,400',
  'fentanyl,10,mcg,no,clinician_bolus_dose,,,25,50',
];
const csv = (rows: string[]) => `${[HEADER, ...rows].join('\n')}\n`;
// Row 3 of the spreadsheet (the header is row 1) names a drug Lockstep does not know.
const BAD_ROWS = ROWS.map((row, index) => (index === 1 ? row.replace('morphine', 'morfine') : row));

/** The rows of one rule (drug + concentration) in a rules table. */
/** A rule's rows, by its heading (a paediatric rule's heading goes on to say who it is for). */
function ruleRows(table: Locator, rule: string): Locator {
  const heading = new RegExp(`^${rule.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}( Paediatric, .*)?$`);
  return table.locator('tbody').filter({ has: table.page().getByRole('rowheader', { name: heading }) });
}

async function openLibrary(page: Page): Promise<void> {
  await page.getByRole('navigation').getByRole('link', { name: 'Library' }).click();
  await page.getByRole('heading', { name: 'Dose-limit library', level: 1 }).waitFor();
}

async function chooseWard(page: Page, name: string): Promise<void> {
  await page.getByRole('combobox', { name: 'Ward' }).click();
  await page.getByRole('option', { name }).click();
}

/** The author withdraws the open pending version to draft and submits it again, unchanged. */
async function resubmit(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Withdraw to draft' }).click();
  await page.getByRole('button', { name: 'Submit for approval' }).click();
  const dialog = await readyDialog(page, /^Submit version \d+ for approval$/);
  await dialog.getByRole('button', { name: 'Submit for approval' }).click();
  await dialog.waitFor({ state: 'detached' });
  await page
    .getByRole('table', { name: 'Library versions' })
    .getByRole('row', { name: /Awaiting approval Lin Park/ })
    .waitFor();
}

describe('dose-limit library: import a CSV, submit, and a second pharmacist approves', () => {
  let server: RunningServer;
  let lin: BrowserSession;
  let tomas: BrowserSession | undefined;
  let files: string;
  let badFile: string;
  let goodFile: string;

  beforeAll(async () => {
    files = mkdtempSync(path.join(tmpdir(), 'lockstep-library-csv-'));
    badFile = path.join(files, 'cedar-limits-draft.csv');
    goodFile = path.join(files, 'cedar-limits.csv');
    writeFileSync(badFile, csv(BAD_ROWS));
    writeFileSync(goodFile, csv(ROWS));
    server = await startServer();
    lin = await openBrowser(server.baseUrl);
    await signInHome(lin.page, 'lin.park');
  });
  afterAll(async () => {
    await tomas?.close();
    await lin?.close();
    await server?.stop();
    rmSync(files, { recursive: true, force: true });
  });

  it('shows the first ward’s active rules with tall-man names and safe doses', async () => {
    const { page } = lin;
    await openLibrary(page);
    // Wards are listed by name: Cedar comes first.
    expect(await page.getByRole('combobox', { name: 'Ward' }).inputValue()).toBe('Cedar');
    await page.getByRole('heading', { name: 'Cedar library, version 1' }).waitFor();
    const rules = page.getByRole('table', { name: 'Limit rules' });
    await rules.getByRole('rowheader', { name: 'HYDROmorphone 0.2 mg/mL' }).waitFor();
    await rules.getByRole('rowheader', { name: 'fentaNYL 10 mcg/mL' }).waitFor();
    const demand = ruleRows(rules, 'morphine 1 mg/mL').getByRole('row', { name: /^Demand dose/ });
    expect((await demand.getByRole('cell').allInnerTexts()).map((text) => text.trim())).toEqual(['0.2 mg', '0.5 mg', '2 mg', '3 mg']);
    // The header names the approver and when: "Tomas Ortiz, 3 Mar 2026, 09:00".
    await page.getByText(/^Tomas Ortiz, \d{1,2} \w{3} \d{4}, \d{2}:\d{2}$/).waitFor();
    await snapshot(page, 'library-cedar-active');
  });

  it('shows the changes of Harbour’s pending version, and lin.park may not approve her own', async () => {
    const { page } = lin;
    await chooseWard(page, 'Harbour');
    await page.getByRole('heading', { name: 'Harbour library, version 1' }).waitFor();
    await page
      .getByRole('table', { name: 'Library versions' })
      .getByRole('row', { name: /Version 2/ })
      .click();
    await page.getByRole('heading', { name: 'Harbour library, version 2' }).waitFor();
    const changes = page.getByRole('table', { name: 'Changed limits' });
    await changes.getByRole('row', { name: /morphine 1 mg\/mL Demand dose, soft max 2 mg to 1.5 mg Lowered/ }).waitFor();
    expect(await page.getByRole('button', { name: 'Approve' }).isDisabled()).toBe(true);
    // Whoever created, imported, edited or submitted it may not approve it, and is told what they did.
    await page
      .getByText(/^You (created|imported)[a-z ,]* and submitted this version; a pharmacist who did not approves it or sends it back$/)
      .waitFor();
    await snapshot(page, 'library-harbour-pending-changes');
  });

  it('says plainly why no new draft can start while Harbour has a version awaiting approval', async () => {
    const { page } = lin;
    await page.getByRole('button', { name: 'New draft' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'No new draft was started' });
    await alert.getByText('This ward already has version 2 (awaiting approval); finish or discard it before starting another').waitFor();
    expect(await page.getByRole('table', { name: 'Library versions' }).locator('tbody tr').count()).toBe(2);
  });

  it('marks Wren’s weight-based rules per kg, with per-kg units', async () => {
    const { page } = lin;
    await chooseWard(page, 'Wren');
    await page.getByRole('heading', { name: 'Wren library, version 1' }).waitFor();
    const rules = page.getByRole('table', { name: 'Limit rules' });
    const morphine = ruleRows(rules, 'morphine 1 mg/mL per kg');
    await morphine.getByText('per kg', { exact: true }).waitFor();
    // Chosen by the patient, not only the ward: Wren's rule says who it is for.
    await morphine.getByText(/^Paediatric, /).waitFor();
    await morphine
      .getByRole('row', { name: /^Demand dose/ })
      .getByRole('cell', { name: '0.02 mg/kg' })
      .waitFor();
    await morphine
      .getByRole('row', { name: /^Basal rate/ })
      .getByRole('cell', { name: '0.004 mg/kg/h' })
      .waitFor();
    await morphine
      .getByRole('row', { name: /^Lockout/ })
      .getByRole('cell', { name: '10 min' })
      .waitFor();
    await snapshot(page, 'library-wren-per-kg');
  });

  it('keeps the chosen ward across a reload', async () => {
    const { page } = lin;
    await chooseWard(page, 'Cedar');
    await expect.poll(() => new URL(page.url()).searchParams.get('ward')).toBe('2');
    await page.reload();
    await page.getByRole('heading', { name: 'Cedar library, version 1' }).waitFor();
    expect(await page.getByRole('combobox', { name: 'Ward' }).inputValue()).toBe('Cedar');
  });

  it('refuses a file with a bad row, naming its row and column, and imports nothing', async () => {
    const { page } = lin;
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = await readyDialog(page, 'Import dose limits from CSV');
    expect(await dialog.getByRole('combobox', { name: 'Ward' }).inputValue()).toBe('Cedar');
    await dialog.getByLabel('Note').fill('Lower the morphine demand soft maximum to 1.8 mg (demo)');
    await dialog.getByLabel('CSV file to import').setInputFiles(badFile);

    const problems = dialog.getByRole('table', { name: 'Problems in the file' });
    const problem = problems.getByRole('row', { name: /^3 drug Unknown drug morfine/ });
    await problem.waitFor();
    expect(await problems.getByRole('row').count()).toBe(2); // the header and the one problem
    await dialog.getByText('The file has 1 problem in 1 row; nothing was imported').waitFor();
    expect(await dialog.getByRole('button', { name: 'Create draft from this file' }).isDisabled()).toBe(true);
    await snapshot(page, 'library-import-problems');

    // Nothing written: Cedar still has its one version.
    const versions = page.getByRole('table', { name: 'Library versions' });
    expect(await versions.locator('tbody tr').count()).toBe(1);
  });

  it('previews the corrected file and creates a draft from it', async () => {
    const { page } = lin;
    const dialog = page.getByRole('dialog', { name: 'Import dose limits from CSV' });
    await dialog.getByLabel('CSV file to import').setInputFiles(goodFile);
    await dialog.getByText('cedar-limits.csv is ready to import').waitFor();
    const changes = dialog.getByRole('table', { name: 'Changed limits' });
    await changes.getByRole('row', { name: /morphine 1 mg\/mL Demand dose, soft max 2 mg to 1.8 mg Lowered/ }).waitFor();
    expect(await changes.locator('tbody tr').count()).toBe(1);
    await snapshot(page, 'library-import-preview');

    await dialog.getByRole('button', { name: 'Create draft from this file' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('heading', { name: 'Cedar library, version 2' }).waitFor();
    await page.getByText('Lower the morphine demand soft maximum to 1.8 mg (demo)').first().waitFor();
    const rules = page.getByRole('table', { name: 'Limit rules' });
    const demand = ruleRows(rules, 'morphine 1 mg/mL').getByRole('row', { name: /^Demand dose/ });
    expect((await demand.getByRole('cell').allInnerTexts()).map((text) => text.trim())).toEqual(['0.2 mg', '0.5 mg', '1.8 mg', '3 mg']);
    await expect.poll(() => new URL(page.url()).searchParams.get('version')).not.toBeNull();
  });

  it('checks limit order in the rules editor before saving', async () => {
    const { page } = lin;
    await page.getByRole('button', { name: 'Edit rules' }).click();
    const drawer = await readyDialog(page, /Edit rules: Cedar version 2/);
    // Rules are in drug-name order: fentaNYL, HYDROmorphone, morphine.
    const morphine = drawer.getByRole('group', { name: 'Rule 3: morphine 1 mg/mL' });
    await morphine.getByLabel('Demand dose hard max').fill('1');
    await drawer.getByRole('button', { name: 'Save rules' }).click();
    await morphine.getByText('Demand dose: the hard maximum (1) is below the soft maximum (1.8)').waitFor();
    await snapshot(page, 'library-editor-error');
    await drawer.getByRole('button', { name: 'Cancel' }).click();
    await drawer.waitFor({ state: 'detached' });
  });

  it('submits the draft; Approve is not available to its author', async () => {
    const { page } = lin;
    await page.getByRole('button', { name: 'Submit for approval' }).click();
    const dialog = page.getByRole('dialog', { name: 'Submit version 2 for approval' });
    await dialog.getByRole('button', { name: 'Submit for approval' }).click();
    await dialog.waitFor({ state: 'detached' });
    const versions = page.getByRole('table', { name: 'Library versions' });
    await versions.getByRole('row', { name: /Version 2 Awaiting approval Lin Park/ }).waitFor();
    expect(await page.getByRole('button', { name: 'Approve' }).isDisabled()).toBe(true);
    // Whoever created, imported, edited or submitted it may not approve it, and is told what they did.
    await page
      .getByText(/^You (created|imported)[a-z ,]* and submitted this version; a pharmacist who did not approves it or sends it back$/)
      .waitFor();
    await snapshot(page, 'library-cedar-submitted');
  });

  it('tomas.ortiz approves Cedar’s pending version with his password', async () => {
    tomas = await openBrowser(server.baseUrl);
    const { page } = tomas;
    await signInHome(page, 'tomas.ortiz');
    await openLibrary(page);
    await chooseWard(page, 'Cedar');
    await page
      .getByRole('table', { name: 'Library versions' })
      .getByRole('row', { name: /Version 2 Awaiting approval/ })
      .click();
    await page
      .getByRole('table', { name: 'Changed limits' })
      .getByRole('row', { name: /soft max 2 mg to 1.8 mg/ })
      .waitFor();

    await page.getByRole('button', { name: 'Approve' }).click();
    const dialog = await readyDialog(page, 'Approve version 2');
    await dialog.getByLabel('Your password').fill('not-my-password');
    await dialog.getByRole('button', { name: 'Sign and approve' }).click();
    await dialog.getByText('The password you signed with is not correct').waitFor();
    await snapshot(page, 'library-approve-wrong-password');

    // Meanwhile lin.park takes the version back and submits it again: Tomas's signature is for
    // the submission he reviewed, so it is refused and the page shows the version as it is now.
    await resubmit(lin.page);
    await dialog.getByLabel('Your password').fill('lockstep-demo');
    await dialog.getByRole('button', { name: 'Sign and approve' }).click();
    await dialog
      .getByRole('alert')
      .getByText(/withdrawn and submitted again after you opened it: review its changes again/)
      .waitFor();
    await snapshot(page, 'library-approve-resubmitted');
    expect(await dialog.getByLabel('Your password').count()).toBe(0);
    await dialog.getByRole('button', { name: 'Close and review the changes' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page
      .getByRole('table', { name: 'Changed limits' })
      .getByRole('row', { name: /soft max 2 mg to 1.8 mg/ })
      .waitFor();

    await page.getByRole('button', { name: 'Approve' }).click();
    const again = await readyDialog(page, 'Approve version 2');
    await again.getByLabel('Your password').fill('lockstep-demo');
    await again.getByRole('button', { name: 'Sign and approve' }).click();
    await again.waitFor({ state: 'detached' });
    const versions = page.getByRole('table', { name: 'Library versions' });
    await versions.getByRole('row', { name: /Version 2 Active Lin Park .* Tomas Ortiz/ }).waitFor();
    await versions.getByRole('row', { name: /Version 1 Retired/ }).waitFor();
  });

  it('Cedar’s active rules now carry the new limit', async () => {
    const { page } = tomas!;
    await page.goto('/library?ward=2');
    await page.getByRole('heading', { name: 'Cedar library, version 2' }).waitFor();
    const rules = page.getByRole('table', { name: 'Limit rules' });
    const demand = ruleRows(rules, 'morphine 1 mg/mL').getByRole('row', { name: /^Demand dose/ });
    await demand.getByRole('cell', { name: '1.8 mg' }).waitFor();
    await page.getByText('Tomas Ortiz', { exact: false }).first().waitFor();
    await snapshot(page, 'library-cedar-active-v2');
  });
});
