import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CALM_OBSERVATION, ROSA } from './support/pca.js';
import { activeOrder as startOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// The clinician bolus checks of shared/src/bedside/bolus-checks.ts against the record. Sedation:
// Pasero Opioid-induced Sedation Scale (Pasero C, 1994; Pasero & McCaffery, Pain Assessment and
// Pharmacologic Management, 2011): 3 and 4 are unacceptable. The order (support/pca.ts) has a
// demand dose of 1 mg, no basal, a 4-hour limit of 30 mg and a clinician bolus of up to 2 mg.
describe('clinician bolus checks: sedation, breathing, the order limits, the next observation', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });
  const activeOrder = async () =>
    startOrder(t.http, { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai }, await t.addPatient());
  const bolus = (orderId: number, amount: number) =>
    request(t.http)
      .post(`/api/orders/${orderId}/boluses`)
      .set(as('kai'))
      .send({ amount, reason: 'Breakthrough pain on coughing', witness: ROSA });
  const observe = (orderId: number, values: object) =>
    request(t.http)
      .post(`/api/orders/${orderId}/observations`)
      .set(as('kai'))
      .send({ ...CALM_OBSERVATION, at: new Date().toISOString(), ...values });

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  it('refuses a bolus after an observation at sedation 3, with "contact the prescriber", and records none', async () => {
    const order = await activeOrder();
    await observe(order.id, { sedationLevel: '3' }).expect(201);
    const refused = await bolus(order.id, 1).expect(409);
    expect(refused.body.message).toMatch(/sedation 3/);
    expect(refused.body.message).toMatch(/contact the prescriber/i);
    const dataSource = t.app.get<DataSource>(getDataSourceToken());
    expect(await dataSource.query('SELECT id FROM clinician_boluses WHERE orderId = ?', [order.id])).toEqual([]);
  });

  it('refuses a bolus while an urgent breathing flag is open', async () => {
    const order = await activeOrder();
    await observe(order.id, { respiratoryRate: 7 }).expect(201);
    const refused = await bolus(order.id, 1).expect(409);
    expect(refused.body.message).toContain('respiratory-rate.low');
    expect(refused.body.message).toMatch(/contact the prescriber/i);
  });

  it('refuses a bolus over the 4-hour limit naming the figures, and allows one that reaches it exactly', async () => {
    const order = await activeOrder();
    await observe(order.id, {}).expect(201);
    // The pump's totals as if 29 demand doses had been given since the start (written directly: the
    // observation form would rightly flag that many presses moments after a start).
    const dataSource = t.app.get<DataSource>(getDataSourceToken());
    await dataSource.query('UPDATE observations SET attempts = 40, delivered = 29, volumeInfusedMl = 29 WHERE orderId = ?', [order.id]);
    const refused = await bolus(order.id, 2).expect(409);
    expect(refused.body.message).toContain('29 mg given in the last 4 hours + this bolus of 2 mg = 31 mg, over the 4-hour limit of 30 mg');
    expect(refused.body.message).toMatch(/contact the prescriber/i);
    await bolus(order.id, 1).expect(201); // 29 + 1 = 30 mg: the limit reached, not exceeded
    await bolus(order.id, 0.5).expect(409); // now 30 mg given
  });

  it('gives a normal bolus (201) and makes the next observation due 15 minutes after it', async () => {
    const order = await activeOrder();
    const given = await bolus(order.id, 1.5).expect(201);
    const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai')).expect(200);
    expect(detail.body.nextObservation.dueAt).toBe(new Date(Date.parse(given.body.at) + 15 * 60_000).toISOString());
  });
});
