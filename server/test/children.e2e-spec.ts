import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding, OrderFields } from '@lockstep/shared';
import { Patient } from '../src/patients/entities/patient.entity.js';
import { Ward } from '../src/wards/entities/ward.entity.js';
import { SIGNING } from './support/pca.js';
import { createTestApp, DEMO_PASSWORD, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';
import { changeWardPolicy } from './support/ward-policy-steps.js';

// Children get children's limits, chosen by the patient and not only the ward (docs/design.md,
// "Order fields and dosing conventions"; shared library/choose-rule.ts). Under 18 is a child:
// common practice (shared patients/adult-age.ts). The demo libraries are invented: Wren's morphine
// 1 mg/mL and fentanyl 10 mcg/mL rules are paediatric (1 to under 18 years, 10 kg and over) and per
// kg, with ceilings (morphine demand 1.5 mg, 1-hour 7.5 mg, 4-hour 25 mg); the adult wards have no
// paediatric rule, and no library has a paediatric hydromorphone rule. Weights are checked against
// the CDC 2000 weight-for-age reference (wtage.csv, National Center for Health Statistics), beyond
// ±3 z (common practice); Wren's weight may be 7 days old (ward policy default, common practice).

const MORPHINE = 1;
const HYDROMORPHONE = 2;
const DAY = 24 * 3600 * 1000;
const daysAgo = (days: number) => new Date(Date.now() - days * DAY).toISOString().slice(0, 10);
/** A date of birth `years` years and a month before today, so the age in whole years is `years`. */
const bornYearsAgo = (years: number) => {
  const date = new Date();
  date.setUTCFullYear(date.getUTCFullYear() - years);
  date.setUTCMonth(date.getUTCMonth() - 1);
  return date.toISOString().slice(0, 10);
};

type Child = { wardCode: string; years: number; sex: 'female' | 'male'; weightKg: number; weightMeasuredOn: string | null };

describe('children: rule by patient, ceilings, weight plausibility and age', () => {
  let t: TestApp;
  let prescriber: string;
  let admin: string;
  let count = 0;

  /** A new invented patient (a copy of patient 1's record) on the given ward with the given age, sex and weight. */
  async function addChild(child: Child): Promise<number> {
    return t.app.get(DataSource).transaction(async (manager) => {
      const ward = await manager.findOneByOrFail(Ward, { code: child.wardCode });
      const { id: _id, allergies: _allergies, ...twin } = await manager.findOneByOrFail(Patient, { id: 1 });
      count += 1;
      const patient = await manager.save(
        manager.create(Patient, {
          ...twin,
          mrn: `KC${String(count).padStart(6, '0')}`,
          givenName: 'Child',
          familyName: `Test ${count}`,
          bed: `C${count}`,
          wardId: ward.id,
          dateOfBirth: bornYearsAgo(child.years),
          sex: child.sex,
          weightKg: child.weightKg,
          weightMeasuredOn: child.weightMeasuredOn,
          opioidTolerant: false,
          sleepApnoea: false,
          otherSedatives: false,
        }),
      );
      return patient.id;
    });
  }

  const preview = (body: OrderFields) =>
    request(t.http)
      .post('/api/orders/preview')
      .set({ Authorization: `Bearer ${prescriber}` })
      .send(body)
      .expect(200);
  const sign = (body: object) =>
    request(t.http)
      .post('/api/orders')
      .set({ Authorization: `Bearer ${prescriber}` })
      .send(body);
  const codes = (findings: Finding[]) => findings.map((f) => [f.code, f.severity]);

  /** Morphine 1 mg/mL for a 24.5 kg child: 0.4 mg is 0.016 mg/kg; 6 an hour is 0.098 mg/kg; the 4-hour limit 7 mg is 0.29 mg/kg. */
  const childMorphine = (patientId: number): OrderFields => ({
    patientId,
    drugId: MORPHINE,
    concentrationPerMl: 1,
    doseUnit: 'mg',
    demandDose: 0.4,
    lockoutMinutes: 10,
    basalRatePerHour: 0,
    fourHourLimit: 7,
  });

  beforeAll(async () => {
    t = await createTestApp();
    prescriber = await t.tokenFor(DEMO_USER_BY_ROLE.prescriber);
    admin = await t.tokenFor(DEMO_USER_BY_ROLE.admin);
  });
  afterAll(() => t.close());

  it("gives a child on Wren Wren's paediatric per-kg rule, with no findings for a usual regimen", async () => {
    const id = await addChild({ wardCode: 'WRE', years: 8, sex: 'male', weightKg: 24.5, weightMeasuredOn: daysAgo(1) });
    const response = await preview(childMorphine(id));
    expect(response.body.rule).toMatchObject({
      drugName: 'morphine',
      perKg: true,
      population: 'paediatric',
      minAgeYears: 1,
      maxAgeYears: 18,
    });
    expect(response.body.findings).toEqual([]);
  });

  it("gives a child on an adult ward a children's ward's paediatric rule, never the adult limits, and says whose", async () => {
    const id = await addChild({ wardCode: 'CED', years: 8, sex: 'male', weightKg: 24.5, weightMeasuredOn: daysAgo(1) });
    const usual = await preview(childMorphine(id));
    expect(usual.body.rule).toMatchObject({ population: 'paediatric', perKg: true });
    expect(usual.body.findings).toEqual([
      {
        field: 'concentrationPerMl',
        severity: 'caution',
        code: 'library.other-ward',
        message: expect.stringContaining("the limits are Wren's (Paediatric, 1 to under 18 years, 10 kg and over)"),
      },
    ]);
    // 1 mg is an ordinary adult demand dose (Cedar's adult rule: hard maximum 3 mg) but 0.041 mg/kg
    // for this child, above the paediatric hard maximum of 0.03 mg/kg: blocked.
    const adultDose = await preview({ ...childMorphine(id), demandDose: 1, fourHourLimit: 7 });
    expect(adultDose.body.findings).toContainEqual(
      expect.objectContaining({ field: 'demandDose', severity: 'hard', code: 'limit.hard-high' }),
    );
  });

  it('blocks a child on an adult ward when no active library has a paediatric rule for the drug', async () => {
    const id = await addChild({ wardCode: 'CED', years: 8, sex: 'male', weightKg: 24.5, weightMeasuredOn: daysAgo(1) });
    const regimen: OrderFields = {
      ...childMorphine(id),
      drugId: HYDROMORPHONE,
      concentrationPerMl: 0.2,
      demandDose: 0.1,
      fourHourLimit: 2,
    };
    const response = await preview(regimen);
    expect(response.body.rule).toBeNull();
    expect(response.body.findings[0]).toMatchObject({ field: 'concentrationPerMl', severity: 'hard', code: 'library.no-rule' });
    expect(response.body.findings[0].message).toContain('a child (8 years, 24.5 kg)');
    const signing = await sign({ ...regimen, ...SIGNING }).expect(400);
    expect(signing.body.errors).toContainEqual(expect.objectContaining({ field: 'concentrationPerMl' }));
  });

  it("blocks a per-kg dose above the rule's absolute ceiling, however much the child weighs, in preview and signing", async () => {
    // A 15-year-old of 60 kg: 1.8 mg is 0.03 mg/kg, inside the per-kg hard maximum, above the 1.5 mg ceiling.
    const id = await addChild({ wardCode: 'WRE', years: 15, sex: 'female', weightKg: 60, weightMeasuredOn: daysAgo(0) });
    const regimen: OrderFields = { ...childMorphine(id), demandDose: 1.8, lockoutMinutes: 20, fourHourLimit: 17 };
    const response = await preview(regimen);
    expect(response.body.findings).toContainEqual({
      field: 'demandDose',
      severity: 'hard',
      code: 'limit.ceiling',
      message: "Demand dose 1.8 mg is above the rule's absolute ceiling 1.5 mg, whatever the weight",
    });
    const signing = await sign({ ...regimen, ...SIGNING }).expect(400);
    expect(signing.body.errors).toContainEqual({ field: 'demandDose', message: expect.stringContaining('absolute ceiling') });

    // An 80 kg 16-year-old: 1.5 mg every 10 minutes is 9 mg an hour, 0.11 mg/kg (inside the per-kg
    // hard maximum of 0.12 mg/kg) but above the 1-hour ceiling of 7.5 mg.
    const heavy = await addChild({ wardCode: 'WRE', years: 16, sex: 'male', weightKg: 80, weightMeasuredOn: daysAgo(0) });
    const hourly = await preview({ ...childMorphine(heavy), demandDose: 1.5, fourHourLimit: 24 });
    expect(hourly.body.findings).toContainEqual(
      expect.objectContaining({ field: 'oneHourLimit', severity: 'hard', code: 'possible.ceiling' }),
    );
  });

  it('asks to check a weight implausible for the age (a 7-year-old weighed in pounds) and signs only with a reason', async () => {
    // CDC 2000 wtage.csv, boys at 84.5 months: median 23.2 kg. 51 "kg" is 23 kg typed in pounds.
    const id = await addChild({ wardCode: 'WRE', years: 7, sex: 'male', weightKg: 51, weightMeasuredOn: daysAgo(0) });
    // 1 mg is 0.0196 mg/kg; 1-hour limit 5 mg (0.098 mg/kg), 4-hour limit 15 mg (0.29 mg/kg): inside every per-kg limit and ceiling.
    const regimen: OrderFields = { ...childMorphine(id), demandDose: 1, oneHourLimit: 5, fourHourLimit: 15 };
    const response = await preview(regimen);
    expect(codes(response.body.findings)).toEqual([['weight.implausible', 'soft']]);
    expect(response.body.findings[0].message).toMatch(/^Check the weight: 51 kg is unusual for a 7-year-old boy/);
    const unexplained = await sign({ ...regimen, ...SIGNING }).expect(400);
    expect(unexplained.body.errors).toEqual([{ field: 'weightKg', message: expect.stringContaining('Reason needed: Check the weight') }]);
    await sign({ ...regimen, ...SIGNING, overrides: [{ field: 'weightKg', reason: 'Weighed again on the ward scale: 51 kg' }] }).expect(
      201,
    );
  });

  it("cautions for a weight older than the ward's weightMaxAgeDays, and for one with no date", async () => {
    const old = await addChild({ wardCode: 'WRE', years: 8, sex: 'female', weightKg: 24.5, weightMeasuredOn: daysAgo(30) });
    const response = await preview(childMorphine(old));
    expect(response.body.findings).toEqual([
      {
        field: 'weightKg',
        severity: 'caution',
        code: 'weight.old',
        message: `The weight was measured 30 days ago (${daysAgo(30)}); this ward asks for one at most 7 days old: weigh the patient`,
      },
    ]);
    const undated = await addChild({ wardCode: 'WRE', years: 8, sex: 'female', weightKg: 24.5, weightMeasuredOn: null });
    expect(codes((await preview(childMorphine(undated))).body.findings)).toEqual([['weight.undated', 'caution']]);

    // The ward's own rule: an admin proposes 60 days on Wren, a pharmacist signs it off, and the 30-day-old weight passes.
    const wren = await t.app.get(DataSource).manager.findOneByOrFail(Ward, { code: 'WRE' });
    const approver = await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist);
    const change = await changeWardPolicy(t.http, { admin, approver }, wren.id, { weightMaxAgeDays: 60 });
    expect(change.settings).toEqual([{ field: 'weightMaxAgeDays', from: 7, to: 60 }]);
    expect((await preview(childMorphine(old))).body.findings).toEqual([]);
    await request(t.http)
      .post(`/api/wards/${wren.id}/policy-changes`)
      .set({ Authorization: `Bearer ${admin}` })
      .send({ changes: { weightMaxAgeDays: 0 }, reason: 'Any weight at all will do', signature: { password: DEMO_PASSWORD } })
      .expect(400);
  });

  it('refuses a per-kg rule without a ceiling, and a ceiling above the adult rule, naming the field', async () => {
    const pharmacist = await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist);
    const wren = await t.app.get(DataSource).manager.findOneByOrFail(Ward, { code: 'WRE' });
    const draft = await request(t.http)
      .post('/api/library/versions')
      .set({ Authorization: `Bearer ${pharmacist}` })
      .send({ wardId: wren.id, note: 'Children: ceilings' })
      .expect(201);
    const rule = {
      drugId: MORPHINE,
      concentrationPerMl: 1,
      doseUnit: 'mg',
      perKg: true,
      population: 'paediatric',
      minAgeYears: 1,
      maxAgeYears: 18,
      minWeightKg: 10,
      limits: { demandDose: { softMax: 0.02, hardMax: 0.03 } },
    };
    const put = (rules: object[]) =>
      request(t.http)
        .put(`/api/library/versions/${draft.body.id}/rules`)
        .set({ Authorization: `Bearer ${pharmacist}` })
        .send({ rules });
    const noCeiling = await put([rule]).expect(400);
    expect(noCeiling.body.errors).toEqual([
      {
        field: 'rules.0.limits.demandDose.ceiling',
        message: 'Demand dose: a per-kg rule needs an absolute ceiling in mg, whatever the weight',
      },
    ]);
    // Cedar's (and Harbour's, Summit's) active adult morphine rule: demand hard maximum 3 mg (demo, invented).
    const aboveAdult = await put([{ ...rule, limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 4 } } }]).expect(400);
    expect(aboveAdult.body.errors[0]).toMatchObject({
      field: 'rules.0.limits.demandDose.ceiling',
      message: expect.stringContaining('above the adult hard maximum 3 mg'),
    });
    const saved = await put([{ ...rule, limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 1.5 } } }]).expect(200);
    expect(saved.body.rules[0]).toMatchObject({
      population: 'paediatric',
      minWeightKg: 10,
      maxWeightKg: null,
      limits: { demandDose: { ceiling: 1.5 } },
    });
  });
});
