import { describe, expect, it } from 'vitest';
import { chooseRule, ruleChoiceFindings } from './choose-rule.js';
import type { RulePopulation } from './rule-population.js';

// Patients are children under 18 (patients/adult-age.ts, common practice).
type Rule = Partial<RulePopulation> & { id: string; drugId: number; concentrationPerMl: number };
const MORPHINE = 1;
const adult: Rule = { id: 'adult', drugId: MORPHINE, concentrationPerMl: 1, population: 'adult' };
const legacyAdult: Rule = { id: 'legacy', drugId: MORPHINE, concentrationPerMl: 1 };
const children: Rule = {
  id: 'children',
  drugId: MORPHINE,
  concentrationPerMl: 1,
  population: 'paediatric',
  minAgeYears: 1,
  maxAgeYears: 18,
  minWeightKg: 10,
};
const small: Rule = {
  id: 'small',
  drugId: MORPHINE,
  concentrationPerMl: 1,
  population: 'paediatric',
  minAgeYears: 1,
  maxAgeYears: 18,
  maxWeightKg: 10,
};
const otherDrug: Rule = { id: 'fentanyl', drugId: 2, concentrationPerMl: 1, population: 'paediatric' };
const order = { drugId: MORPHINE, concentrationPerMl: 1 };
const felix = { ageYears: 8, ageMonths: 99, weightKg: 24.5 };
const grownUp = { ageYears: 45, ageMonths: 540, weightKg: 80 };

describe('chooseRule', () => {
  it('gives an adult the adult rule and a child the paediatric rule whose bands contain them', () => {
    expect(chooseRule(order, grownUp, [adult, children])).toEqual({ kind: 'ward', rule: adult });
    expect(chooseRule(order, felix, [adult, children, small])).toEqual({ kind: 'ward', rule: children });
    expect(chooseRule(order, { ...felix, weightKg: 9 }, [adult, children, small])).toEqual({ kind: 'ward', rule: small });
    // A rule saved before rules had a population is an adult rule.
    expect(chooseRule(order, grownUp, [legacyAdult])).toEqual({ kind: 'ward', rule: legacyAdult });
  });

  it('treats the 18th birthday as the boundary and the band maximum as exclusive', () => {
    expect(chooseRule(order, { ageYears: 17, ageMonths: 215, weightKg: 60 }, [adult, children]).kind).toBe('ward');
    expect(chooseRule(order, { ageYears: 17, ageMonths: 215, weightKg: 60 }, [adult, children])).toMatchObject({ rule: children });
    expect(chooseRule(order, { ageYears: 18, ageMonths: 216, weightKg: 60 }, [adult, children])).toMatchObject({ rule: adult });
  });

  it("never gives a child on an adult ward the adult limits: another ward's paediatric rule, or none", () => {
    const wren = { wardName: 'Wren', rules: [children, otherDrug] };
    expect(chooseRule(order, felix, [adult], [wren])).toEqual({ kind: 'other-ward', rule: children, wardName: 'Wren' });
    expect(chooseRule(order, felix, [adult])).toEqual({ kind: 'none', child: true, wardHasDrugAndConcentration: true });
    // A child with no weight matches no weight band.
    expect(chooseRule(order, { ...felix, weightKg: null }, [adult], [wren]).kind).toBe('none');
  });

  it('gives an adult on a children’s ward an adult rule from another library, never the paediatric one', () => {
    expect(chooseRule(order, grownUp, [children], [{ wardName: 'Cedar', rules: [adult] }])).toEqual({
      kind: 'other-ward',
      rule: adult,
      wardName: 'Cedar',
    });
    expect(chooseRule(order, grownUp, [children]).kind).toBe('none');
  });

  it('matches the drug and the concentration within a tolerance', () => {
    expect(chooseRule({ drugId: MORPHINE, concentrationPerMl: 0.1 + 0.9 }, grownUp, [adult]).kind).toBe('ward');
    expect(chooseRule({ drugId: MORPHINE, concentrationPerMl: 2 }, grownUp, [adult])).toEqual({
      kind: 'none',
      child: false,
      wardHasDrugAndConcentration: false,
    });
  });

  it('chooses nothing for a patient whose age is not known', () => {
    expect(chooseRule(order, { weightKg: 70 }, [adult, children])).toEqual({
      kind: 'none',
      child: null,
      wardHasDrugAndConcentration: true,
    });
  });
});

describe('ruleChoiceFindings', () => {
  const drug = { genericName: 'morphine' };
  const fields = { concentrationPerMl: 1, doseUnit: 'mg' };
  it('says which ward’s library the limits came from', () => {
    const findings = ruleChoiceFindings({ kind: 'other-ward', rule: children, wardName: 'Wren' }, drug, fields, felix);
    expect(findings).toEqual([
      {
        field: 'concentrationPerMl',
        severity: 'caution',
        code: 'library.other-ward',
        message:
          "This ward's dose-limit library has no rule for morphine 1 mg/mL for this patient (8 years, 24.5 kg): the limits are Wren's (Paediatric, 1 to under 18 years, 10 kg and over)",
      },
    ]);
  });

  it('blocks when no library has a rule for the patient', () => {
    const findings = ruleChoiceFindings({ kind: 'none', child: true, wardHasDrugAndConcentration: true }, drug, fields, felix);
    expect(findings.map((f) => [f.severity, f.code])).toEqual([['hard', 'library.no-rule']]);
    expect(findings[0].message).toContain('for a child (8 years, 24.5 kg)');
    expect(ruleChoiceFindings({ kind: 'ward', rule: adult }, drug, fields, grownUp)).toEqual([]);
  });
});
