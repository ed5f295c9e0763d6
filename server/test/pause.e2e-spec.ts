import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../src/database/seed/demo-staff.js';
import { monitoringEvents } from '../src/observations/next-observation.js';
import { waitForMail } from './support/mailbox.js';
import { CALM_OBSERVATION, ORDER, ROSA, SETTINGS } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

describe('naloxone, pausing and resuming a PCA', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai' | 'mei' | 'sam', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });
  const start = async () =>
    activeOrder(t.http, { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai }, await t.addPatient(), ORDER, SETTINGS);
  const post = (id: number, what: string, body: object, who: keyof typeof token = 'kai') =>
    request(t.http).post(`/api/orders/${id}/${what}`).set(as(who)).send(body);
  const boardRow = async (wardId: number, orderId: number) =>
    (
      (await request(t.http).get(`/api/wards/${wardId}/handover`).set(as('mei')).expect(200)).body.rows as {
        orderId: number;
        paused: boolean;
      }[]
    ).find((row) => row.orderId === orderId);
  const resume = { reason: 'Rousable, RR 14: prescriber agreed', settings: SETTINGS, witness: { ...ROSA, settings: SETTINGS } };

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
    token.mei = await t.tokenFor('mei.tan');
    token.sam = await t.tokenFor('sam.rivera');
  });
  afterAll(() => t.close());

  it('naloxone pauses the PCA, raises an urgent flag, e-mails the prescriber and starts a 2-hour watch', async () => {
    const order = await start();
    const given = await post(order.id, 'naloxone', { dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } }).expect(201);
    expect(given.body).toMatchObject({ orderId: order.id, paused: true, differences: [] });
    expect(given.body.pauses[0]).toMatchObject({ cause: 'naloxone', naloxoneDose: 100, naloxoneUnit: 'mcg', pausedByName: 'Kai Mendes' });
    // Naloxone can wear off before the opioid: observations every 15 minutes for at least 2 hours (common practice).
    const watch = Date.parse(given.body.naloxoneWatchUntil) - Date.parse(given.body.pauses[0].naloxoneGivenAt);
    expect(watch).toBe(120 * 60_000);

    const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('amara')).expect(200);
    const flag = detail.body.flags.find((f: { code: string }) => f.code === 'naloxone.given');
    expect(flag).toMatchObject({ severity: 'urgent', message: 'Naloxone 100 mcg given: PCA paused' });

    const mail = await waitForMail(
      t.http,
      token.sam,
      (m) =>
        m.to === 'amara.osei@kestrelbay.example' && m.subject === `URGENT: naloxone given, PCA paused — Harbour bed ${order.patient.bed}`,
    );
    expect(mail.text).toContain('naloxone 100 mcg');

    const state = await request(t.http).get(`/api/orders/${order.id}/pause`).set(as('lin')).expect(200);
    expect(state.body.paused).toBe(true);
  });

  it('after naloxone the next observation stays due every 15 minutes, even after a calm reading (2-hour watch)', async () => {
    const order = await start();
    await post(order.id, 'naloxone', { dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } }).expect(201);
    // Observations go on while paused.
    const observed = await post(order.id, 'observations', CALM_OBSERVATION).expect(201);
    expect(observed.body.flags.filter((f: { severity: string }) => f.severity === 'urgent')).toEqual([]);
    const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai')).expect(200);
    const due = Date.parse(detail.body.nextObservation.dueAt) - Date.parse(observed.body.at);
    expect(due).toBe(15 * 60_000);
    // The board reads the naloxone time too: the same due time, and the row says Paused.
    const row = await boardRow(detail.body.wardId, order.id);
    expect(row).toMatchObject({ paused: true, nextObservation: { dueAt: detail.body.nextObservation.dueAt } });
    // The schedule reads the naloxone time (its 2-hour close period outlasts the start's first hour).
    const events = (await monitoringEvents(t.app.get(DataSource).manager, [order.id])).get(order.id) ?? [];
    expect(events.map((event) => event.kind)).toContain('naloxone');
  });

  it('the board keeps the after-naloxone watch once the PCA is resumed (the pause closed, naloxone still counts)', async () => {
    const order = await start();
    // The start two hours back, so its first hour's close observation is over: only naloxone tightens.
    const db = t.app.get(DataSource);
    const back = (column: string) => `${column} = strftime('%Y-%m-%d %H:%M:%f', ${column}, '-2 hours')`;
    await db.query(`UPDATE bedside_checks SET ${back('firstAt')}, ${back('secondAt')} WHERE orderId = ?`, [order.id]);
    await db.query(`UPDATE pca_orders SET ${back('startedAt')} WHERE id = ?`, [order.id]);
    await post(order.id, 'naloxone', { dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } }).expect(201);
    await post(order.id, 'resume', resume).expect(200);
    const observed = await post(order.id, 'observations', CALM_OBSERVATION).expect(201);
    const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai')).expect(200);
    expect(Date.parse(detail.body.nextObservation.dueAt) - Date.parse(observed.body.at)).toBe(15 * 60_000);
    const row = await boardRow(detail.body.wardId, order.id);
    expect(row).toMatchObject({ paused: false, nextObservation: { dueAt: detail.body.nextObservation.dueAt } });
  });

  it('naloxone is signed with the nurse’s own password, and refuses a time in the future', async () => {
    const order = await start();
    await post(order.id, 'naloxone', { dose: 0.4, doseUnit: 'mg', signature: { password: 'wrong-password' } }).expect(401);
    const future = new Date(Date.now() + 60 * 60_000).toISOString();
    const late = await post(order.id, 'naloxone', { dose: 0.4, doseUnit: 'mg', givenAt: future, signature: { password: DEMO_PASSWORD } });
    expect(late.status).toBe(400);
    expect(late.body.errors[0].field).toBe('givenAt');
    const bad = await post(order.id, 'naloxone', { dose: Number.NaN, doseUnit: 'µg', signature: { password: DEMO_PASSWORD } }).expect(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(expect.arrayContaining(['dose', 'doseUnit']));
    const state = await request(t.http).get(`/api/orders/${order.id}/pause`).set(as('kai')).expect(200);
    expect(state.body).toMatchObject({ paused: false, pauses: [], naloxoneWatchUntil: null });
  });

  it('a nurse pauses with a reason; resuming needs a second nurse and both readings to match the order', async () => {
    const order = await start();
    const paused = await post(order.id, 'pause', { reason: 'Going to theatre' }).expect(200);
    expect(paused.body).toMatchObject({ paused: true, pauses: [{ cause: 'nurse', reason: 'Going to theatre', resumedAt: null }] });
    const listed = async () =>
      ((await request(t.http).get('/api/orders').set(as('kai')).expect(200)).body as { id: number; paused: boolean }[]).find(
        (entry) => entry.id === order.id,
      );
    expect((await listed())?.paused).toBe(true);
    // The order detail and the ward's board say so too.
    const shown = async () => {
      const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('amara')).expect(200);
      return { detail: detail.body.paused, board: (await boardRow(detail.body.wardId, order.id))?.paused };
    };
    expect(await shown()).toEqual({ detail: true, board: true });
    await post(order.id, 'pause', { reason: 'Going to theatre' }).expect(409);
    const bolus = await post(order.id, 'boluses', { amount: 1, reason: 'Breakthrough pain on coughing', witness: ROSA }).expect(409);
    expect(bolus.body.message).toMatch(/paused/);

    // The second nurse cannot be the signed-in one.
    const self = await post(order.id, 'resume', {
      ...resume,
      witness: { username: 'kai.mendes', password: DEMO_PASSWORD, settings: SETTINGS },
    });
    expect(self.status).toBe(400);
    const mismatch = await post(order.id, 'resume', {
      ...resume,
      witness: { ...resume.witness, settings: { ...SETTINGS, demandDose: 2 } },
    });
    expect(mismatch.status).toBe(200);
    expect(mismatch.body.paused).toBe(true);
    expect(mismatch.body.differences).toEqual([expect.objectContaining({ field: 'demandDose', differs: 'second' })]);

    const resumed = await post(order.id, 'resume', resume).expect(200);
    expect((await listed())?.paused).toBe(false);
    expect(await shown()).toEqual({ detail: false, board: false });
    expect(resumed.body).toMatchObject({ paused: false, differences: [] });
    expect(resumed.body.pauses[0]).toMatchObject({ resumedByName: 'Kai Mendes', resumeWitnessName: 'Rosa Adeyemi' });
    await post(order.id, 'resume', resume).expect(409);

    const audit = await request(t.http).get(`/api/orders/${order.id}/audit`).set(as('amara')).expect(200);
    const actions = (audit.body.events ?? audit.body).map((e: { action: string }) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['order.pause', 'order.resume']));
  });

  it('only nurses and charge nurses pause, resume or record naloxone; only a running PCA can be paused', async () => {
    const order = await start();
    await post(order.id, 'pause', { reason: 'Going to theatre' }, 'amara').expect(403);
    await post(order.id, 'pause', { reason: 'Going to theatre' }, 'lin').expect(403);
    await post(order.id, 'naloxone', { dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } }, 'sam').expect(403);
    await post(order.id, 'pause', { reason: 'Going to theatre' }, 'mei').expect(200);
    await post(order.id, 'resume', resume, 'mei').expect(200);
    await post(order.id, 'discontinue', {
      reason: 'Pain controlled on oral analgesia',
      volumeInfusedMl: 10,
      wastedMl: 40,
      witness: ROSA,
    }).expect(200);
    await post(order.id, 'pause', { reason: 'Going to theatre' }).expect(409);
  });
});
