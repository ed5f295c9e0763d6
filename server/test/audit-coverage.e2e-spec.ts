import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditAction, AuditPage } from '@lockstep/shared';
import { type AnswerCheck, answerChecker } from './support/answer-checker.js';
import { appRoutes, routeKey } from './support/app-routes.js';
import { ORDER, RELEASE, ROSA, SETTINGS } from './support/pca.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

/** Writes that change nothing: signing in, and the order check a prescriber runs while typing. */
const NOT_STATE_CHANGING = new Set(['POST /api/auth/login', 'POST /api/orders/preview']);
const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const CSV = [
  'drug,concentration_per_ml,dose_unit,per_kg,parameter,hard_min,soft_min,soft_max,hard_max',
  'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3',
  'morphine,1,mg,no,lockout_minutes,5,6,15,30',
].join('\n');

/**
 * Every state-changing route, called for real once, must leave exactly the audit event it owes;
 * and a write route the app has but this walk does not call fails the test.
 */
describe('every state-changing route writes its audit event', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const exercised = new Set<string>();
  let checkAnswer: AnswerCheck;

  beforeAll(async () => {
    t = await createTestApp();
    for (const [role, username] of Object.entries(DEMO_USER_BY_ROLE)) tokens[role] = await t.tokenFor(username);
    tokens.secondPharmacist = await t.tokenFor('tomas.ortiz');
    checkAnswer = (await answerChecker(t.http)).check;
  });
  afterAll(() => t.close());

  const latestEvent = async () =>
    ((await request(t.http).get('/api/audit?limit=1').set('Authorization', `Bearer ${tokens.admin}`).expect(200)).body as AuditPage)
      .events[0];

  /** Calls the route, checks its status, and that the newest audit event is the one expected. */
  async function step(
    method: 'post' | 'put' | 'patch' | 'delete',
    route: string,
    url: string,
    as: string,
    body: object | undefined,
    status: number,
    action: AuditAction,
  ) {
    const before = await latestEvent();
    const response = await request(t.http)[method](url).set('Authorization', `Bearer ${tokens[as]}`).send(body);
    expect(response.status, `${method} ${url}: ${JSON.stringify(response.body)}`).toBe(status);
    // Each write answer fits its schema in the API document (written from the shared zod schemas).
    expect(checkAnswer(method, route, status, response.body)).toBeNull();
    const after = await latestEvent();
    expect(after.id, `${method} ${url} wrote no audit event`).toBeGreaterThan(before?.id ?? 0);
    expect(after.action).toBe(action);
    exercised.add(routeKey(method, route));
    return response.body;
  }

  it('walks every write route of the app', async () => {
    const user = await step(
      'post',
      '/api/users',
      '/api/users',
      'admin',
      { username: 'ada.voss', displayName: 'Ada Voss', role: 'nurse', wardIds: [1], password: 'a-long-password-1' },
      201,
      'user.create',
    );
    await step('patch', '/api/users/:id', `/api/users/${user.id}`, 'admin', { displayName: 'Ada Voss-Lee' }, 200, 'user.update');
    await step(
      'patch',
      '/api/wards/:id/policy',
      '/api/wards/1/policy',
      'admin',
      { pharmacyEmail: 'pharmacy.audit@kestrelbay.example' },
      200,
      'ward.policy-update',
    );
    // A clinical setting: the admin proposes, a charge nurse signs off (the ward's policy event), or a pharmacist declines.
    const signed = { signature: { password: DEMO_PASSWORD } };
    const proposal = { ...signed, changes: { respiratoryRateThreshold: 10 }, reason: 'Flag slow breathing a little earlier' };
    const applied = await step(
      'post',
      '/api/wards/:id/policy-changes',
      '/api/wards/1/policy-changes',
      'admin',
      proposal,
      201,
      'ward.policy-change-propose',
    );
    await step(
      'post',
      '/api/wards/policy-changes/:id/sign-off',
      `/api/wards/policy-changes/${applied.id}/sign-off`,
      'charge_nurse',
      signed,
      200,
      'ward.policy-update',
    );
    const declined = await step(
      'post',
      '/api/wards/:id/policy-changes',
      '/api/wards/1/policy-changes',
      'admin',
      { ...proposal, changes: { spo2Threshold: 94 } },
      201,
      'ward.policy-change-propose',
    );
    await step(
      'post',
      '/api/wards/policy-changes/:id/decline',
      `/api/wards/policy-changes/${declined.id}/decline`,
      'pharmacist',
      { ...signed, reason: 'Too many flags for this ward at 94 %' },
      200,
      'ward.policy-change-decline',
    );
    // Pharmacy's equianalgesic table: hydromorphone after American Family Physician 2000;61(3):755.
    await step(
      'put',
      '/api/equianalgesic-factors/:drugId/:route',
      '/api/equianalgesic-factors/2/parenteral',
      'pharmacist',
      { amount: 1.5, unit: 'mg', source: 'American Family Physician 2000;61(3):755', signature: { password: DEMO_PASSWORD } },
      200,
      'equianalgesic-factor.update',
    );

    // One order from signature to a second syringe. A patient may have only one open PCA and the
    // demo's patients 1, 3 and 4 have one, so each order in this walk is for a new patient.
    const patient = await t.addPatient();
    const order = await step('post', '/api/orders', '/api/orders', 'prescriber', { ...ORDER, patientId: patient.id }, 201, 'order.create');
    const base = `/api/orders/${order.id}`;
    await step(
      'post',
      '/api/orders/:id/verify',
      `${base}/verify`,
      'pharmacist',
      { signature: { password: DEMO_PASSWORD } },
      200,
      'order.verify',
    );
    const first = await step('post', '/api/orders/:id/releases', `${base}/releases`, 'pharmacist', RELEASE, 201, 'order.release');
    const check = await step(
      'post',
      '/api/orders/:id/bedside-checks',
      `${base}/bedside-checks`,
      'nurse',
      { ...patient.identity, releaseCode: first.releaseCode, settings: SETTINGS },
      201,
      'order.bedside-first-check',
    );
    await step(
      'post',
      '/api/orders/:id/bedside-checks/:id/second',
      `${base}/bedside-checks/${check.id}/second`,
      'nurse',
      { ...ROSA, settings: SETTINGS },
      200,
      'order.bedside-second-check',
    );
    const observation = await step(
      'post',
      '/api/orders/:id/observations',
      `${base}/observations`,
      'nurse',
      {
        painScore: 3,
        // Sedation 2: a bolus follows, and none is given after sedation 3 (shared bolusSafetyRefusal).
        sedationLevel: '2',
        respiratoryRate: 12,
        spo2: 96,
        oxygenLitresPerMinute: 0,
        attempts: 2,
        delivered: 2,
        volumeInfusedMl: 2,
        syringeRemainingMl: 48,
      },
      201,
      'order.observation',
    );
    await step(
      'post',
      '/api/flags/:id/acknowledge',
      `/api/flags/${observation.flags[0].id}/acknowledge`,
      'nurse',
      { note: 'PCA paused, prescriber called' },
      200,
      'order.flag-acknowledge',
    );
    await step(
      'post',
      '/api/orders/:id/boluses',
      `${base}/boluses`,
      'nurse',
      { amount: 1, reason: 'Breakthrough pain on coughing', witness: ROSA },
      201,
      'order.bolus',
    );
    await step(
      'post',
      '/api/orders/:id/naloxone',
      `${base}/naloxone`,
      'nurse',
      { dose: 100, doseUnit: 'mcg', signature: { password: DEMO_PASSWORD } },
      201,
      'order.naloxone',
    );
    const resume = { reason: 'Rousable, RR 14: prescriber agreed', settings: SETTINGS, witness: { ...ROSA, settings: SETTINGS } };
    await step('post', '/api/orders/:id/resume', `${base}/resume`, 'nurse', resume, 200, 'order.resume');
    await step('post', '/api/orders/:id/pause', `${base}/pause`, 'nurse', { reason: 'Going to theatre' }, 200, 'order.pause');
    await step('post', '/api/orders/:id/resume', `${base}/resume`, 'nurse', resume, 200, 'order.resume');
    const { body: wardPatient } = await request(t.http)
      .get(`/api/patients/${patient.id}`)
      .set('Authorization', `Bearer ${tokens.nurse}`)
      .expect(200);
    // Handover confirms no PCA with an open urgent flag: acknowledge those the walk raised.
    const { body: beforeHandover } = await request(t.http).get(base).set('Authorization', `Bearer ${tokens.nurse}`).expect(200);
    for (const flag of beforeHandover.flags.filter(
      (f: { severity: string; acknowledgedAt: string | null }) => f.severity === 'urgent' && !f.acknowledgedAt,
    ))
      await request(t.http)
        .post(`/api/flags/${flag.id}/acknowledge`)
        .set('Authorization', `Bearer ${tokens.nurse}`)
        .send({ note: 'Reviewed with the prescriber' })
        .expect(200);
    await step(
      'post',
      '/api/wards/:id/handover/signoffs',
      `/api/wards/${wardPatient.wardId}/handover/signoffs`,
      'nurse',
      { orderId: order.id, role: 'outgoing', signature: { password: DEMO_PASSWORD } },
      201,
      'order.handover-signoff',
    );
    const second = await step(
      'post',
      '/api/orders/:id/releases',
      `${base}/releases`,
      'pharmacist',
      { ...RELEASE, secondSyringeReason: 'Replacement for the running syringe' },
      201,
      'order.release',
    );
    await step(
      'post',
      '/api/orders/:id/syringe-changes',
      `${base}/syringe-changes`,
      'nurse',
      { volumeInfusedMl: 46, wastedMl: 4, newReleaseCode: second.releaseCode, witness: ROSA },
      201,
      'order.syringe-change',
    );

    const recheck = await step(
      'post',
      '/api/orders/:id/bedside-checks',
      `${base}/bedside-checks`,
      'nurse',
      { ...patient.identity, releaseCode: second.releaseCode, settings: SETTINGS },
      201,
      'order.bedside-first-check',
    );
    await step(
      'post',
      '/api/orders/:id/bedside-checks/:id/second',
      `${base}/bedside-checks/${recheck.id}/second`,
      'nurse',
      { ...ROSA, settings: SETTINGS },
      200,
      'order.bedside-second-check',
    );
    await step(
      'post',
      '/api/orders/:id/discontinue',
      `${base}/discontinue`,
      'nurse',
      { reason: 'Pain controlled on oral analgesia', volumeInfusedMl: 10, wastedMl: 40, witness: ROSA },
      200,
      'order.discontinue',
    );

    const queriedFor = (await t.addPatient()).id;
    const queried = await step(
      'post',
      '/api/orders',
      '/api/orders',
      'prescriber',
      { ...ORDER, patientId: queriedFor },
      201,
      'order.create',
    );
    await step(
      'post',
      '/api/orders/:id/return',
      `/api/orders/${queried.id}/return`,
      'pharmacist',
      { reason: 'Please confirm the 4-hour limit' },
      200,
      'order.return',
    );
    await step(
      'post',
      '/api/orders/:id/revise',
      `/api/orders/${queried.id}/revise`,
      'prescriber',
      { ...ORDER, patientId: queriedFor, fourHourLimit: 25 },
      201,
      'order.revise',
    );
    const refused = await step(
      'post',
      '/api/orders',
      '/api/orders',
      'prescriber',
      { ...ORDER, patientId: (await t.addPatient()).id },
      201,
      'order.create',
    );
    await step(
      'post',
      '/api/orders/:id/reject',
      `/api/orders/${refused.id}/reject`,
      'pharmacist',
      { reason: 'Patient is not for a PCA' },
      200,
      'order.reject',
    );
    const unwanted = await step(
      'post',
      '/api/orders',
      '/api/orders',
      'prescriber',
      { ...ORDER, patientId: (await t.addPatient()).id },
      201,
      'order.create',
    );
    await step(
      'post',
      '/api/orders/:id/cancel',
      `/api/orders/${unwanted.id}/cancel`,
      'prescriber',
      { reason: 'Written for the wrong bed' },
      200,
      'order.cancel',
    );

    // The library: import a draft, edit, submit, withdraw, resubmit, send back, resubmit, approve; create and discard another.
    const beforeImport = await latestEvent();
    const imported = await request(t.http)
      .post('/api/library/import')
      .set('Authorization', `Bearer ${tokens.pharmacist}`)
      .field('wardId', '2')
      .attach('file', Buffer.from(CSV), { filename: 'cedar.csv', contentType: 'text/csv' })
      .expect(201);
    const importEvent = await latestEvent();
    expect(importEvent.id).toBeGreaterThan(beforeImport.id);
    expect(importEvent.action).toBe('library-version.import');
    exercised.add(routeKey('post', '/api/library/import'));
    const version = `/api/library/versions/${imported.body.id}`;
    const rules = imported.body.rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits }: Record<string, unknown>) => ({
      drugId,
      concentrationPerMl,
      doseUnit,
      perKg,
      limits,
    }));
    await step('put', '/api/library/versions/:id/rules', `${version}/rules`, 'pharmacist', { rules }, 200, 'library-version.rules-replace');
    await step('post', '/api/library/versions/:id/submit', `${version}/submit`, 'pharmacist', {}, 200, 'library-version.submit');
    await step(
      'post',
      '/api/library/versions/:id/withdraw',
      `${version}/withdraw`,
      'pharmacist',
      undefined,
      200,
      'library-version.withdraw',
    );
    await step('post', '/api/library/versions/:id/submit', `${version}/submit`, 'pharmacist', {}, 200, 'library-version.submit');
    // The reviewer sends it back with a comment, and the author submits again.
    await step(
      'post',
      '/api/library/versions/:id/send-back',
      `${version}/send-back`,
      'secondPharmacist',
      { signature: { password: DEMO_PASSWORD }, comment: 'Please check the lockout limits again' },
      200,
      'library-version.send-back',
    );
    const { submittedAt } = await step(
      'post',
      '/api/library/versions/:id/submit',
      `${version}/submit`,
      'pharmacist',
      {},
      200,
      'library-version.submit',
    );
    await step(
      'post',
      '/api/library/versions/:id/approve',
      `${version}/approve`,
      'secondPharmacist',
      { signature: { password: DEMO_PASSWORD }, submittedAt },
      200,
      'library-version.approve',
    );
    const draft = await step(
      'post',
      '/api/library/versions',
      '/api/library/versions',
      'pharmacist',
      { wardId: 3, note: 'Trial' },
      201,
      'library-version.create',
    );
    await step(
      'delete',
      '/api/library/versions/:id',
      `/api/library/versions/${draft.id}`,
      'pharmacist',
      undefined,
      204,
      'library-version.delete',
    );

    // The patient record: an allergy entry added (clearing "no known allergies") and removed, "no known allergies"
    // recorded again, the tolerance basis, a new weight.
    const withAllergy = await step(
      'post',
      '/api/patients/:id/allergies',
      '/api/patients/8/allergies',
      'prescriber',
      { substance: 'Chlorhexidine', reaction: 'hives', severity: 'allergy' },
      201,
      'patient.allergy-add',
    );
    const added = withAllergy.allergies.find((entry: { substance: string }) => entry.substance === 'Chlorhexidine');
    await step(
      'delete',
      '/api/patients/:id/allergies/:allergyId',
      `/api/patients/8/allergies/${added.id}`,
      'pharmacist',
      undefined,
      200,
      'patient.allergy-remove',
    );
    await step(
      'post',
      '/api/patients/:id/no-known-allergies',
      '/api/patients/8/no-known-allergies',
      'prescriber',
      undefined,
      200,
      'patient.no-known-allergies',
    );
    await step(
      'put',
      '/api/patients/:id/opioid-tolerance',
      '/api/patients/6/opioid-tolerance',
      'pharmacist',
      { opioidTolerant: true, oralMorphineMgPerDay: 90, days: 14 },
      200,
      'patient.tolerance-update',
    );
    await step(
      'put',
      '/api/patients/:id/spo2-scale',
      '/api/patients/6/spo2-scale',
      'prescriber',
      { spo2Scale: '2' },
      200,
      'patient.spo2-scale',
    );
    await step(
      'post',
      '/api/patients/:id/weights',
      '/api/patients/6/weights',
      'nurse',
      { weightKg: 87.5, measuredOn: new Date().toISOString().slice(0, 10) },
      201,
      'patient.weight-record',
    );

    // An admin clears the lock left by five wrong passwords.
    for (let attempt = 0; attempt < 5; attempt++)
      await request(t.http).post('/api/auth/login').send({ username: 'no.such.user', password: 'not-the-password' }).expect(401);
    await step(
      'delete',
      '/api/auth/lockouts/usernames/:username',
      '/api/auth/lockouts/usernames/no.such.user',
      'admin',
      undefined,
      204,
      'sign-in.unlock',
    );
    for (let attempt = 0; attempt < 5; attempt++)
      await request(t.http).post('/api/auth/login').send({ username: 'no.such.user', password: 'not-the-password' });
    await step(
      'delete',
      '/api/auth/lockouts/addresses/:address',
      '/api/auth/lockouts/addresses/127.0.0.1',
      'admin',
      undefined,
      204,
      'sign-in.unlock',
    );

    // Last: it ends the nurse's session.
    await step('post', '/api/auth/logout', '/api/auth/logout', 'nurse', undefined, 204, 'user.sign-out');

    const writeRoutes = appRoutes(t.app).filter((key) => WRITE_METHODS.has(key.split(' ')[0]) && !NOT_STATE_CHANGING.has(key));
    expect(
      writeRoutes.filter((key) => !exercised.has(key)),
      'write routes this walk does not call',
    ).toEqual([]);

    const verified = (await request(t.http).get('/api/audit/verify').set('Authorization', `Bearer ${tokens.admin}`).expect(200)).body;
    expect(verified).toMatchObject({ ok: true, firstBadId: null });
  });
});
