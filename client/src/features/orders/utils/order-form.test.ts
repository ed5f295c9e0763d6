import { describe, expect, it } from 'vitest';
import { patientFactorsOf, rulePopulationOf, type LimitRuleResponse, type OrderDetail, type Patient } from '@lockstep/shared';
import { emptyOrderForm, localFindings, nextDay, readAmount, readOrderForm, valuesFromOrder, type OrderFormValues } from './order-form';

// The demo Harbour morphine 1 mg/mL rule (invented demo values).
const morphine: LimitRuleResponse = {
  id: 4,
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  ...rulePopulationOf({}),
  limits: {
    demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 },
    lockoutMinutes: { hardMin: 5, softMin: 6, softMax: 15, hardMax: 30 },
  },
};

const noah: Patient = {
  id: 1,
  mrn: 'KB100231',
  givenName: 'Noah',
  familyName: 'Achterberg',
  dateOfBirth: '1968-03-14',
  sex: 'male',
  weightKg: 82,
  weightMeasuredOn: '2026-03-04',
  allergies: [],
  noKnownAllergies: true,
  opioidTolerant: false,
  toleranceOralMorphineMgPerDay: null,
  toleranceDays: null,
  spo2Scale: '1',
  sleepApnoea: false,
  otherSedatives: false,
  wardId: 1,
  wardName: 'Harbour',
  bed: 'H02',
};

const today = new Date(2026, 2, 5, 9, 30);
const context = { drug: { id: morphine.drugId, genericName: morphine.drugName }, today: '2026-03-05' };
const form = (changes: Partial<OrderFormValues>): OrderFormValues => ({
  ...emptyOrderForm(today),
  ruleId: '4',
  demandDose: '1',
  lockoutMinutes: '10',
  ...changes,
});

describe('reading the order form', () => {
  it('reads digits with one decimal point and nothing else', () => {
    expect(readAmount(' 2.5 ')).toBe(2.5);
    expect(readAmount('.5')).toBe(0.5);
    expect(readAmount('')).toBeNull();
    expect(readAmount('1,5')).toBeNaN();
    expect(readAmount('1.2.3')).toBeNaN();
    expect(readAmount('-1')).toBeNaN();
    expect(readAmount('1e3')).toBeNaN();
  });

  it('gives the API fields once a rule is chosen and every number reads', () => {
    const { fields, missing } = readOrderForm(form({ fourHourLimit: '30', indication: ' Pain after laparotomy ' }), morphine, 1);
    expect(missing).toEqual([]);
    expect(fields).toEqual({
      patientId: 1,
      drugId: 1,
      concentrationPerMl: 1,
      doseUnit: 'mg',
      loadingDose: null,
      demandDose: 1,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      oneHourLimit: null,
      fourHourLimit: 30,
      clinicianBolusDose: null,
      indication: 'Pain after laparotomy',
    });
    expect(readOrderForm(form({}), null, 1).fields).toBeNull();
    expect(readOrderForm(form({ oneHourLimit: 'ten' }), morphine, 1).fields).toBeNull();
  });

  it('reports an empty required field as required, not as a bad number', () => {
    const read = readOrderForm(form({ demandDose: '' }), morphine, 1);
    expect(read.missing).toEqual(['demandDose']);
    expect(read.fields).toBeNull();
    const findings = localFindings(read, morphine, patientFactorsOf(noah, today), context);
    expect(findings.find((f) => f.field === 'demandDose')).toMatchObject({ severity: 'error', message: 'Demand dose is required' });
  });

  it('checks as the server does: 2.5 mg demand is past the soft maximum, 3.5 mg past the hard one', () => {
    const factors = patientFactorsOf(noah, today);
    expect(factors).toMatchObject({ weightKg: 82, ageYears: 57, opioidTolerant: false, sleepApnoea: false, otherSedatives: false });
    const soft = localFindings(readOrderForm(form({ demandDose: '2.5' }), morphine, 1), morphine, factors, context);
    expect(soft).toEqual([
      expect.objectContaining({ field: 'demandDose', severity: 'soft', message: 'Demand dose 2.5 mg is above the soft maximum 2 mg' }),
    ]);
    const hard = localFindings(readOrderForm(form({ demandDose: '3.5' }), morphine, 1), morphine, factors, context);
    expect(hard[0]).toMatchObject({ field: 'demandDose', severity: 'hard' });
  });
});

describe('revising a returned order', () => {
  it('prefills the rule, the numbers and the reasons given before, with a review date not in the past', () => {
    const returned = {
      drugId: 1,
      concentrationPerMl: 1,
      loadingDose: null,
      demandDose: 2.5,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      oneHourLimit: null,
      fourHourLimit: 30,
      clinicianBolusDose: 2,
      indication: 'Pain after laparotomy',
      reviewDate: '2026-03-01',
      overrides: [{ field: 'demandDose', reason: 'Tolerated 2.5 mg in recovery' }],
    } as unknown as OrderDetail;
    const values = valuesFromOrder(returned, [morphine], today);
    expect(values).toMatchObject({
      ruleId: '4',
      demandDose: '2.5',
      loadingDose: '',
      fourHourLimit: '30',
      clinicianBolusDose: '2',
      reviewDate: '2026-03-06',
    });
    expect(values.reasons.demandDose).toBe('Tolerated 2.5 mg in recovery');
    expect(valuesFromOrder({ ...returned, reviewDate: '2026-03-09' }, [morphine], today).reviewDate).toBe('2026-03-09');
  });

  it('gives the next local calendar day, across a month end', () => {
    expect(nextDay(new Date(2026, 1, 28, 23, 59))).toBe('2026-03-01');
  });
});
