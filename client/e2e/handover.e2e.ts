import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, saveArtifact, signInHome, snapshot, type BrowserSession } from './support/browser.js';
import { apiToken, callApi } from './support/api.js';
import { DEMO_PASSWORD } from '../../server/test/support/demo-accounts.js';
import { FALEOLO, startFaleoloPca } from './support/demo-pca.js';
import { startServer, type RunningServer } from './support/server.js';

// The demo's Harbour ward mid-shift: six running PCAs (VALDIVIA, H05, with an urgent flag), NOAH
// ACHTERBERG (H02) awaiting verification, and TAVITA FALEOLO (H07) with a verified HYDROmorphone
// order and a ready syringe (support/demo-pca.ts). Counts are read from the API's own answer.
const HARBOUR = 1;
// Sedation 3 on the Pasero scale: an urgent flag.
const URGENT_OBSERVATION = {
  painScore: 4,
  sedationLevel: '3',
  respiratoryRate: 12,
  spo2: 95,
  oxygenLitresPerMinute: 0, // air
  // One dose (1 mL at 0.2 mg/mL): recorded moments after the start, when the lockout allows only one.
  attempts: 6,
  delivered: 1,
  volumeInfusedMl: 1,
  syringeRemainingMl: 49,
};

type BoardAnswer = {
  rows: {
    orderId: number;
    status: string;
    patient: { name: string };
    flags: { urgent: number; review: number; info: number };
    signoffs: { role: string }[];
  }[];
};

const flaggedCount = (answer: BoardAnswer) => answer.rows.filter((row) => row.flags.urgent + row.flags.review + row.flags.info > 0).length;
/** "3 of 7 PCAs confirmed": running PCAs confirmed by both nurses this shift. */
function confirmedText(answer: BoardAnswer): string {
  const running = answer.rows.filter((row) => row.status === 'active');
  const confirmed = running.filter(
    (row) => row.signoffs.some((s) => s.role === 'outgoing') && row.signoffs.some((s) => s.role === 'incoming'),
  );
  return `${confirmed.length} of ${running.length} PCAs confirmed`;
}

/** The incoming nurse's reading of FALEOLO's pump, typed into the sign-off dialog; only the demand dose varies. */
async function enterPump(page: Page, dialog: Locator, demandDose: string): Promise<void> {
  await dialog.getByRole('combobox', { name: 'Drug' }).click();
  await page.getByRole('option', { name: 'HYDROmorphone' }).click();
  await dialog.getByLabel('Concentration').fill('0.2');
  await dialog.getByLabel('Syringe volume').fill('50');
  await dialog.getByLabel('Demand dose').fill(demandDose);
  await dialog.getByLabel('Lockout').fill('10');
  await dialog.getByLabel('Basal rate').fill('0.1');
  await dialog.getByLabel('4-hour limit').fill('6');
}

const board = (page: Page) => page.getByRole('table', { name: 'Handover board' });
const bodyRows = (page: Page) => board(page).locator('tbody tr');
const rowOf = (page: Page, name: string) => bodyRows(page).filter({ hasText: name });

async function openHarbourBoard(page: Page): Promise<void> {
  await page.goto(`/handover?ward=${HARBOUR}`);
  await page.getByRole('heading', { name: 'Handover', level: 1 }).waitFor();
  await board(page).waitFor();
}

describe('handover board', () => {
  let server: RunningServer;
  let mei: BrowserSession;
  let nurse: BrowserSession | undefined;
  let kaiToken: string;
  let faleoloOrderId: number;

  beforeAll(async () => {
    server = await startServer();
    mei = await openBrowser(server.baseUrl);
    await signInHome(mei.page, 'mei.tan');
    kaiToken = await apiToken(server.baseUrl, 'kai.mendes');
  });
  afterAll(async () => {
    await nurse?.close();
    await mei?.close();
    await server?.stop();
  });

  it("opens from the navigation and lists Harbour's PCAs in the server's risk order", async () => {
    const { page } = mei;
    await page.getByRole('navigation').getByRole('link', { name: 'Handover' }).click();
    await page.getByRole('heading', { name: 'Handover', level: 1 }).waitFor();
    await page.getByRole('combobox', { name: 'Ward' }).click();
    await page.getByRole('option', { name: 'Harbour' }).click();
    await page
      .getByTestId('board-shift')
      .filter({ hasText: /^Harbour · (Day|Night) shift, / })
      .waitFor();

    const answer = await callApi<BoardAnswer>(server.baseUrl, kaiToken, 'GET', `/wards/${HARBOUR}/handover`);
    const names = answer.rows.map((row) => row.patient.name);
    expect(names).toEqual(expect.arrayContaining(['VALDIVIA, Ines', 'ACHTERBERG, Noah', 'FALEOLO, Tavita']));
    expect(names[0]).toBe('VALDIVIA, Ines');
    await expect.poll(() => bodyRows(page).count()).toBe(names.length);
    for (const [index, name] of names.entries()) expect(await bodyRows(page).nth(index).innerText()).toContain(name);
    faleoloOrderId = answer.rows.find((row) => row.patient.name === FALEOLO.name)!.orderId;

    expect(await rowOf(page, 'ACHTERBERG').innerText()).toMatch(/Awaiting verification\s+since \d\d:\d\d/);
    expect(await rowOf(page, 'FALEOLO').innerText()).toContain('Awaiting bedside check');
    expect(await rowOf(page, 'FALEOLO').innerText()).toContain('HYDROmorphone 0.2 mg/mL');
    expect(await rowOf(page, 'FALEOLO').innerText()).toContain('demand 0.2 mg · lockout 10 min · basal 0.1 mg/h · 4-hour limit 6 mg');
    await page.getByRole('status').filter({ hasText: 'Connected' }).waitFor();
    await page
      .getByTestId('board-updated')
      .filter({ hasText: /^Updated \d\d:\d\d:\d\d$/ })
      .waitFor();
    await snapshot(page, 'handover-board');
  });

  it('shows an urgent observation recorded elsewhere within 2 seconds, without a reload', async () => {
    const { page } = mei;
    // A mark on the window: a page reload would wipe it.
    await page.evaluate(() => Object.assign(window, { handoverMark: 'kept' }));

    await startFaleoloPca(server.baseUrl, kaiToken, faleoloOrderId);
    await expect.poll(() => rowOf(page, 'FALEOLO').innerText(), { timeout: 2500 }).toContain('Outgoing: not signed');

    await callApi(server.baseUrl, kaiToken, 'POST', `/orders/${faleoloOrderId}/observations`, URGENT_OBSERVATION);
    const saved = Date.now();
    // Up among the urgent rows, after VALDIVIA in bed H05.
    await expect
      .poll(() => bodyRows(page).nth(1).innerText(), { timeout: 2500, interval: 25 })
      .toMatch(/^H07\s+Urgent[\s\S]*FALEOLO, Tavita[\s\S]*Sedation 3[\s\S]*Urgent 1/);
    const elapsed = Date.now() - saved;
    console.log(`Handover board showed the urgent flag ${elapsed} ms after the observation was saved`);
    expect(elapsed).toBeLessThan(2000);
    expect(await page.evaluate(() => (window as unknown as { handoverMark?: string }).handoverMark)).toBe('kept');
    await snapshot(page, 'handover-urgent');

    // Mantine's chip is a visually hidden checkbox: the label is what a person clicks.
    const onlyFlagged = page.getByRole('checkbox', { name: 'Only flagged' });
    const answer = await callApi<BoardAnswer>(server.baseUrl, kaiToken, 'GET', `/wards/${HARBOUR}/handover`);
    const flagged = flaggedCount(answer);
    expect(flagged).toBeLessThan(answer.rows.length);
    await page.locator('label', { hasText: /^Only flagged$/ }).click();
    expect(await onlyFlagged.isChecked()).toBe(true);
    await expect.poll(() => bodyRows(page).count()).toBe(flagged);
    expect(await page.getByText(`Showing ${flagged} of ${answer.rows.length} PCAs`).count()).toBe(1);
    await page.locator('label', { hasText: /^Only flagged$/ }).click();
    await expect.poll(() => bodyRows(page).count()).toBe(answer.rows.length);
  });

  it('takes the outgoing and incoming sign-offs (a pharmacist only reads), and the charge nurse sees both', async () => {
    nurse = await openBrowser(server.baseUrl);
    const { page } = nurse;
    // A pharmacist may read the board (no link in the navigation), but signs nothing.
    await signInHome(page, 'lin.park');
    expect(await page.getByRole('link', { name: 'Handover' }).count()).toBe(0);
    await openHarbourBoard(page);
    await rowOf(page, 'FALEOLO').getByText('Outgoing: not signed').waitFor();
    expect(await page.getByRole('button', { name: /^Sign off/ }).count()).toBe(0);
    await page.getByRole('button', { name: 'Sign out' }).click();

    await signInHome(page, 'kai.mendes');
    await openHarbourBoard(page);

    // FALEOLO's sedation 3 flag is open: the dialog says so and Sign stays disabled until it is acknowledged.
    await page.getByRole('button', { name: /^Sign off \(outgoing\): FALEOLO, Tavita/ }).click();
    const outgoing = page.getByRole('dialog', { name: 'Sign off (outgoing): FALEOLO, Tavita' });
    await outgoing
      .getByRole('alert')
      .filter({ hasText: /Cannot be confirmed yet[\s\S]*Acknowledge the open urgent flag/ })
      .waitFor();
    const signOutgoing = outgoing.getByRole('button', { name: 'Sign as outgoing nurse' });
    expect(await signOutgoing.isDisabled()).toBe(true);
    await snapshot(page, 'handover-urgent-flag-blocks');
    const flagged = await callApi<{ rows: { orderId: number; flags: { open: { id: number; severity: string }[] } }[] }>(
      server.baseUrl,
      kaiToken,
      'GET',
      `/wards/${HARBOUR}/handover`,
    );
    for (const flag of flagged.rows.find((row) => row.orderId === faleoloOrderId)!.flags.open.filter((f) => f.severity === 'urgent'))
      await callApi(server.baseUrl, kaiToken, 'POST', `/flags/${flag.id}/acknowledge`, { note: 'Prescriber reviewed, dose reduced' });
    await expect.poll(() => signOutgoing.isDisabled(), { timeout: 2500 }).toBe(false);
    await outgoing.getByLabel('Your password').fill(DEMO_PASSWORD);
    await signOutgoing.click();
    await outgoing.waitFor({ state: 'detached' });
    await expect.poll(() => rowOf(mei.page, 'FALEOLO').innerText(), { timeout: 2500 }).toContain('Outgoing ✓ Kai Mendes');

    // The same nurse cannot also take the PCA over: the server's refusal shows in the dialog.
    await page.getByRole('button', { name: /^Sign off \(incoming\): FALEOLO, Tavita/ }).click();
    const sameNurse = page.getByRole('dialog', { name: 'Sign off (incoming): FALEOLO, Tavita' });
    await enterPump(page, sameNurse, '0.2');
    await sameNurse.getByLabel('Your password').fill(DEMO_PASSWORD);
    await sameNurse.getByRole('button', { name: 'Sign as incoming nurse' }).click();
    await sameNurse.getByRole('alert').filter({ hasText: 'two different people' }).waitFor();
    await sameNurse.getByRole('button', { name: 'Back' }).click();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await signInHome(page, 'rosa.adeyemi');
    await openHarbourBoard(page);
    await page.getByRole('button', { name: /^Sign off \(incoming\): FALEOLO, Tavita/ }).click();
    const incoming = page.getByRole('dialog', { name: 'Sign off (incoming): FALEOLO, Tavita' });
    // Blind: the order's regimen is not shown to the incoming nurse, and every reading starts empty.
    await incoming.getByLabel('Demand dose').waitFor();
    expect(await incoming.getByRole('table', { name: "The order's regimen" }).count()).toBe(0);
    expect(await incoming.getByLabel('Demand dose').inputValue()).toBe('');
    await incoming.getByRole('button', { name: 'Sign as incoming nurse' }).click();
    await incoming.getByText('Enter the demand dose').waitFor();
    await incoming.getByText('Enter your password to sign').waitFor();

    // The pump reads a demand dose of 0.3 mg where the order says 0.2 mg: refused, named beside the field.
    await enterPump(page, incoming, '0.3');
    await incoming.getByLabel('Your password').fill(DEMO_PASSWORD);
    await incoming.getByRole('button', { name: 'Sign as incoming nurse' }).click();
    await incoming.getByText(/^Demand dose differs from the running order/).waitFor();
    await incoming
      .getByRole('alert')
      .filter({ hasText: /Not signed[\s\S]*differ from the running order/ })
      .waitFor();
    expect(await incoming.getByText(/^Lockout differs/).count()).toBe(0);
    await snapshot(page, 'handover-incoming-mismatch');
    expect(await rowOf(mei.page, 'FALEOLO').innerText()).toContain('Incoming: not signed');

    await incoming.getByLabel('Demand dose').fill('0.2');
    await incoming.getByRole('button', { name: 'Sign as incoming nurse' }).click();
    await incoming.waitFor({ state: 'detached' });

    await expect.poll(() => rowOf(mei.page, 'FALEOLO').innerText(), { timeout: 2500 }).toContain('Incoming ✓ Rosa Adeyemi (pump checked)');
    expect(await rowOf(mei.page, 'FALEOLO').innerText()).toContain('Outgoing ✓ Kai Mendes');
    const answer = await callApi<BoardAnswer>(server.baseUrl, kaiToken, 'GET', `/wards/${HARBOUR}/handover`);
    await mei.page
      .getByTestId('signoff-progress')
      .filter({ hasText: confirmedText(answer) })
      .waitFor();
    await snapshot(mei.page, 'handover-signed');
  });

  it('prints a handover sheet: A4 landscape, who printed it, every PCA, the caution', async () => {
    const { page } = mei;
    await page.getByRole('link', { name: 'Print handover sheet' }).click();
    await page.waitForURL(`**/handover/print?ward=${HARBOUR}`);
    await page.getByRole('heading', { name: 'Handover sheet: Harbour', level: 1 }).waitFor();
    await page
      .getByTestId('sheet-meta')
      .filter({ hasText: /(Day|Night) shift, .* · Printed .* by Mei Tan · / })
      .waitFor();
    const sheet = page.getByRole('table', { name: 'Handover sheet' });
    const answer = await callApi<BoardAnswer>(server.baseUrl, kaiToken, 'GET', `/wards/${HARBOUR}/handover`);
    expect(await sheet.locator('tbody tr').count()).toBe(answer.rows.length);
    // FALEOLO's urgent flag was acknowledged before the sign-off, so VALDIVIA's is the sheet's only urgent row at the top.
    expect(await sheet.locator('tbody tr').nth(0).innerText()).toMatch(/^H05\s+Urgent[\s\S]*VALDIVIA, Ines/);
    expect(await sheet.locator('tbody tr').filter({ hasText: 'FALEOLO, Tavita' }).innerText()).toMatch(
      /^H07[\s\S]*Incoming ✓ Rosa Adeyemi/,
    );
    await sheet.getByText(/^Decision support only:/).waitFor();

    // Roughly the printable area of A4 landscape with 10 mm margins, at 96 px to the inch.
    await page.setViewportSize({ width: 1047, height: 720 });
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Main navigation' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await snapshot(page, 'handover-print');
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    saveArtifact('handover-sheet.pdf', pdf);
    const pages = [...pdf.toString('latin1').matchAll(/\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map((box) => [
      Math.round(Number(box[1])),
      Math.round(Number(box[2])),
    ]);
    // Every page A4 landscape (297 × 210 mm = 841.9 × 595.3 pt); a ward of eight PCAs takes two.
    expect(pages.length).toBeGreaterThanOrEqual(1);
    expect(pages.length).toBeLessThanOrEqual(Math.ceil(answer.rows.length / 4));
    for (const size of pages) expect(size).toEqual([842, 595]);
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.emulateMedia({ media: 'screen' });
  });
});
