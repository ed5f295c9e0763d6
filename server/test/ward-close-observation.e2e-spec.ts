import request from 'supertest';
import { DataSource, type Repository } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../src/database/seed/demo-staff.js';
import { Ward } from '../src/wards/entities/ward.entity.js';
import { CALM_OBSERVATION as CALM, ORDER, SETTINGS } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// Close observation a ward can store, held at the floors (shared WARD_POLICY_FLOORS): at least every 15
// minutes (common practice; the ASPMN guideline, Jarzyna D et al., Pain Manag Nurs 2011;12(3):118-145, gives
// no single interval), for at least 60 minutes after a start or change (common practice), and for at least
// 120 minutes after naloxone, which wears off before most opioids (common practice, no single published interval).
describe('close-observation settings of a ward', () => {
  let t: TestApp;
  let wards: Repository<Ward>;
  const token = {} as Record<'amara' | 'lin' | 'kai', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });
  const start = async () =>
    activeOrder(t.http, { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai }, await t.addPatient(), ORDER, SETTINGS);
  const detail = async (id: number) => (await request(t.http).get(`/api/orders/${id}`).set(as('kai')).expect(200)).body;
  const policy = async (wardId: number) => (await request(t.http).get(`/api/wards/${wardId}/policy`).set(as('kai')).expect(200)).body;
  const minutesFrom = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 60_000;
  const SHIPPED = { closeObservationIntervalMinutes: 15, closeObservationPeriodMinutes: 60, naloxoneClosePeriodMinutes: 120 };

  beforeAll(async () => {
    t = await createTestApp();
    wards = t.app.get(DataSource).getRepository(Ward);
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  it('answers the three settings in the ward policy, with the shipped defaults', async () => {
    const ward = await wards.findOneByOrFail({ id: 1 });
    expect(ward).toMatchObject(SHIPPED);
    expect(await policy(1)).toMatchObject(SHIPPED);
  });

  it('holds a stored looser setting at the floor: a 30-minute close interval is worked to as 15', async () => {
    const order = await start();
    const started = await detail(order.id);
    // Written directly: a change through the API needs a second sign-off.
    await wards.update(
      { id: started.wardId },
      { closeObservationIntervalMinutes: 30, closeObservationPeriodMinutes: 30, naloxoneClosePeriodMinutes: 60 },
    );
    try {
      expect(await policy(started.wardId)).toMatchObject(SHIPPED);
      const after = await detail(order.id);
      expect(minutesFrom(after.startedAt, after.nextObservation.dueAt)).toBe(15);
    } finally {
      await wards.update({ id: started.wardId }, SHIPPED);
    }
  });

  it('after naloxone on a ward whose naloxone period is 180 minutes, the watch runs 180 minutes', async () => {
    const order = await start();
    const { wardId } = await detail(order.id);
    await wards.update({ id: wardId }, { naloxoneClosePeriodMinutes: 180 });
    try {
      expect((await policy(wardId)).naloxoneClosePeriodMinutes).toBe(180);
      const given = await request(t.http)
        .post(`/api/orders/${order.id}/naloxone`)
        .set(as('kai'))
        .send({ dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } })
        .expect(201);
      expect(minutesFrom(given.body.pauses[0].naloxoneGivenAt, given.body.naloxoneWatchUntil)).toBe(180);
      expect(given.body.naloxoneWatchEveryMinutes).toBe(15);
      const flag = (await detail(order.id)).flags.find((f: { code: string }) => f.code === 'naloxone.given');
      expect(flag.action).toContain('observe every 15 minutes for at least 3 hours');

      // Move everything 150 minutes back: past a 2-hour watch, inside a 3-hour one.
      const db = t.app.get(DataSource);
      const back = (column: string) => `${column} = strftime('%Y-%m-%d %H:%M:%f', ${column}, '-150 minutes')`;
      await db.query(`UPDATE bedside_checks SET ${back('firstAt')}, ${back('secondAt')} WHERE orderId = ?`, [order.id]);
      await db.query(`UPDATE pca_orders SET ${back('startedAt')} WHERE id = ?`, [order.id]);
      await db.query(`UPDATE pca_pauses SET ${back('pausedAt')}, ${back('naloxoneGivenAt')} WHERE orderId = ?`, [order.id]);
      await db.query(`UPDATE flags SET ${back('raisedAt')} WHERE orderId = ?`, [order.id]);
      const calmAt = new Date().toISOString();
      await request(t.http)
        .post(`/api/orders/${order.id}/observations`)
        .set(as('kai'))
        .send({ ...CALM, at: calmAt })
        .expect(201);
      // 150 minutes after naloxone, the ward's 180-minute watch still asks for every 15 minutes...
      expect(minutesFrom(calmAt, (await detail(order.id)).nextObservation.dueAt)).toBe(15);
      // ...where the shipped 120 minutes would have relaxed to the first-24-hours interval.
      await wards.update({ id: wardId }, { naloxoneClosePeriodMinutes: 120 });
      expect(minutesFrom(calmAt, (await detail(order.id)).nextObservation.dueAt)).toBe(60);
    } finally {
      await wards.update({ id: wardId }, SHIPPED);
    }
  });
});
