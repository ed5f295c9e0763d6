import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REGIMEN as ASHP_MORPHINE } from './support/pca.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];

// Demo ids (seed order): patient 1 is an adult on Harbour, patient 9 a 24.5 kg child on Wren;
// drug 1 morphine (mg), drug 3 fentanyl (mcg). The limits they meet are the demo library's.
// ASHP_MORPHINE is support/pca.ts's regimen: ASHP Standardize 4 Safety, PCA standards (2023),
// morphine 1 mg/mL, demand 1 mg, lockout 10 min.

describe('POST /api/orders/preview', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const preview = (body: object, role: Role = 'prescriber') =>
    request(t.http)
      .post('/api/orders/preview')
      .set({ Authorization: `Bearer ${tokens[role]}` })
      .send(body);

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
  });
  afterAll(() => t.close());

  it.each(ROLES)('as %s, previews the ASHP starting regimen with no findings', async (role) => {
    const response = await preview(ASHP_MORPHINE, role).expect(200);
    expect(response.body.findings).toEqual([]);
    expect(response.body.derived).toEqual({
      demandDoseMl: 1,
      basalRateMlPerHour: 0,
      maxDemandsPerHour: 6,
      maxHourlyDose: 6,
      maxFourHourDose: 24,
    });
    expect(response.body.rule).toMatchObject({ drugName: 'morphine', concentrationPerMl: 1, perKg: false });
  });

  it('answers 401 without a token', async () => {
    await request(t.http).post('/api/orders/preview').send(ASHP_MORPHINE).expect(401);
  });

  it('finds a soft value and asks for a reason (soft), without blocking', async () => {
    const response = await preview({ ...ASHP_MORPHINE, demandDose: 2.5 }).expect(200);
    expect(response.body.findings).toEqual([
      { field: 'demandDose', severity: 'soft', code: 'limit.soft-high', message: expect.stringContaining('2.5 mg') },
    ]);
  });

  it('finds a missed decimal point as a hard finding', async () => {
    const response = await preview({ ...ASHP_MORPHINE, demandDose: 10 }).expect(200);
    expect(response.body.findings).toEqual([
      { field: 'demandDose', severity: 'hard', code: 'limit.hard-high', message: expect.stringContaining('10 mg') },
    ]);
  });

  it('checks a paediatric order per kg', async () => {
    // 0.5 mg for 24.5 kg is about 0.0204 mg/kg: over the demo soft maximum 0.02 mg/kg, which is
    // the top of the 10–20 mcg/kg bolus range (Association of Paediatric Anaesthetists of Great
    // Britain and Ireland, Good Practice in Postoperative and Procedural Pain Management).
    const response = await preview({ ...ASHP_MORPHINE, patientId: 9, demandDose: 0.5, fourHourLimit: null }).expect(200);
    expect(response.body.findings.map((f: { field: string; severity: string }) => [f.field, f.severity])).toEqual([['demandDose', 'soft']]);
    expect(response.body.findings[0].message).toContain('mg/kg');
    const fine = await preview({ ...ASHP_MORPHINE, patientId: 9, demandDose: 0.4, fourHourLimit: null }).expect(200);
    expect(fine.body.findings).toEqual([]);
  });

  it('gives a hard finding on the concentration when the ward library has no rule for it', async () => {
    const response = await preview({ ...ASHP_MORPHINE, concentrationPerMl: 2 }).expect(200);
    expect(response.body.rule).toBeNull();
    expect(response.body.findings[0]).toMatchObject({ field: 'concentrationPerMl', severity: 'hard', code: 'library.no-rule' });
  });

  it('adds the cautions of the patient: basal in an opioid-naive patient, sleep apnoea, age 70 and over', async () => {
    // Patient 2: born 1951, sleep apnoea, opioid-naive. Basal rates only for opioid-tolerant
    // patients (ASHP Standardize 4 Safety, PCA standards, 2023).
    const response = await preview({ ...ASHP_MORPHINE, patientId: 2, basalRatePerHour: 0.5 }).expect(200);
    const cautions = response.body.findings.filter((f: { severity: string }) => f.severity === 'caution');
    expect(cautions.length).toBeGreaterThanOrEqual(3);
  });

  it.each([
    [{ ...ASHP_MORPHINE, lockoutMinutes: 0 }, 'lockoutMinutes', 'Lockout must be at least 1 minute'],
    [{ ...ASHP_MORPHINE, demandDose: undefined }, 'demandDose', 'Enter the demand dose'],
    [{ ...ASHP_MORPHINE, demandDose: '1' }, 'demandDose', 'Demand dose must be a number'],
    [{ ...ASHP_MORPHINE, doseUnit: 'ug' }, 'doseUnit', 'Dose unit must be mg or mcg'],
    [{ ...ASHP_MORPHINE, basalRatePerHour: -1 }, 'basalRatePerHour', 'Basal rate cannot be negative (enter 0 for none)'],
    [{ ...ASHP_MORPHINE, patientId: 999 }, 'patientId', 'No patient with id 999'],
  ])('answers bad input with 400 naming the field (%#)', async (body, field, message) => {
    const response = await preview(body).expect(400);
    expect(response.body.errors).toContainEqual({ field, message });
  });
});
