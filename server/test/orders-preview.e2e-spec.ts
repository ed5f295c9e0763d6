import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REGIMEN as STARTING_MORPHINE } from './support/pca.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

type Role = keyof typeof DEMO_USER_BY_ROLE;
const ROLES = Object.keys(DEMO_USER_BY_ROLE) as Role[];

// Demo ids (seed order): patient 1 is an adult on Harbour, patient 9 a 24.5 kg child on Wren;
// drug 1 morphine (mg), drug 3 fentanyl (mcg). The limits they meet are the demo library's.
// STARTING_MORPHINE is support/pca.ts's regimen: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory],
// morphine 1 mg/mL, demand 1 mg, lockout 10 min. Patient 1 has the demo's order awaiting
// verification, which the preview reports as a second PCA (orders.e2e-spec.ts), so the tests of
// the regimen alone preview it for a copy of patient 1 with nothing open (TestApp.addPatient).

describe('POST /api/orders/preview', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let regimen: typeof STARTING_MORPHINE;
  const preview = (body: object, role: Role = 'prescriber') =>
    request(t.http)
      .post('/api/orders/preview')
      .set({ Authorization: `Bearer ${tokens[role]}` })
      .send(body);

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ROLES) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);
    regimen = { ...STARTING_MORPHINE, patientId: (await t.addPatient()).id };
  });
  afterAll(() => t.close());

  it.each(ROLES)('as %s, previews the common starting regimen with no findings', async (role) => {
    const response = await preview(regimen, role).expect(200);
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
    await request(t.http).post('/api/orders/preview').send(STARTING_MORPHINE).expect(401);
  });

  it('finds a soft value and asks for a reason (soft), without blocking', async () => {
    // The 1-hour limit holds the 15 mg an hour 2.5 mg every 10 minutes could give to the 10 mg soft maximum.
    const response = await preview({ ...regimen, demandDose: 2.5, oneHourLimit: 10 }).expect(200);
    expect(response.body.findings).toEqual([
      { field: 'demandDose', severity: 'soft', code: 'limit.soft-high', message: expect.stringContaining('2.5 mg') },
    ]);
  });

  it('finds a missed decimal point as a hard finding', async () => {
    const response = await preview({ ...regimen, demandDose: 10 }).expect(200);
    expect(response.body.findings).toEqual([
      { field: 'demandDose', severity: 'hard', code: 'limit.hard-high', message: expect.stringContaining('10 mg') },
      // 10 mg every 10 minutes could give 60 mg an hour, held to the 4-hour limit of 30 mg: still
      // over the demo rule's 15 mg hard maximum an hour.
      {
        field: 'oneHourLimit',
        severity: 'hard',
        code: 'possible.one-hour.hard-high',
        message: expect.stringContaining('could give up to 30 mg in an hour'),
      },
    ]);
  });

  describe('what the pump could give, against the rule, whether or not the order states limits', () => {
    // Patient 7 (KB101590) is an adult on Cedar with no PCA; Cedar's demo morphine 1 mg/mL rule
    // (invented): 1-hour hard maximum 15 mg, 4-hour hard maximum 40 mg. Arithmetic on the
    // definitions in docs/design.md: 2 mg × ceil(60 ÷ 6) = 20 mg; 2 mg × ceil(240 ÷ 6) = 80 mg.
    const cedar = { ...STARTING_MORPHINE, patientId: 7, demandDose: 2, lockoutMinutes: 6, oneHourLimit: null, fourHourLimit: null };
    const possible = (findings: { code: string; field: string; severity: string }[]) =>
      findings.filter((f) => f.code.startsWith('possible.')).map((f) => [f.field, f.severity]);

    it('blocks Cedar demand 2 mg every 6 min with both limit fields empty: 20 mg an hour, 80 mg in 4 hours', async () => {
      const response = await preview(cedar).expect(200);
      expect(response.body.findings).toEqual([
        {
          field: 'oneHourLimit',
          severity: 'hard',
          code: 'possible.one-hour.hard-high',
          message: 'The pump could give up to 20 mg in an hour (demand 2 mg every 6 min): above the hard maximum of 15 mg an hour',
        },
        {
          field: 'fourHourLimit',
          severity: 'hard',
          code: 'possible.four-hour.hard-high',
          message: 'The pump could give up to 80 mg in 4 hours (demand 2 mg every 6 min): above the hard maximum of 40 mg in 4 hours',
        },
      ]);
      expect(response.body.derived).toMatchObject({ maxHourlyDose: 20, maxFourHourDose: 80 });
    });

    it("counts the loading dose and a clinician bolus, and the order's own limits hold the figures", async () => {
      // 1 mg every 10 min: 6 mg an hour; + 4 mg loading + 2 mg bolus = 12 mg in the first hour (soft 10 mg).
      const response = await preview({ ...cedar, demandDose: 1, lockoutMinutes: 10, loadingDose: 4, clinicianBolusDose: 2 }).expect(200);
      expect(possible(response.body.findings)).toEqual([['oneHourLimit', 'soft']]);
      expect(response.body.findings[0].message).toContain('in the first hour (loading dose 4 mg');
      // The 4-hour limit of 12 mg also holds any hour: 20 mg an hour becomes 12 mg.
      const held = await preview({ ...cedar, fourHourLimit: 12 }).expect(200);
      expect(possible(held.body.findings)).toEqual([['oneHourLimit', 'soft']]);
      expect(held.body.derived).toMatchObject({ maxHourlyDose: 12, maxFourHourDose: 12 });
    });

    it('refuses limits that contradict each other, and an order that gives nothing', async () => {
      const codes = async (body: object) => (await preview(body).expect(200)).body.findings.map((f: { code: string }) => f.code);
      expect(await codes({ ...cedar, demandDose: 1, lockoutMinutes: 10, oneHourLimit: 8, fourHourLimit: 6 })).toContain(
        'consistency.four-hour-limit-below-one-hour-limit',
      );
      expect(await codes({ ...cedar, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 1, fourHourLimit: 4.5 })).toContain(
        'consistency.four-hour-limit-below-basal-and-demand',
      );
      expect(await codes({ ...cedar, demandDose: 0, basalRatePerHour: 0 })).toContain('consistency.nothing-to-give');
    });

    it('blocks the Wren 24.5 kg child whose possible 4-hour dose is 11.76 mg against 0.4 mg/kg (9.8 mg)', async () => {
      // Patient 9 (24.5 kg) on Wren, per-kg demo rule (invented): 4-hour hard maximum 0.4 mg/kg.
      // 0.49 mg (0.02 mg/kg, the top of the 10–20 mcg/kg bolus range of the Association of
      // Paediatric Anaesthetists of Great Britain and Ireland, Good Practice in Postoperative and
      // Procedural Pain Management) × ceil(240 ÷ 10) = 11.76 mg = 0.48 mg/kg.
      const response = await preview({ ...STARTING_MORPHINE, patientId: 9, demandDose: 0.49, fourHourLimit: null }).expect(200);
      const fourHour = response.body.findings.find((f: { code: string }) => f.code === 'possible.four-hour.hard-high');
      expect(fourHour).toMatchObject({ field: 'fourHourLimit', severity: 'hard' });
      expect(fourHour.message).toContain('11.76 mg (0.48 mg/kg for 24.5 kg) in 4 hours');
      expect(fourHour.message).toContain('hard maximum of 0.4 mg/kg (9.8 mg for this weight)');
    });
  });

  it('checks a paediatric order per kg', async () => {
    // 0.5 mg for 24.5 kg is about 0.0204 mg/kg: over the demo soft maximum 0.02 mg/kg, which is
    // the top of the 10–20 mcg/kg bolus range (Association of Paediatric Anaesthetists of Great
    // Britain and Ireland, Good Practice in Postoperative and Procedural Pain Management).
    // The order's 1-hour limit 2.45 mg (0.1 mg/kg) and 4-hour limit 7.35 mg (0.3 mg/kg) hold what
    // the pump could give to the demo rule's soft maxima, so only the demand dose is compared here.
    const child = { ...STARTING_MORPHINE, patientId: 9, oneHourLimit: 2.45, fourHourLimit: 7.35 };
    const regimenFindings = (findings: { field: string; severity: string; code: string }[]) =>
      findings.filter((f) => f.code.startsWith('limit.') || f.code.startsWith('possible.'));
    const response = await preview({ ...child, demandDose: 0.5 }).expect(200);
    const found = regimenFindings(response.body.findings);
    expect(found.map((f) => [f.field, f.severity])).toEqual([['demandDose', 'soft']]);
    expect(response.body.findings.find((f: { field: string }) => f.field === 'demandDose').message).toContain('mg/kg');
    const fine = await preview({ ...child, demandDose: 0.4 }).expect(200);
    expect(regimenFindings(fine.body.findings)).toEqual([]);
  });

  it('gives a hard finding on the concentration when the ward library has no rule for it', async () => {
    const response = await preview({ ...regimen, concentrationPerMl: 2 }).expect(200);
    expect(response.body.rule).toBeNull();
    expect(response.body.findings[0]).toMatchObject({ field: 'concentrationPerMl', severity: 'hard', code: 'library.no-rule' });
  });

  it('adds the risks of the patient: a basal rate in an opioid-naive adult needs a reason; sleep apnoea and age 65 and over are cautions', async () => {
    // Patient 2: born 1951, sleep apnoea, opioid-naive. Chou R et al., Management of Postoperative
    // Pain, APS/ASRA/ASA guideline, J Pain 2016;17(2):131-157: no routine basal infusion in
    // opioid-naive adults; age and a basal rate together also need a reason (risk factors of The
    // Joint Commission Sentinel Event Alert 49, 2012; a reason for the combination is common practice).
    const response = await preview({ ...STARTING_MORPHINE, patientId: 2, basalRatePerHour: 0.5 }).expect(200);
    const codes = response.body.findings.map(
      (f: { field: string; severity: string; code: string }) => `${f.field}:${f.severity}:${f.code}`,
    );
    expect(codes).toEqual(
      expect.arrayContaining([
        'basalRatePerHour:soft:risk.basal-opioid-naive',
        'basalRatePerHour:soft:risk.older-with-basal',
        'patient:caution:caution.sleep-apnoea',
        'patient:caution:caution.age-65-or-over',
      ]),
    );
  });

  it.each([
    [{ ...STARTING_MORPHINE, lockoutMinutes: 0 }, 'lockoutMinutes', 'Lockout must be at least 1 minute'],
    [{ ...STARTING_MORPHINE, demandDose: undefined }, 'demandDose', 'Enter the demand dose'],
    [{ ...STARTING_MORPHINE, demandDose: '1' }, 'demandDose', 'Demand dose must be a number'],
    [{ ...STARTING_MORPHINE, doseUnit: 'ug' }, 'doseUnit', 'Dose unit must be mg or mcg'],
    [{ ...STARTING_MORPHINE, basalRatePerHour: -1 }, 'basalRatePerHour', 'Basal rate cannot be negative (enter 0 for none)'],
    [{ ...STARTING_MORPHINE, patientId: 999 }, 'patientId', 'No patient with id 999'],
  ])('answers bad input with 400 naming the field (%#)', async (body, field, message) => {
    const response = await preview(body).expect(400);
    expect(response.body.errors).toContainEqual({ field, message });
  });
});
