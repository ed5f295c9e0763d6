import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CreateOrderRequest } from '@lockstep/shared';
import { waitForMail } from './support/mailbox.js';
import { REGIMEN, RELEASE, SIGNING } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];

// The regimen of support/pca.ts (a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory] with an
// indication and no clinician bolus.
const ORDER: CreateOrderRequest = { ...REGIMEN, indication: 'Pain after open abdominal surgery', ...SIGNING };
// A 1-hour limit of 10 mg holds what 2.5 mg every 10 minutes could give (15 mg) to the demo rule's
// 1-hour soft maximum, so the demand dose is the one soft finding.
const SOFT = {
  ...ORDER,
  demandDose: 2.5,
  oneHourLimit: 10,
  overrides: [{ field: 'demandDose', reason: 'Opioid use before surgery; pain team agreed' }],
};

describe('orders, verification and syringe release', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let tomas: string;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const sign = (body: object) => request(t.http).post('/api/orders').set(as('prescriber')).send(body);
  const act = (id: number, action: string, body: object, role: Role = 'pharmacist') =>
    request(t.http).post(`/api/orders/${id}/${action}`).set(as(role)).send(body);
  const orderCount = async () => (await request(t.http).get('/api/orders').set(as('pharmacist'))).body.length as number;
  /** The body for a new patient with nothing open: a patient may have only one open PCA, and the demo's patient 1 has one. */
  const forNewPatient = async <T extends object>(body: T): Promise<T & { patientId: number }> => ({
    ...body,
    patientId: (await t.addPatient()).id,
  });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
    tomas = await t.tokenFor('tomas.ortiz');
  });
  afterAll(() => t.close());

  describe('signing', () => {
    it('signs an order with one soft override, keeps the findings and reason, and tells pharmacy', async () => {
      const response = await sign(await forNewPatient(SOFT)).expect(201);
      expect(response.body).toMatchObject({
        status: 'awaiting_verification',
        version: 1,
        regimenType: 'demand_only',
        prescriberName: 'Dr Amara Osei',
        wardName: 'Harbour',
      });
      expect(response.body.findings.map((f: { field: string; severity: string }) => [f.field, f.severity])).toEqual([
        ['demandDose', 'soft'],
      ]);
      expect(response.body.overrides).toEqual(SOFT.overrides);
      expect(response.body.events).toMatchObject([{ fromStatus: null, toStatus: 'awaiting_verification', userName: 'Dr Amara Osei' }]);
      const mail = await waitForMail(t.http, tokens.admin, (m) =>
        m.subject.includes(`PCA order ${response.body.id} awaiting verification`),
      );
      expect(mail.to).toBe('pharmacy.harbour@kestrelbay.example');
      expect(mail.text).toContain('demand 2.5 mg');
    });

    it('refuses a soft finding without a reason: 400 naming the field, nothing written', async () => {
      const before = await orderCount();
      const response = await sign(await forNewPatient({ ...SOFT, overrides: [] })).expect(400);
      expect(response.body.errors).toEqual([{ field: 'demandDose', message: expect.stringContaining('Reason needed') }]);
      expect(await orderCount()).toBe(before);
    });

    it('refuses a hard finding (a missed decimal point) even with a reason', async () => {
      const response = await sign(
        await forNewPatient({
          ...ORDER,
          demandDose: 10,
          overrides: [{ field: 'demandDose', reason: 'I really mean ten milligrams' }],
        }),
      ).expect(400);
      expect(response.body.errors[0]).toMatchObject({ field: 'demandDose' });
    });

    it('refuses an order whose possible totals are over the hard maxima, although it states no limits', async () => {
      // Patient 7 on Cedar; demo morphine rule (invented): 1-hour hard 15 mg, 4-hour hard 40 mg.
      // Demand 2 mg every 6 min could give 20 mg an hour and 80 mg in 4 hours (docs/design.md).
      const before = await orderCount();
      const response = await sign({
        ...ORDER,
        patientId: 7,
        demandDose: 2,
        lockoutMinutes: 6,
        oneHourLimit: null,
        fourHourLimit: null,
        overrides: [
          { field: 'oneHourLimit', reason: 'A reason cannot pass a hard maximum' },
          { field: 'fourHourLimit', reason: 'A reason cannot pass a hard maximum' },
        ],
      }).expect(400);
      expect(response.body.errors).toEqual([
        { field: 'oneHourLimit', message: expect.stringContaining('could give up to 20 mg in an hour') },
        { field: 'fourHourLimit', message: expect.stringContaining('could give up to 80 mg in 4 hours') },
      ]);
      expect(await orderCount()).toBe(before);
    });

    it('needs a reason for a possible hourly total over the soft maximum', async () => {
      // Demand 1.5 mg every 8 min: 1.5 × ceil(60 ÷ 8) = 12 mg an hour, over Cedar's 10 mg soft maximum.
      const body = { ...ORDER, patientId: 7, demandDose: 1.5, lockoutMinutes: 8 };
      const refused = await sign(body).expect(400);
      expect(refused.body.errors).toEqual([
        { field: 'oneHourLimit', message: expect.stringContaining('Reason needed: The pump could give up to 12 mg') },
      ]);
      const signed = await sign({
        ...body,
        overrides: [{ field: 'oneHourLimit', reason: 'Large wound; pain team review at 2 hours' }],
      }).expect(201);
      expect(signed.body.overrides).toEqual([{ field: 'oneHourLimit', reason: 'Large wound; pain team review at 2 hours' }]);
      await act(signed.body.id, 'cancel', { reason: 'Test order, not for this patient' }, 'prescriber');
    });

    it('refuses a wrong signature password with 401 and writes nothing', async () => {
      const before = await orderCount();
      await sign(await forNewPatient({ ...ORDER, signature: { password: 'wrong-password' } })).expect(401);
      expect(await orderCount()).toBe(before);
    });

    it.each([
      [{ ...ORDER, reviewDate: 'soon' }, 'reviewDate'],
      [{ ...ORDER, signature: undefined }, 'signature'],
      [{ ...ORDER, overrides: [{ field: 'demandDose', reason: 'ok' }] }, 'overrides.0.reason'],
      [{ ...ORDER, lockoutMinutes: 0.5 }, 'lockoutMinutes'],
    ])('answers bad input with 400 naming the field (%#)', async (body, field) => {
      const response = await sign(body).expect(400);
      expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
    });

    it.each(['pharmacist', 'nurse', 'charge_nurse', 'admin'] as Role[])('refuses %s as a signer (403)', async (role) => {
      await request(t.http).post('/api/orders').set(as(role)).send(ORDER).expect(403);
    });

    it('answers 401 without a token on every order route', async () => {
      await request(t.http).post('/api/orders').send(ORDER).expect(401);
      await request(t.http).get('/api/orders').expect(401);
      await request(t.http).get('/api/orders/1').expect(401);
      await request(t.http).post('/api/orders/1/verify').send({}).expect(401);
    });
  });

  describe('verification', () => {
    it('verifies once: prescriber and nurse 403, wrong password 401, twice 409 with the current status', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await act(order.id, 'verify', { signature: { password: DEMO_PASSWORD } }, 'prescriber').expect(403);
      await act(order.id, 'verify', { signature: { password: DEMO_PASSWORD } }, 'nurse').expect(403);
      await act(order.id, 'verify', { signature: { password: 'nope' } }).expect(401);
      const verified = await act(order.id, 'verify', { signature: { password: DEMO_PASSWORD } }).expect(200);
      expect(verified.body).toMatchObject({ status: 'verified', verifiedByName: 'Lin Park' });
      const again = await request(t.http)
        .post(`/api/orders/${order.id}/verify`)
        .set({ Authorization: `Bearer ${tomas}` })
        .send({ signature: { password: DEMO_PASSWORD } })
        .expect(409);
      expect(again.body).toMatchObject({ currentStatus: 'verified' });
    });

    it('returns with a query → the prescriber is e-mailed → revises as version 2 → the old one is superseded', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await act(order.id, 'return', { reason: 'short' }).expect(400);
      const returned = await act(order.id, 'return', { reason: 'Please confirm the 4-hour limit with the pain team' }).expect(200);
      expect(returned.body).toMatchObject({ status: 'returned', statusReason: 'Please confirm the 4-hour limit with the pain team' });
      const mail = await waitForMail(t.http, tokens.admin, (m) => m.subject === `PCA order ${order.id} returned with a query`);
      expect(mail.to).toBe('amara.osei@kestrelbay.example');

      await request(t.http)
        .post(`/api/orders/${order.id}/revise`)
        .set(as('prescriber'))
        .send(await forNewPatient(ORDER))
        .expect(400);
      const revised = await request(t.http)
        .post(`/api/orders/${order.id}/revise`)
        .set(as('prescriber'))
        .send({ ...ORDER, patientId: order.patientId, fourHourLimit: 25 })
        .expect(201);
      expect(revised.body).toMatchObject({ version: 2, supersedesId: order.id, status: 'awaiting_verification', fourHourLimit: 25 });
      const old = await request(t.http).get(`/api/orders/${order.id}`).set(as('pharmacist')).expect(200);
      expect(old.body.status).toBe('superseded');
      expect(old.body.events.map((e: { toStatus: string }) => e.toStatus)).toEqual(['awaiting_verification', 'returned', 'superseded']);
      // Revising it again: 409 saying it is superseded (its status, checked before the patient's open PCA).
      const again = await request(t.http)
        .post(`/api/orders/${order.id}/revise`)
        .set(as('prescriber'))
        .send({ ...ORDER, patientId: order.patientId })
        .expect(409);
      expect(again.body).toMatchObject({ currentStatus: 'superseded' });
    });

    it('rejects with a reason, and an ended order cannot be cancelled (409)', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await act(order.id, 'reject', { reason: 'Patient has an epidural running instead' }).expect(200);
      await waitForMail(t.http, tokens.admin, (m) => m.subject === `PCA order ${order.id} rejected`);
      await act(order.id, 'cancel', { reason: 'No longer needed for this patient' }, 'prescriber').expect(409);
    });

    it('lets the prescriber cancel before the PCA starts, with a reason', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await act(order.id, 'cancel', { reason: 'Changed to oral analgesia' }, 'pharmacist').expect(403);
      const cancelled = await act(order.id, 'cancel', { reason: 'Changed to oral analgesia' }, 'prescriber').expect(200);
      expect(cancelled.body.status).toBe('cancelled');
    });

    it('lists orders by ward and status, and the prescriber’s own', async () => {
      const queue = await request(t.http).get('/api/orders?wardId=1&status=awaiting_verification').set(as('pharmacist')).expect(200);
      expect(queue.body.length).toBeGreaterThan(0);
      expect(queue.body.every((o: { status: string; wardId: number }) => o.status === 'awaiting_verification' && o.wardId === 1)).toBe(
        true,
      );
      const mine = await request(t.http).get('/api/orders?mine=true').set(as('prescriber')).expect(200);
      expect(mine.body.every((o: { prescriberName: string }) => o.prescriberName === 'Dr Amara Osei')).toBe(true);
      await request(t.http).get('/api/orders?status=finished').set(as('pharmacist')).expect(400);
    });
  });

  describe('one open PCA per patient', () => {
    const pcaTokens = () => ({ prescriber: tokens.prescriber, pharmacist: tokens.pharmacist, nurse: tokens.nurse });
    const auditCount = async () =>
      (await request(t.http).get('/api/audit?limit=1').set(as('admin')).expect(200)).body.events[0].id as number;

    /** Signs `body` and expects the 409 naming the open order, with nothing written. */
    async function expectRefused(body: object, openOrderId: number, status: string, whatToDo: string): Promise<void> {
      const [orders, audit] = [await orderCount(), await auditCount()];
      const refused = await sign(body).expect(409);
      expect(refused.body).toEqual({
        statusCode: 409,
        message: `This patient already has an open PCA (order ${openOrderId}, morphine 1 mg/mL, ${status}): ${whatToDo}`,
        openOrderId,
      });
      expect(await orderCount()).toBe(orders);
      expect(await auditCount()).toBe(audit);
    }

    it('refuses a second PCA while one awaits verification: 409 naming it and what to do, nothing written', async () => {
      // The demo's order 1 for patient 1 awaits verification.
      await expectRefused(ORDER, 1, 'awaiting verification', 'cancel it, or revise it once pharmacy returns it, before ordering another');
    });

    it('refuses a second PCA while one is verified, and while one runs', async () => {
      const verified = await sign(await forNewPatient(ORDER)).expect(201);
      await act(verified.body.id, 'verify', { signature: { password: DEMO_PASSWORD } }).expect(200);
      const second = { ...ORDER, patientId: verified.body.patientId, drugId: 2, demandDose: 0.2, fourHourLimit: 4 };
      await expectRefused(second, verified.body.id, 'verified', 'cancel it before ordering another');

      const running = await activeOrder(t.http, pcaTokens(), await t.addPatient());
      await expectRefused(
        { ...ORDER, patientId: running.patient.id },
        running.id,
        'active',
        'discontinue it at the bedside before ordering another',
      );
    });

    it('signs a new PCA once the open one is cancelled', async () => {
      const first = await sign(await forNewPatient(ORDER)).expect(201);
      await sign({ ...ORDER, patientId: first.body.patientId }).expect(409);
      await act(first.body.id, 'cancel', { reason: 'Changed to a different regimen' }, 'prescriber').expect(200);
      const next = await sign({ ...ORDER, patientId: first.body.patientId, demandDose: 1.5 }).expect(201);
      expect(next.body).toMatchObject({ status: 'awaiting_verification', version: 1, supersedesId: null });
    });

    it('does not refuse the revision of a returned order, which replaces it', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await act(order.id, 'return', { reason: 'Please confirm the 4-hour limit with the pain team' }).expect(200);
      const revised = await request(t.http)
        .post(`/api/orders/${order.id}/revise`)
        .set(as('prescriber'))
        .send({ ...ORDER, patientId: order.patientId, fourHourLimit: 25 })
        .expect(201);
      expect(revised.body).toMatchObject({ supersedesId: order.id, status: 'awaiting_verification' });
    });

    it('shows the refusal in the live check as a hard finding on the patient, and not for a patient with nothing open', async () => {
      const preview = (body: object) => request(t.http).post('/api/orders/preview').set(as('prescriber')).send(body).expect(200);
      const { body } = await preview(REGIMEN);
      expect(body.findings[0]).toEqual({
        field: 'patientId',
        severity: 'hard',
        code: 'duplicate.open-pca',
        message: expect.stringMatching(/^This patient already has an open PCA \(order 1, morphine 1 mg\/mL, awaiting verification\)/),
      });
      const { body: free } = await preview(await forNewPatient(REGIMEN));
      expect(free.findings.map((finding: { code: string }) => finding.code)).not.toContain('duplicate.open-pca');
    });
  });

  describe('syringe release', () => {
    it('releases a syringe with a readable code for a verified order and tells the nurse in charge', async () => {
      const { body: order } = await sign(await forNewPatient(ORDER)).expect(201);
      await request(t.http).post(`/api/orders/${order.id}/releases`).set(as('pharmacist')).send(RELEASE).expect(409);
      await act(order.id, 'verify', { signature: { password: DEMO_PASSWORD } }).expect(200);
      await request(t.http).post(`/api/orders/${order.id}/releases`).set(as('nurse')).send(RELEASE).expect(403);

      const wrong = await request(t.http)
        .post(`/api/orders/${order.id}/releases`)
        .set(as('pharmacist'))
        .send({ ...RELEASE, concentrationPerMl: 2, volumeMl: 70, expiresAt: '2020-01-01T00:00:00Z' })
        .expect(400);
      expect(wrong.body.errors.map((e: { field: string }) => e.field)).toEqual(['concentrationPerMl', 'overrideReason', 'expiresAt']);

      const released = await request(t.http).post(`/api/orders/${order.id}/releases`).set(as('pharmacist')).send(RELEASE).expect(201);
      expect(released.body).toMatchObject({ status: 'ready', volumeMl: 50, totalAmount: 50, doseUnit: 'mg', releasedByName: 'Lin Park' });
      expect(released.body.releaseCode).toMatch(/^[234679ACDEFGHJKMNPQRTUVWXYZ]{3}-[234679ACDEFGHJKMNPQRTUVWXYZ]{3}$/);
      const unusual = await request(t.http)
        .post(`/api/orders/${order.id}/releases`)
        .set(as('pharmacist'))
        .send({
          ...RELEASE,
          volumeMl: 100,
          overrideReason: 'Only 100 mL syringes in stock tonight',
          secondSyringeReason: 'Spare for the night shift',
        })
        .expect(201);
      expect(unusual.body.releaseCode).not.toBe(released.body.releaseCode);

      const mail = await waitForMail(t.http, tokens.admin, (m) => m.text.includes(released.body.releaseCode));
      expect(mail.to).toBe('nurse-in-charge.harbour@kestrelbay.example');
      const detail = await request(t.http).get(`/api/orders/${order.id}`).set(as('nurse')).expect(200);
      expect(detail.body.releases).toHaveLength(2);
    });
  });

  it('keeps the mailbox for the admin only', async () => {
    await request(t.http).get('/api/dev/mailbox').set(as('nurse')).expect(403);
    await request(t.http).get('/api/dev/mailbox').set(as('admin')).expect(200);
  });
});
