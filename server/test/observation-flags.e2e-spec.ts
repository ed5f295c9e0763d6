import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CALM_OBSERVATION as CALM, ORDER, SETTINGS } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

/** Flags on every observation (the first after a start included), pain with sedation, and delivery against the regimen. */
describe('observation flags from the syringe start and the regimen', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai', string>;
  const observe = (id: number, body: object) =>
    request(t.http)
      .post(`/api/orders/${id}/observations`)
      .set({ Authorization: `Bearer ${token.kai}` })
      .send(body);
  const start = async (order: object = ORDER, settings: object = SETTINGS) =>
    activeOrder(t.http, { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai }, await t.addPatient(), order, settings);
  const codes = (body: { flags: { code: string }[] }) => body.flags.map((flag) => flag.code);
  /** Moves the PCA's start (order and bedside check) this many minutes into the past. */
  const startedMinutesAgo = async (orderId: number, minutes: number) => {
    const db = t.app.get(DataSource);
    const back = (column: string) => `${column} = strftime('%Y-%m-%d %H:%M:%f', ${column}, '-${minutes} minutes')`;
    await db.query(`UPDATE bedside_checks SET ${back('firstAt')}, ${back('secondAt')} WHERE orderId = ?`, [orderId]);
    await db.query(`UPDATE pca_orders SET ${back('startedAt')} WHERE id = ?`, [orderId]);
  };

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  it('a first observation with 1 mL left and a basal running raises syringe-low: the syringe start stands in as the previous reading', async () => {
    // A basal rate for this opioid-naive adult needs the prescriber's reason (Chou R et al.,
    // Management of Postoperative Pain, APS/ASRA/ASA guideline, J Pain 2016;17(2):131-157).
    const basal = { field: 'basalRatePerHour', reason: 'Basal rate agreed with the acute pain team for this test' };
    const order = await start({ ...ORDER, basalRatePerHour: 1, overrides: [basal] }, { ...SETTINGS, basalRatePerHour: 1 });
    const response = await observe(order.id, { ...CALM, attempts: 0, delivered: 0, volumeInfusedMl: 49, syringeRemainingMl: 1 }).expect(
      201,
    );
    expect(codes(response.body)).toContain('syringe.low');
  });

  it('40 doses delivered 3 minutes after the start (lockout 10 min, 4-hour limit 30 mg) is urgent', async () => {
    const order = await start();
    await startedMinutesAgo(order.id, 3);
    const response = await observe(order.id, { ...CALM, attempts: 40, delivered: 40, volumeInfusedMl: 40, syringeRemainingMl: 10 }).expect(
      201,
    );
    const flag = response.body.flags.find((f: { code: string }) => f.code === 'delivery.over-regimen');
    expect(flag).toMatchObject({
      severity: 'urgent',
      message: expect.stringMatching(/^Delivered more than the regimen allows: 40 doses in 3 min/),
    });
    expect(flag.message).toContain('over the 4-hour limit of 30 mg');
    expect(flag.action).toMatch(/^Check the pump and the entry/);
  });

  it('one dose moments after the start raises nothing; volume the doses do not explain is a review', async () => {
    const order = await start();
    expect((await observe(order.id, CALM).expect(201)).body.flags).toEqual([]);
    // 1 dose of 1 mg at 1 mg/mL explains 1 mL; 5 mL is beyond the 1 mL tolerance (Lockstep's own, common practice).
    const response = await observe(order.id, { ...CALM, volumeInfusedMl: 5, syringeRemainingMl: 45 }).expect(201);
    expect(response.body.flags).toMatchObject([{ severity: 'review', code: 'delivery.volume-mismatch' }]);
  });

  it('pain 9 with no presses on the first observation asks to check the handset', async () => {
    const order = await start();
    const response = await observe(order.id, {
      ...CALM,
      painScore: 9,
      attempts: 0,
      delivered: 0,
      volumeInfusedMl: 0,
      syringeRemainingMl: 50,
    }).expect(201);
    expect(response.body.flags).toMatchObject([
      { severity: 'review', code: 'pain.no-presses', action: expect.stringContaining('handset') },
    ]);
  });

  it('with sedation 3 the pain flag says do not increase the opioid (POSS, Pasero & McCaffery 2011), also while the flag stays open', async () => {
    const order = await start();
    const sedated = await observe(order.id, { ...CALM, painScore: 8, sedationLevel: '3', attempts: 6, delivered: 1 }).expect(201);
    expect(codes(sedated.body)).toEqual(['sedation.3', 'pain.not-controlled']);
    expect(sedated.body.flags[1].action).toMatch(/^Do not increase the opioid/);
    const later = await observe(order.id, { ...CALM, painScore: 8, sedationLevel: '2', attempts: 12, delivered: 1 }).expect(201);
    expect(later.body.flags).toMatchObject([{ code: 'pain.not-controlled', action: expect.stringMatching(/^Do not increase the opioid/) }]);
  });

  it('infused plus remaining more than the syringe held asks to check the syringe reading', async () => {
    const order = await start();
    // 2 mL infused and 50 mL left is 52 mL from a 50 mL syringe, beyond the 1 mL reading tolerance (common practice).
    const response = await observe(order.id, { ...CALM, volumeInfusedMl: 2, syringeRemainingMl: 50 }).expect(201);
    expect(response.body.flags).toMatchObject([{ severity: 'review', code: 'syringe.reading' }]);
  });
});
