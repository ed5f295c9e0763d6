import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CALM_OBSERVATION as CALM } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// The monitoring schedule (shared/src/observations/observation-schedule.ts): every 15 minutes for the
// first hour after a start or change and after any urgent flag, then the ward's routine interval —
// common practice; the ASPMN guideline (Jarzyna D et al., Pain Manag Nurs 2011;12(3):118-145) says
// monitoring intensity follows risk, with no single interval.
describe('monitoring schedule', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai' | 'mei', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });
  const start = async () => activeOrder(t.http, { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai }, await t.addPatient());
  const observe = (id: number, body: object) => request(t.http).post(`/api/orders/${id}/observations`).set(as('kai')).send(body);
  const detail = async (id: number) => (await request(t.http).get(`/api/orders/${id}`).set(as('kai')).expect(200)).body;
  const boardRow = async (wardId: number, orderId: number) => {
    const board = await request(t.http).get(`/api/wards/${wardId}/handover`).set(as('mei')).expect(200);
    return board.body.rows.find((row: { orderId: number }) => row.orderId === orderId);
  };
  const minutesFrom = (from: number, dueAt: string) => (Date.parse(dueAt) - from) / 60_000;

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
    token.mei = await t.tokenFor('mei.tan');
  });
  afterAll(() => t.close());

  it('is due 15 minutes after a start, and 15 minutes after sedation 3, on the order and on the board', async () => {
    const order = await start();
    const started = await detail(order.id);
    expect(minutesFrom(Date.parse(started.startedAt), started.nextObservation.dueAt)).toBe(15);

    const before = Date.now();
    await observe(order.id, { ...CALM, sedationLevel: '3' }).expect(201);
    const after = Date.now();
    const afterSedation = await detail(order.id);
    const due = Date.parse(afterSedation.nextObservation.dueAt);
    expect(due).toBeGreaterThanOrEqual(before + 15 * 60_000 - 1000);
    expect(due).toBeLessThanOrEqual(after + 15 * 60_000 + 1000);
    const row = await boardRow(afterSedation.wardId, order.id);
    expect(row.nextObservation.dueAt).toBe(afterSedation.nextObservation.dueAt);
    const list = await request(t.http).get('/api/orders').set(as('kai')).expect(200);
    const entry = list.body.find((o: { id: number }) => o.id === order.id);
    expect(entry.nextObservation.dueAt).toBe(afterSedation.nextObservation.dueAt);
    // The nurse's list and the prescriber's bell read the open urgent flags from the list.
    expect(entry.openUrgentFlags).toBe(1);
  });

  it('relaxes to the routine interval only after a reading without urgent flags, once the first hour is past', async () => {
    const order = await start();
    // Move the start two hours back, so the first hour's close observation is over.
    const db = t.app.get(DataSource);
    const back = (column: string) => `${column} = strftime('%Y-%m-%d %H:%M:%f', ${column}, '-2 hours')`;
    await db.query(`UPDATE bedside_checks SET ${back('firstAt')}, ${back('secondAt')} WHERE orderId = ?`, [order.id]);
    await db.query(`UPDATE pca_orders SET ${back('startedAt')} WHERE id = ?`, [order.id]);

    // No reading since the start: still every 15 minutes, and overdue.
    expect((await detail(order.id)).nextObservation.severity).toBe('urgent');
    const calmAt = new Date().toISOString();
    await observe(order.id, { ...CALM, at: calmAt }).expect(201);
    // A calm reading after the hour: the ward's first-24-hours interval (60 min by default).
    expect(minutesFrom(Date.parse(calmAt), (await detail(order.id)).nextObservation.dueAt)).toBe(60);
  });

  it('counts an urgent flag from the reading it came from, so a reading entered late is due sooner, not later', async () => {
    const order = await start();
    const db = t.app.get(DataSource);
    const back = (column: string) => `${column} = strftime('%Y-%m-%d %H:%M:%f', ${column}, '-2 hours')`;
    await db.query(`UPDATE bedside_checks SET ${back('firstAt')}, ${back('secondAt')} WHERE orderId = ?`, [order.id]);
    await db.query(`UPDATE pca_orders SET ${back('startedAt')} WHERE id = ?`, [order.id]);

    // Sedation 3 observed 20 minutes ago and entered now: the next reading was due 15 minutes after it.
    const observedAt = Date.now() - 20 * 60_000;
    await observe(order.id, { ...CALM, sedationLevel: '3', at: new Date(observedAt).toISOString() }).expect(201);
    const { nextObservation } = await detail(order.id);
    expect(minutesFrom(observedAt, nextObservation.dueAt)).toBe(15);
    expect(nextObservation.overdueMinutes).toBeGreaterThanOrEqual(4);
    const wardId = (await detail(order.id)).wardId;
    expect((await boardRow(wardId, order.id)).nextObservation.dueAt).toBe(nextObservation.dueAt);
  });
});
