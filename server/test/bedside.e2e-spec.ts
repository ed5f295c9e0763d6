import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { waitForMail } from './support/mailbox.js';
import { ORDER, RELEASE, ROSA, SETTINGS } from './support/pca.js';
import { activeOrder as startOrder, verifiedOrderWithSyringe as releasedOrder } from './support/pca-steps.js';
import { createTestApp, DEMO_PASSWORD, type TestApp } from './support/test-app.js';

// Regimen and syringe are in support/pca.ts (a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]; each
// order is for a new copy of its patient (TestApp.addPatient).
describe('bedside: two-nurse check, bolus, syringe change, discontinue', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai' | 'rosa' | 'sam', string>;
  const as = (who: keyof typeof token) => ({ Authorization: `Bearer ${token[who]}` });

  const pcaTokens = () => ({ prescriber: token.amara, pharmacist: token.lin, nurse: token.kai });
  // Each order on a patient of its own: a patient may have only one open PCA.
  const verifiedOrderWithSyringe = async () => releasedOrder(t.http, pcaTokens(), await t.addPatient());
  const firstCheck = (id: number, body: object) => request(t.http).post(`/api/orders/${id}/bedside-checks`).set(as('kai')).send(body);
  const secondCheck = (id: number, checkId: number, body: object) =>
    request(t.http).post(`/api/orders/${id}/bedside-checks/${checkId}/second`).set(as('kai')).send(body);

  const activeOrder = async () => startOrder(t.http, pcaTokens(), await t.addPatient());

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
    token.rosa = await t.tokenFor('rosa.adeyemi');
    token.sam = await t.tokenFor('sam.rivera');
  });
  afterAll(() => t.close());

  describe('bedside check', () => {
    it('never sends the first entry back, names each mismatched field and whose entry differs, and starts nothing', async () => {
      const order = await verifiedOrderWithSyringe();
      const first = await firstCheck(order.id, {
        ...order.patient.identity,
        releaseCode: order.code.toLowerCase().replace('-', ' '),
        settings: { ...SETTINGS, lockoutMinutes: 6 },
      }).expect(201);
      expect(first.body).toEqual({ id: expect.any(Number), status: 'awaiting_second' });
      const second = await secondCheck(order.id, first.body.id, { ...ROSA, settings: SETTINGS }).expect(200);
      expect(second.body).toEqual({
        id: first.body.id,
        status: 'mismatch',
        differences: [{ field: 'lockoutMinutes', first: 6, second: 10, ordered: 10, differs: 'first' }],
      });
      const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai')).expect(200);
      expect(detail.body.status).toBe('verified');
      expect(detail.body.releases[0].status).toBe('ready');
      await secondCheck(order.id, first.body.id, { ...ROSA, settings: SETTINGS }).expect(409);
    });

    it('activates the order and the syringe on a full match, recording both nurses and times', async () => {
      const order = await verifiedOrderWithSyringe();
      const first = await firstCheck(order.id, { ...order.patient.identity, releaseCode: order.code, settings: SETTINGS }).expect(201);
      const second = await secondCheck(order.id, first.body.id, { ...ROSA, settings: SETTINGS }).expect(200);
      expect(second.body).toEqual({ id: first.body.id, status: 'matched', differences: [] });
      const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai')).expect(200);
      expect(detail.body).toMatchObject({ status: 'active', startedAt: expect.any(String) });
      expect(detail.body.releases[0].status).toBe('in_use');
      expect(detail.body.events.at(-1)).toMatchObject({
        toStatus: 'active',
        userName: 'Kai Mendes',
        reason: expect.stringContaining('Rosa Adeyemi'),
      });
      const dataSource = t.app.get<DataSource>(getDataSourceToken());
      const [row] = await dataSource.query('SELECT firstNurseId, firstAt, secondNurseId, secondAt FROM bedside_checks WHERE id = ?', [
        first.body.id,
      ]);
      expect(row).toEqual({ firstNurseId: 4, firstAt: expect.any(String), secondNurseId: 5, secondAt: expect.any(String) });
    });

    it('refuses the same nurse twice (400), a wrong second password (401) and a pharmacist as either check (403)', async () => {
      const order = await verifiedOrderWithSyringe();
      const first = await firstCheck(order.id, { ...order.patient.identity, releaseCode: order.code, settings: SETTINGS }).expect(201);
      const same = await secondCheck(order.id, first.body.id, {
        username: 'kai.mendes',
        password: DEMO_PASSWORD,
        settings: SETTINGS,
      }).expect(400);
      expect(same.body.errors[0].field).toBe('username');
      await secondCheck(order.id, first.body.id, { ...ROSA, password: 'wrong-password', settings: SETTINGS }).expect(401);
      await secondCheck(order.id, first.body.id, { username: 'lin.park', password: DEMO_PASSWORD, settings: SETTINGS }).expect(403);
      await request(t.http)
        .post(`/api/orders/${order.id}/bedside-checks`)
        .set(as('lin'))
        .send({ ...order.patient.identity, releaseCode: order.code, settings: SETTINGS })
        .expect(403);
      await request(t.http)
        .post(`/api/orders/${order.id}/bedside-checks`)
        .set(as('amara'))
        .send({ ...order.patient.identity, releaseCode: order.code, settings: SETTINGS })
        .expect(403);
    });

    it('refuses the wrong patient and a syringe released for another order (400 naming the field)', async () => {
      const order = await verifiedOrderWithSyringe();
      const other = await verifiedOrderWithSyringe();
      const wrongPatient = await firstCheck(order.id, {
        patientMrn: 'KB100458',
        patientDateOfBirth: '1968-03-14',
        releaseCode: order.code,
        settings: SETTINGS,
      }).expect(400);
      expect(wrongPatient.body.errors.map((e: { field: string }) => e.field)).toEqual(['patientMrn']);
      const otherSyringe = await firstCheck(order.id, { ...order.patient.identity, releaseCode: other.code, settings: SETTINGS }).expect(
        400,
      );
      expect(otherSyringe.body.errors).toEqual([
        { field: 'releaseCode', message: 'This syringe was released for another order: do not use it' },
      ]);
      const missing = await firstCheck(order.id, {
        ...order.patient.identity,
        releaseCode: order.code,
        settings: { ...SETTINGS, demandDose: undefined },
      }).expect(400);
      expect(missing.body.errors[0].field).toBe('settings.demandDose');
    });
  });

  describe('clinician bolus', () => {
    it('gives a co-signed bolus within the order, refuses one over it, and one over the hard limit', async () => {
      const order = await activeOrder();
      const witness = { witness: ROSA };
      const given = await request(t.http)
        .post(`/api/orders/${order.id}/boluses`)
        .set(as('kai'))
        .send({ amount: 1.5, reason: 'Breakthrough pain on coughing', ...witness })
        .expect(201);
      expect(given.body).toMatchObject({ amount: 1.5, givenByName: 'Kai Mendes', witnessName: 'Rosa Adeyemi', at: expect.any(String) });
      const over = await request(t.http)
        .post(`/api/orders/${order.id}/boluses`)
        .set(as('kai'))
        .send({ amount: 5, reason: 'Breakthrough pain on coughing', ...witness })
        .expect(400);
      expect(over.body.errors[0].field).toBe('amount');
      await request(t.http)
        .post(`/api/orders/${order.id}/boluses`)
        .set(as('kai'))
        .send({ amount: 1, reason: 'Breakthrough pain on coughing', witness: { username: 'kai.mendes', password: DEMO_PASSWORD } })
        .expect(400);
    });

    it('refuses a bolus over the ward hard limit even when the order allows it', async () => {
      // The demo Harbour rule's clinician bolus hard maximum is 4 mg (invented demo value).
      const { body: order } = await request(t.http)
        .post('/api/orders')
        .set(as('amara'))
        .send({ ...ORDER, patientId: (await t.addPatient()).id, clinicianBolusDose: 2 })
        .expect(201);
      expect(order.clinicianBolusDose).toBe(2);
      const hard = await request(t.http)
        .post('/api/orders')
        .set(as('amara'))
        .send({ ...ORDER, patientId: (await t.addPatient()).id, clinicianBolusDose: 5 })
        .expect(400);
      expect(hard.body.errors[0].field).toBe('clinicianBolusDose');
    });
  });

  describe('syringe change and discontinue', () => {
    it('changes the syringe with witnessed waste that reconciles, then a new blind check starts the new syringe', async () => {
      const order = await activeOrder();
      const { body: next } = await request(t.http)
        .post(`/api/orders/${order.id}/releases`)
        .set(as('lin'))
        .send({ ...RELEASE, secondSyringeReason: 'Replacement for the running syringe' })
        .expect(201);
      await firstCheck(order.id, { ...order.patient.identity, releaseCode: next.releaseCode, settings: SETTINGS }).expect(409);
      const change = await request(t.http)
        .post(`/api/orders/${order.id}/syringe-changes`)
        .set(as('kai'))
        .send({ volumeInfusedMl: 46, wastedMl: 4, newReleaseCode: next.releaseCode, witness: ROSA })
        .expect(201);
      expect(change.body.reconciliation).toEqual({
        dispensedMl: 50,
        infusedMl: 46,
        wastedMl: 4,
        discrepancyMl: 0,
        mustReport: false,
        releaseCode: order.code,
      });
      // Between syringes only the new syringe's bedside check may happen (the shared bedside-action rule).
      const bolus = await request(t.http)
        .post(`/api/orders/${order.id}/boluses`)
        .set(as('kai'))
        .send({ amount: 1, reason: 'Pain on moving', witness: ROSA })
        .expect(409);
      expect(bolus.body.message).toBe('No syringe is running: finish the bedside check first');
      const first = await firstCheck(order.id, { ...order.patient.identity, releaseCode: next.releaseCode, settings: SETTINGS }).expect(
        201,
      );
      await secondCheck(order.id, first.body.id, { ...ROSA, settings: SETTINGS }).expect(200);
      const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('kai'));
      expect(detail.body.releases.map((r: { status: string }) => r.status)).toEqual(['finished', 'in_use']);
    });

    it('discontinues with a reconciliation inside tolerance: no flag; then nothing can change (409)', async () => {
      const order = await activeOrder();
      const response = await request(t.http)
        .post(`/api/orders/${order.id}/discontinue`)
        .set(as('kai'))
        .send({ reason: 'Prescriber stopped the PCA: pain controlled orally', volumeInfusedMl: 30.2, wastedMl: 19.5, witness: ROSA })
        .expect(200);
      expect(response.body.reconciliation).toMatchObject({
        dispensedMl: 50,
        infusedMl: 30.2,
        wastedMl: 19.5,
        discrepancyMl: 0.3,
        mustReport: false,
      });
      expect(response.body.order).toMatchObject({ status: 'discontinued', flags: [] });
      await request(t.http)
        .post(`/api/orders/${order.id}/discontinue`)
        .set(as('kai'))
        .send({ reason: 'Prescriber stopped the PCA again', volumeInfusedMl: 1, wastedMl: 1, witness: ROSA })
        .expect(409);
      await request(t.http)
        .post(`/api/orders/${order.id}/boluses`)
        .set(as('kai'))
        .send({ amount: 1, reason: 'Breakthrough pain on coughing', witness: ROSA })
        .expect(409);
    });

    it('discontinues with a discrepancy over tolerance: a flag for pharmacy and an e-mail to the ward pharmacy', async () => {
      const order = await activeOrder();
      const response = await request(t.http)
        .post(`/api/orders/${order.id}/discontinue`)
        .set(as('kai'))
        .send({ reason: 'Prescriber stopped the PCA: switched to oral', volumeInfusedMl: 30, wastedMl: 15, witness: ROSA })
        .expect(200);
      // 50 − 30 − 15 = 5 mL unaccounted for, over the default 0.5 mL tolerance.
      expect(response.body.reconciliation).toMatchObject({ discrepancyMl: 5, mustReport: true });
      expect(response.body.order.flags).toMatchObject([{ severity: 'review', code: 'reconciliation.discrepancy' }]);
      const mail = await waitForMail(t.http, token.sam, (m) => m.subject.startsWith(`Reconciliation discrepancy: PCA order ${order.id}`));
      expect(mail.to).toBe('pharmacy.harbour@kestrelbay.example');
      expect(mail.text).toContain('5 mL unaccounted for');
    });
  });
});
