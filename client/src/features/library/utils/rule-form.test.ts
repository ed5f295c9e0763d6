import { describe, expect, it } from 'vitest';
import type { Drug, LimitRuleInput } from '@lockstep/shared';
import { emptyRuleForm, placeRuleErrors, readRulesForm, ruleToForm } from './rule-form';

const drugs: Drug[] = [
  { id: 1, genericName: 'morphine', doseUnit: 'mg' },
  { id: 3, genericName: 'fentanyl', doseUnit: 'mcg' },
];
// Demo library values (invented).
const morphine: LimitRuleInput = {
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  limits: { demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 }, lockoutMinutes: { hardMin: 5 } },
};

describe('rules form', () => {
  it('reads back the rules it was given', () => {
    const values = { rules: [ruleToForm(morphine, 'a')] };
    expect(values.rules[0].limits.demandDose.softMax).toBe(2);
    expect(values.rules[0].limits.loadingDose.softMax).toBe('');
    expect(readRulesForm(values, drugs)).toEqual({ rules: [morphine], errors: {} });
  });

  it('takes the dose unit from the drug and treats empty inputs as no limit', () => {
    const rule = { ...emptyRuleForm('b', true), drugId: '3', concentrationPerMl: 10 };
    rule.limits.demandDose.softMax = 0.5;
    // A new per-kg rule starts as a children's rule with open bands.
    expect(readRulesForm({ rules: [rule] }, drugs).rules).toEqual([
      {
        drugId: 3,
        concentrationPerMl: 10,
        doseUnit: 'mcg',
        perKg: true,
        population: 'paediatric',
        minAgeYears: null,
        maxAgeYears: null,
        minWeightKg: null,
        maxWeightKg: null,
        limits: { demandDose: { softMax: 0.5 } },
      },
    ]);
  });

  it('keeps a paediatric rule’s bands and ceilings, and asks for a ceiling on each per-kg dose limit', () => {
    // Demo Wren values (invented): children 1 to under 18 years, 10 kg and over; demand ceiling 1.5 mg.
    const children: LimitRuleInput = {
      ...morphine,
      perKg: true,
      population: 'paediatric',
      minAgeYears: 1,
      maxAgeYears: 18,
      minWeightKg: 10,
      maxWeightKg: null,
      limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 1.5 }, lockoutMinutes: { hardMin: 5 } },
    };
    const form = ruleToForm(children, 'p');
    expect(form.limits.demandDose.ceiling).toBe(1.5);
    expect(readRulesForm({ rules: [form] }, drugs)).toEqual({ rules: [children], errors: {} });
    form.limits.demandDose.ceiling = '';
    expect(readRulesForm({ rules: [form] }, drugs).errors).toEqual({
      'rules.0.limits.demandDose.ceiling': 'Demand dose: a per-kg rule needs an absolute ceiling in mg, whatever the weight',
    });
    expect(placeRuleErrors([{ field: 'rules.0.maxAgeYears', message: 'Enter a number from 0 to 18 years' }], 1).fieldErrors).toEqual({
      'rules.0.maxAgeYears': 'Enter a number from 0 to 18 years',
    });
  });

  it('keys every problem by the path of its input', () => {
    const missing = emptyRuleForm('c', false);
    missing.limits.demandDose.softMax = '1.2.3';
    const swapped = ruleToForm(morphine, 'd');
    swapped.limits.demandDose.hardMax = 1.5;
    const { errors } = readRulesForm({ rules: [missing, swapped, ruleToForm(morphine, 'e')] }, drugs);
    expect(errors).toEqual({
      'rules.0.drugId': 'Choose the drug',
      'rules.0.concentrationPerMl': 'Enter the concentration, a number more than 0',
      'rules.0.limits.demandDose.softMax': 'Enter a number of 0 or more, or leave empty',
      'rules.1.limits.demandDose.hardMax': 'Demand dose: the hard maximum (1.5) is below the soft maximum (2)',
      'rules.2.concentrationPerMl': 'Rule 3 repeats rule 2: one rule per drug, concentration and population',
    });
  });
});

describe('placeRuleErrors', () => {
  it("puts the server's paths on the same inputs and words the rest for an alert", () => {
    const placed = placeRuleErrors(
      [
        { field: 'rules.1.limits.demandDose.softMax', message: 'Demand dose: the soft maximum (1) is below the soft minimum (2)' },
        { field: 'rules.0.doseUnit', message: 'morphine is dosed in mg, not mcg' },
        { field: 'rules.0.limits.demandDose', message: 'limits must be an object' },
        { field: 'rules.7.drugId', message: 'No drug with id 99' },
        { field: 'rules', message: 'A library version needs at least one rule before it is submitted' },
      ],
      2,
    );
    expect(placed.fieldErrors).toEqual({
      'rules.1.limits.demandDose.softMax': 'Demand dose: the soft maximum (1) is below the soft minimum (2)',
      'rules.0.doseUnit': 'morphine is dosed in mg, not mcg',
    });
    expect(placed.otherErrors).toEqual([
      'Rule 1, Demand dose: limits must be an object',
      'Rule 8: No drug with id 99',
      'A library version needs at least one rule before it is submitted',
    ]);
  });
});
