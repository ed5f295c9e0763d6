import { describe, expect, it } from 'vitest';
import { type LimitRuleResponse, type PatientFactors, rulePopulationOf } from '@lockstep/shared';
import { emptyOrderForm, readOrderForm } from './order-form';
import { pickableRules, patientRuleFindings, ruleForPatient } from './rule-for-patient';

// The demo libraries (invented): Cedar's adult morphine 1 mg/mL rule and Wren's paediatric per-kg
// one (1 to under 18 years, 10 kg and over, demand ceiling 1.5 mg). A child is under 18: common
// practice (shared patients/adult-age.ts).
const cedarAdult: LimitRuleResponse = {
  id: 7,
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  ...rulePopulationOf({}),
  limits: { demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 } },
};
const wrenChildren: LimitRuleResponse = {
  id: 12,
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: true,
  population: 'paediatric',
  minAgeYears: 1,
  maxAgeYears: 18,
  minWeightKg: 10,
  maxWeightKg: null,
  limits: { demandDose: { softMin: 0.01, softMax: 0.02, hardMax: 0.03, ceiling: 1.5 } },
};
const child: PatientFactors = {
  opioidTolerant: false,
  ageYears: 8,
  ageMonths: 99,
  sex: 'male',
  weightKg: 24.5,
  weightMeasuredOn: '2026-12-02',
};
const adult: PatientFactors = {
  opioidTolerant: false,
  ageYears: 45,
  ageMonths: 540,
  sex: 'female',
  weightKg: 70,
  weightMeasuredOn: '2026-12-02',
};
const context = { drug: { id: 1, genericName: 'morphine' }, today: '2026-12-03', weightMaxAgeDays: 7 };
const read = (demandDose: string) =>
  readOrderForm(
    { ...emptyOrderForm(new Date(2026, 11, 3)), ruleId: '7', demandDose, lockoutMinutes: '10', fourHourLimit: '7' },
    cedarAdult,
    1,
  );

describe('the live check chooses the rule by the patient', () => {
  it("gives an adult on Cedar Cedar's adult rule", () => {
    expect(ruleForPatient(cedarAdult, adult, [cedarAdult], null)).toEqual({ rule: cedarAdult, findings: [], needsOtherLibraries: false });
  });

  it("asks for the other libraries for a child on Cedar, then checks against Wren's paediatric rule, never Cedar's adult one", () => {
    const own = ruleForPatient(cedarAdult, child, [cedarAdult], null);
    expect(own.rule).toBeNull();
    expect(own.needsOtherLibraries).toBe(true);
    const chosen = ruleForPatient(cedarAdult, child, [cedarAdult], [{ wardName: 'Wren', rules: [wrenChildren] }]);
    expect(chosen.rule).toBe(wrenChildren);
    expect(chosen.findings.map((f) => [f.code, f.severity])).toEqual([['library.other-ward', 'caution']]);
    // 1 mg is inside Cedar's adult limits but 0.041 mg/kg for 24.5 kg, above the child's 0.03 mg/kg: blocked.
    const findings = patientRuleFindings(read('1'), cedarAdult, chosen, child, context);
    expect(findings.map((f) => [f.field, f.code, f.severity])).toContainEqual(['demandDose', 'limit.hard-high', 'hard']);
    expect(findings.at(-1)?.code).toBe('library.other-ward');
  });

  it('blocks first, like the server, when no library has a rule for the child', () => {
    const chosen = ruleForPatient(cedarAdult, child, [cedarAdult], []);
    expect(chosen.rule).toBeNull();
    const findings = patientRuleFindings(read('0.4'), cedarAdult, chosen, child, context);
    expect(findings[0]).toMatchObject({ field: 'concentrationPerMl', severity: 'hard', code: 'library.no-rule' });
    expect(findings.some((f) => f.code.startsWith('limit.'))).toBe(false);
  });
});

describe('the drug picker', () => {
  it('offers one rule per drug and concentration, the one for this patient where the library has both', () => {
    const wrenAdult: LimitRuleResponse = { ...cedarAdult, id: 13 };
    expect(pickableRules([wrenAdult, wrenChildren], child)).toEqual([wrenChildren]);
    expect(pickableRules([wrenAdult, wrenChildren], adult)).toEqual([wrenAdult]);
    expect(pickableRules([cedarAdult], child)).toEqual([cedarAdult]);
  });
});
