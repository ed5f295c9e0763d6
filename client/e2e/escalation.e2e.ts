import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signInHome, snapshot as saveSnapshot, type BrowserSession } from './support/browser.js';
import { apiToken, callApi } from './support/api.js';
import { startServer, type RunningServer } from './support/server.js';

// A deteriorating patient on the demo's Harbour ward, recorded by the ward's nurse (kai.mendes,
// Harbour and Summit) through the form. WHITLOCK, Ezra (Harbour bed H03, born 1975: an adult) has
// morphine 1 mg/mL running for a day and more, demand 1 mg, lockout 10 min, no basal, observed on
// the ward's usual schedule with no open flags (server/src/database/seed/demo-pcas.ts). Everything the screens
// must show is stated here from the published rules, then read back from the API only to find the
// clock time the browser prints.
const HARBOUR = 1;
const WHITLOCK = 'WHITLOCK, Ezra';

type Due = { dueAt: string; overdueMinutes: number; severity: 'review' | 'urgent' | null };
type ListEntry = {
  id: number;
  patientName: string;
  wardId: number;
  status: string;
  nextObservation: Due | null;
  openUrgentFlags: number;
};
type Release = { id: number; status: string };
type OrderDetail = { id: number; status: string; releases: Release[]; nextObservation: Due | null };
type Observation = {
  at: string;
  releaseId: number;
  attempts: number;
  delivered: number;
  volumeInfusedMl: number;
  syringeRemainingMl: number;
  news2: { total: number; response: string } | null;
};

// The deteriorating set. NEWS2 (Royal College of Physicians, National Early Warning Score (NEWS) 2,
// 2017), scale 1, each parameter's band: respiration 7/min (≤ 8) 3; SpO2 88 % (≤ 91) 3; air 0;
// systolic 95 mmHg (91–100) 2; pulse 118/min (111–130) 2; consciousness V (new confusion, voice,
// pain or unresponsive) 3; temperature 38.4 °C (38.1–39.0) 1. Aggregate 14: 7 or more is the
// emergency response.
const NEWS2_TOTAL = 14;
const NEWS2_BREAKDOWN = 'Resp. 3, SpO2 3, Air/O2 0, BP 2, Pulse 2, ACVPU 3, Temp. 1';
// The urgent flags this set must raise: sedation 3 on the Pasero scale; RR ≤ 8 and SpO2 ≤ 91 % on air
// by NEWS2's bands (Harbour's policy keeps the shipped 92 %: urgent at 91 % or below); and NEWS2 ≥ 7.
const URGENT_FLAGS = [
  'Sedation level 3',
  'Respiratory rate 7/min, at or below 8/min',
  'SpO2 88 %, at or below 91 %',
  `NEWS2 ${NEWS2_TOTAL}`,
];
// After an urgent flag the ward's schedule tightens the next observation to 15 minutes (not the hourly one).
const TIGHTENED_MINUTES = 15;

/** From the top of the page, so the full-page picture keeps the top bar in its place. */
async function snapshot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveSnapshot(page, name);
}

/** A time as the browser prints it ("14:05", 24-hour clock, the browser's time zone), as the screens do. */
function clockInBrowser(page: Page, iso: string): Promise<string> {
  return page.evaluate(
    (at) => new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(at)),
    iso,
  );
}

const tableRows = (page: Page, name: string) => page.getByRole('table', { name }).locator('tbody tr');
const rowOf = (page: Page, table: string, patient: string): Locator => tableRows(page, table).filter({ hasText: patient });

describe('escalation: a nurse records a deteriorating set and it shows on every screen', () => {
  let server: RunningServer;
  let kai: BrowserSession;
  let mei: BrowserSession | undefined;
  let kaiToken: string;
  let orderId: number;
  let previous: Observation;
  /** When the next observation is due after the deteriorating set, as the API answers it. */
  let dueAt: string;

  beforeAll(async () => {
    server = await startServer();
    kaiToken = await apiToken(server.baseUrl, 'kai.mendes');
    const running = await callApi<ListEntry[]>(server.baseUrl, kaiToken, 'GET', '/orders?status=active');
    const entry = running.find((candidate) => candidate.patientName === WHITLOCK);
    if (!entry) throw new Error(`The demo has no running PCA for ${WHITLOCK}`);
    expect(entry.openUrgentFlags).toBe(0);
    orderId = entry.id;
    // The pump's totals so far on the syringe in use: the new reading carries on from them.
    const order = await callApi<OrderDetail>(server.baseUrl, kaiToken, 'GET', `/orders/${orderId}`);
    const syringe = order.releases.find((release) => release.status === 'in_use');
    if (!syringe) throw new Error(`${WHITLOCK}'s PCA has no syringe in use`);
    const observations = await callApi<Observation[]>(server.baseUrl, kaiToken, 'GET', `/orders/${orderId}/observations`);
    const onSyringe = observations.filter((observation) => observation.releaseId === syringe.id);
    previous = onSyringe.sort((a, b) => Date.parse(b.at) - Date.parse(a.at))[0]!;
    // Calm and past its first day, the ward's usual interval (2 hours by Harbour's shipped policy): the
    // tightened time below is the urgent flag's doing, not a start's.
    const calmDue = order.nextObservation!;
    expect(Date.parse(calmDue.dueAt) - Date.parse(previous.at)).toBe(120 * 60_000);

    kai = await openBrowser(server.baseUrl);
    await signInHome(kai.page, 'kai.mendes');
  });
  afterAll(async () => {
    await mei?.close();
    await kai?.close();
    await server?.stop();
  });

  it('the nurse opens the running PCA from her list and records the set through the form', async () => {
    const { page } = kai;
    await rowOf(page, 'PCA orders', WHITLOCK)
      .getByRole('link', { name: `MORPHINE 1 mg/mL: open the PCA page for ${WHITLOCK}` })
      .click();
    await page.getByRole('heading', { name: `PCA: ${WHITLOCK}`, level: 1 }).waitFor();
    await page.getByText('No open flags.').waitFor();
    await page.getByRole('link', { name: 'Record observation' }).click();
    await page.getByRole('heading', { name: 'Record observation', level: 1 }).waitFor();

    await page.getByRole('radio', { name: /Frequently drowsy/ }).check();
    await page.getByLabel('Respiratory rate').fill('7');
    await page.getByLabel('SpO2').fill('88');
    await page.getByLabel('Oxygen (L/min)').fill('0'); // air
    await page.getByRole('combobox', { name: 'Consciousness' }).click();
    await page.getByRole('option', { name: 'Responds to voice' }).click();
    await page.getByLabel('Heart rate').fill('118');
    await page.getByLabel('Systolic BP').fill('95');
    await page.getByLabel('Temperature').fill('38.4');
    await page.getByLabel('Pain score').fill('4');
    // Four presses since the last reading, one given (the lockout refused the rest): 1 mg is 1 mL.
    await page.getByLabel('Attempts').fill(String(previous.attempts + 4));
    await page.getByLabel('Delivered').fill(String(previous.delivered + 1));
    await page.getByLabel('Volume infused').fill(String(previous.volumeInfusedMl + 1));
    await page.getByLabel('Syringe left').fill(String(previous.syringeRemainingMl - 1));
    // Said before saving: this set raises urgent flags.
    await page.getByText('Urgent: saving raises an urgent flag').first().waitFor();
    await snapshot(page, 'escalation-form');
    await page.getByRole('button', { name: 'Save observation' }).click();

    await page.getByRole('heading', { name: 'Observation saved' }).waitFor();
    for (const message of URGENT_FLAGS) await page.getByRole('alert', { name: `Urgent flag: ${message}` }).waitFor();
    const score = page.getByLabel('NEWS2');
    await score.getByText(`NEWS2 ${NEWS2_TOTAL}: emergency`).waitFor();
    await score.getByText(NEWS2_BREAKDOWN).waitFor();
    await score.getByText(/Royal College of Physicians/).waitFor();
    await page
      .getByRole('alert', { name: `Urgent flag: NEWS2 ${NEWS2_TOTAL}` })
      .getByText(/Emergency response/)
      .waitFor();
    await snapshot(page, 'escalation-saved');

    // The API agrees: scored 14 (high), and the next observation is 15 minutes after this one. The
    // schedule counts from the urgent flags' raising, stamped a few milliseconds after the reading.
    const observations = await callApi<Observation[]>(server.baseUrl, kaiToken, 'GET', `/orders/${orderId}/observations`);
    const saved = observations.sort((a, b) => Date.parse(b.at) - Date.parse(a.at))[0]!;
    expect(saved.news2).toMatchObject({ total: NEWS2_TOTAL, response: 'high' });
    const order = await callApi<OrderDetail>(server.baseUrl, kaiToken, 'GET', `/orders/${orderId}`);
    dueAt = order.nextObservation!.dueAt;
    const after = Date.parse(dueAt) - Date.parse(saved.at);
    expect(after).toBeGreaterThanOrEqual(TIGHTENED_MINUTES * 60_000);
    expect(after).toBeLessThan(TIGHTENED_MINUTES * 60_000 + 5_000);
  });

  it('the PCA page shows the urgent flags, the NEWS2 score with emergency wording and the next observation in 15 minutes', async () => {
    const { page } = kai;
    await page.getByRole('link', { name: 'Open the PCA page' }).click();
    await page.getByRole('heading', { name: `PCA: ${WHITLOCK}`, level: 1 }).waitFor();
    for (const message of URGENT_FLAGS) await page.getByRole('group', { name: `Urgent flag: ${message}` }).waitFor();
    await page
      .getByRole('group', { name: `Urgent flag: NEWS2 ${NEWS2_TOTAL}` })
      .getByText(/Emergency response: call the critical-care outreach or emergency team now/)
      .waitFor();

    const newest = page.getByRole('table', { name: 'Observations' }).locator('tbody tr').first();
    await newest.getByText(`NEWS2 ${NEWS2_TOTAL}: emergency`).waitFor();
    await newest.getByText(NEWS2_BREAKDOWN).waitFor();
    expect(await newest.innerText()).toMatch(
      /3: unacceptable[\s\S]*7\/min[\s\S]*88 %[\s\S]*Air, HR 118\/min, BP 95 systolic, 38\.4 °C, Responds to voice/,
    );

    const next = page.getByRole('region', { name: 'Next observation' });
    const clock = await clockInBrowser(page, dueAt);
    await expect.poll(() => page.getByTestId('next-observation').innerText()).toBe(`Due at ${clock}`);
    // Not the hourly "In 1 h": a quarter of an hour (a minute less if the clock turned meanwhile).
    expect(await next.innerText()).toMatch(/In 1[45] min/);
    await snapshot(page, 'escalation-pca-page');
  });

  it("the nurse's PCA list marks the patient urgent with the tightened due time", async () => {
    const { page } = kai;
    await page.getByRole('navigation').getByRole('link', { name: 'PCA orders' }).click();
    await page.getByRole('heading', { name: 'PCA orders', level: 1 }).waitFor();
    const clock = await clockInBrowser(page, dueAt);
    const row = rowOf(page, 'PCA orders', WHITLOCK);
    await row.getByText(`${URGENT_FLAGS.length} urgent flags open`).waitFor();
    await row.getByText(`Observation due at ${clock}`).waitFor();
    await snapshot(page, 'escalation-pca-list');
  });

  it('"Observations due" lists the running PCAs on her own wards soonest first, with the patient before every one due later', async () => {
    const { page } = kai;
    await page.getByRole('navigation').getByRole('link', { name: 'Observations due' }).click();
    await page.getByRole('heading', { name: 'Observations due', level: 1 }).waitFor();
    // The list opens on the nurse's own wards (kai.mendes: Harbour and Summit), not every ward's.
    const me = await callApi<{ wards: { id: number; name: string }[] }>(server.baseUrl, kaiToken, 'GET', '/auth/me');
    const ownWards = me.wards.map((ward) => ward.id);
    const running = await callApi<ListEntry[]>(server.baseUrl, kaiToken, 'GET', '/orders?status=active');
    const byDue = running
      .filter((entry) => entry.nextObservation !== null && ownWards.includes(entry.wardId))
      .sort((a, b) => Date.parse(a.nextObservation!.dueAt) - Date.parse(b.nextObservation!.dueAt));
    const rows = tableRows(page, 'PCA orders');
    await expect.poll(() => rows.count()).toBe(byDue.length);
    await page.getByText(`Harbour and Summit: ${byDue.length} PCAs, sorted by due time`).waitFor();
    const shown = await rows.locator('th[scope="row"]').allInnerTexts();
    // Ties (same due time) may sit either way round; every other pair is in due order.
    const dueOf = (name: string) => Date.parse(byDue.find((entry) => entry.patientName === name)!.nextObservation!.dueAt);
    for (let index = 1; index < shown.length; index++) expect(dueOf(shown[index - 1]!)).toBeLessThanOrEqual(dueOf(shown[index]!));
    // Only those due sooner (the demo's overdue ones) come before WHITLOCK; every PCA on its usual
    // interval, due later than the tightened quarter of an hour, comes after.
    const position = shown.indexOf(WHITLOCK);
    expect(position).toBeGreaterThanOrEqual(0);
    const dueSooner = shown.filter((name) => dueOf(name) < Date.parse(dueAt));
    expect(shown.slice(0, position)).toEqual(dueSooner);
    expect(shown.slice(position + 1).every((name) => dueOf(name) >= Date.parse(dueAt))).toBe(true);
    const row = rowOf(page, 'PCA orders', WHITLOCK);
    await row.getByText(`${URGENT_FLAGS.length} urgent flags open`).waitFor();
    await row.getByText(`Observation due at ${await clockInBrowser(page, dueAt)}`).waitFor();
    await snapshot(page, 'escalation-observations-due');
  });

  it('the board shows the urgent flags and the 15-minute due time, and the name opens the PCA page', async () => {
    mei = await openBrowser(server.baseUrl);
    const { page } = mei;
    await signInHome(page, 'mei.tan');
    await page.goto(`/handover?ward=${HARBOUR}`);
    await page.getByRole('heading', { name: 'Handover', level: 1 }).waitFor();
    const row = rowOf(page, 'Handover board', WHITLOCK);
    await row.waitFor();
    const clock = await clockInBrowser(page, dueAt);
    // Bed cell: the row's risk; open flags: the urgent count; next observation: the tightened time.
    await expect.poll(() => row.innerText()).toMatch(/^H03\s+Urgent/);
    await expect.poll(() => row.innerText()).toContain(`Due ${clock}`);
    await expect.poll(() => row.innerText()).toMatch(new RegExp(`Urgent\\s*${URGENT_FLAGS.length}`));
    expect(await row.innerText()).toMatch(/Sedation 3[\s\S]*RR 7 · SpO2 88 %/);
    await snapshot(page, 'escalation-board');

    await row.getByRole('link', { name: `${WHITLOCK}: open the PCA page` }).click();
    await page.getByRole('heading', { name: `PCA: ${WHITLOCK}`, level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/pca/${orderId}`);
    await page.getByRole('group', { name: 'Urgent flag: Sedation level 3' }).waitFor();
  });
});
