import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Patient } from '../src/patients/entities/patient.entity.js';
import { Ward } from '../src/wards/entities/ward.entity.js';
import { CALM_OBSERVATION as CALM, ORDER, SETTINGS } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// Breathing bands: Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017 (adults); for children,
// APLS normal ranges as published in Fleming et al., Lancet 2011;377:1011–1018 (web appendix, Web Box 1), and urgent
// rates from memory of APAGBI Good Practice in Postoperative and Procedural Pain Management (2012).
describe('observation vitals: NEWS2 bands, NEWS2 score, children’s bands', () => {
  let t: TestApp;
  const token = {} as Record<'amara' | 'lin' | 'kai', string>;
  const observe = (id: number, body: object) =>
    request(t.http)
      .post(`/api/orders/${id}/observations`)
      .set({ Authorization: `Bearer ${token.kai}` })
      .send(body);
  const start = async (patient?: Awaited<ReturnType<TestApp['addPatient']>>) =>
    activeOrder(
      t.http,
      { prescriber: token.amara, pharmacist: token.lin, nurse: token.kai },
      patient ?? (await t.addPatient()),
      ORDER,
      SETTINGS,
    );
  const codes = (body: { flags: { severity: string; code: string }[] }) =>
    body.flags.map((f) => `${f.severity}:${f.code}`).filter((c) => /respiratory|spo2|news2|heart/.test(c));

  beforeAll(async () => {
    t = await createTestApp();
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.kai = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  it('RR 8/min is urgent (NEWS2 scores 3, RCP 2017)', async () => {
    const order = await start();
    const { body } = await observe(order.id, { ...CALM, respiratoryRate: 8 }).expect(201);
    expect(codes(body)).toEqual(['urgent:respiratory-rate.low']);
  });

  it('RR 10/min is for review (NEWS2 scores 1, RCP 2017)', async () => {
    const order = await start();
    const { body } = await observe(order.id, { ...CALM, respiratoryRate: 10 }).expect(201);
    expect(codes(body)).toEqual(['review:respiratory-rate.review']);
  });

  it('SpO2 93 % on air is for review (NEWS2 scale 1 scores 2, RCP 2017)', async () => {
    const order = await start();
    const { body } = await observe(order.id, { ...CALM, spo2: 93, oxygenLitresPerMinute: 0 }).expect(201);
    expect(codes(body)).toEqual(['review:spo2.review']);
  });

  it('answers the NEWS2 score and its parameter scores for a full adult set, and stores the new fields', async () => {
    const order = await start();
    const full = {
      ...CALM,
      respiratoryRate: 22,
      spo2: 95,
      oxygenLitresPerMinute: 2,
      oxygenDevice: 'nasal-cannula',
      heartRate: 115,
      systolicBp: 105,
      temperatureC: 37.2,
      consciousness: 'alert',
    };
    const { body } = await observe(order.id, full).expect(201);
    // RR 22: 2; SpO2 95 scale 1: 1; oxygen: 2; SBP 105: 1; pulse 115: 2; alert 0; 37.2: 0 → 8 (RCP NEWS2 2017).
    expect(body.news2).toEqual({
      parameters: { respiration: 2, spo2: 1, airOrOxygen: 2, systolicBp: 1, pulse: 2, consciousness: 0, temperature: 0 },
      total: 8,
      response: 'high',
    });
    expect(codes(body)).toContain('urgent:news2.emergency');
    const list = await request(t.http)
      .get(`/api/orders/${order.id}/observations`)
      .set({ Authorization: `Bearer ${token.kai}` })
      .expect(200);
    expect(list.body.at(-1)).toMatchObject({ heartRate: 115, oxygenDevice: 'nasal-cannula', news2: { total: 8 }, news2NotScored: null });
    const partial = await observe(order.id, { ...CALM, attempts: 3 }).expect(201);
    expect(partial.body).toMatchObject({ news2: null, news2NotScored: expect.stringContaining('full set') });
  });

  it('SpO2 scale 2 is chosen per patient by a prescriber only, audited, and then 88 % raises nothing (RCP NEWS2 2017, Chart 1 scale 2)', async () => {
    const patient = await t.addPatient();
    const order = await start(patient);
    const put = (who: string, body: object) =>
      request(t.http)
        .put(`/api/patients/${patient.id}/spo2-scale`)
        .set({ Authorization: `Bearer ${who}` })
        .send(body);
    await put(token.kai, { spo2Scale: '2' }).expect(403);
    await put(token.lin, { spo2Scale: '2' }).expect(403);
    expect((await put(token.amara, { spo2Scale: '3' }).expect(400)).body.errors[0]).toEqual({
      field: 'spo2Scale',
      message: 'SpO2 scale is 1 or 2',
    });
    expect((await put(token.amara, { spo2Scale: '2' }).expect(200)).body.spo2Scale).toBe('2');
    const { body } = await observe(order.id, { ...CALM, spo2: 88, oxygenLitresPerMinute: 0 }).expect(201);
    expect(codes(body)).toEqual([]);
    const low = await observe(order.id, { ...CALM, attempts: 3, spo2: 83, oxygenLitresPerMinute: 0 }).expect(201);
    expect(codes(low.body)).toEqual(['urgent:spo2.low']);
  });

  it('requires the oxygen beside SpO2 (0 for air), a device when oxygen runs and none on air, naming the field', async () => {
    const order = await start();
    const { oxygenLitresPerMinute: _air, ...withoutOxygen } = CALM;
    const missing = await observe(order.id, withoutOxygen).expect(400);
    expect(missing.body.errors).toEqual([
      { field: 'oxygenLitresPerMinute', message: 'Record the oxygen: 0 for air, or litres per minute' },
    ]);
    await observe(order.id, { ...CALM, oxygenLitresPerMinute: null }).expect(400);
    const noDevice = await observe(order.id, { ...CALM, oxygenLitresPerMinute: 2 }).expect(400);
    expect(noDevice.body.errors).toEqual([{ field: 'oxygenDevice', message: 'Choose the oxygen device: oxygen is running at 2 L/min' }]);
    const deviceOnAir = await observe(order.id, { ...CALM, oxygenDevice: 'simple-mask' }).expect(400);
    expect(deviceOnAir.body.errors.map((e: { field: string }) => e.field)).toEqual(['oxygenDevice']);
    // Nothing was saved by the refusals.
    const list = await request(t.http)
      .get(`/api/orders/${order.id}/observations`)
      .set({ Authorization: `Bearer ${token.kai}` });
    expect(list.body).toEqual([]);
    await observe(order.id, { ...CALM, oxygenLitresPerMinute: 2, oxygenDevice: 'nasal-cannula' }).expect(201);
  });

  it.each([
    [{ heartRate: 301 }, 'heartRate'],
    [{ temperatureC: 50 }, 'temperatureC'],
    [{ oxygenLitresPerMinute: -1 }, 'oxygenLitresPerMinute'],
    [{ consciousness: 'asleep' }, 'consciousness'],
    [{ systolicBp: 'high' }, 'systolicBp'],
  ])('refuses a bad vital with 400 naming the field (%o)', async (change, field) => {
    const order = await start();
    const { body } = await observe(order.id, { ...CALM, ...change }).expect(400);
    expect(body.errors.map((e: { field: string }) => e.field)).toContain(field);
  });

  it('a child’s RR is judged by the paediatric band: 16/min in a 4-year-old is for review and NEWS2 is not scored', async () => {
    const patient = await t.addPatient();
    const order = await start(patient);
    // The patient becomes a 4-year-old: the bands are read at the observation.
    const fourYearsAgo = new Date(Date.now() - 4.5 * 365.25 * 86_400_000).toISOString().slice(0, 10);
    await t.app.get(DataSource).getRepository(Patient).update({ id: patient.id }, { dateOfBirth: fourYearsAgo });
    const { body } = await observe(order.id, {
      ...CALM,
      respiratoryRate: 16,
      heartRate: 110,
      systolicBp: 100,
      temperatureC: 36.8,
      consciousness: 'alert',
      oxygenLitresPerMinute: 0,
    }).expect(201);
    // APLS 2–5 years: normal RR 25–30 (Fleming et al. 2011, Web Box 1); below 15 urgent (APAGBI 2012, from memory).
    expect(codes(body)).toEqual(['review:respiratory-rate.review']);
    expect(body.news2).toBeNull();
    expect(body.news2NotScored).toMatch(/under 16/);
  });

  it('the ward’s population, not its weight-based dosing, brings the children’s bands: RR 12/min at 17 on a paediatric ward', async () => {
    const wards = t.app.get(DataSource).getRepository(Ward);
    const patient = await t.addPatient();
    const order = await start(patient);
    const seventeen = new Date(Date.now() - 17.5 * 365.25 * 86_400_000).toISOString().slice(0, 10);
    await t.app.get(DataSource).getRepository(Patient).update({ id: patient.id }, { dateOfBirth: seventeen });
    const { wardId } = await t.app.get(DataSource).getRepository(Patient).findOneByOrFail({ id: patient.id });
    // An adult ward: RR 12 scores 0 on NEWS2 (RCP 2017).
    expect(codes((await observe(order.id, { ...CALM, respiratoryRate: 12 }).expect(201)).body)).toEqual([]);
    await wards.update({ id: wardId }, { population: 'paediatric' });
    try {
      expect((await wards.findOneByOrFail({ id: wardId })).weightBasedDosing).toBe(false);
      // Over 12 years: normal RR 15–20 (APLS, as tabulated by Fleming et al., Lancet 2011) → review.
      const { body } = await observe(order.id, { ...CALM, attempts: 3, respiratoryRate: 12 }).expect(201);
      expect(codes(body)).toEqual(['review:respiratory-rate.review']);
    } finally {
      await wards.update({ id: wardId }, { population: 'adult' });
    }
  });
});
