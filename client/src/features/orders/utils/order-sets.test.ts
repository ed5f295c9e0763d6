import { describe, expect, it } from 'vitest';
import { rulePopulationOf, type LimitRuleResponse } from '@lockstep/shared';
import { availableOrderSets, ORDER_SETS, prefillFromSet } from './order-sets';

const rule = (id: number, drugName: string, concentrationPerMl: number, doseUnit: 'mg' | 'mcg', perKg = false): LimitRuleResponse => ({
  id,
  drugId: id * 10,
  drugName,
  concentrationPerMl,
  doseUnit,
  perKg,
  ...rulePopulationOf({}),
  limits: {},
});

const adultLibrary = [rule(1, 'Morphine', 1, 'mg'), rule(2, 'hydromorphone', 0.2, 'mg'), rule(3, 'fentanyl', 10, 'mcg')];
const set = (id: string) => ORDER_SETS.find((candidate) => candidate.id === id)!;

describe('order sets', () => {
  it('offers an adult ward every adult set its library holds, matched by drug, concentration and unit', () => {
    const ids = availableOrderSets(adultLibrary, false).map(({ set: offered }) => offered.id);
    expect(ids).toEqual(['adult-morphine', 'adult-hydromorphone', 'adult-fentanyl']);
    // morphine 2 mg/mL is a different concentration: no morphine set.
    const other = availableOrderSets([rule(1, 'morphine', 2, 'mg')], false);
    expect(other).toEqual([]);
  });

  it('offers per-kg sets on weight-based wards only', () => {
    const paediatric = [rule(7, 'morphine', 1, 'mg', true)];
    expect(availableOrderSets(paediatric, true).map(({ set: offered }) => offered.id)).toEqual(['paediatric-morphine']);
    expect(availableOrderSets(adultLibrary, true)).toEqual([]);
  });

  it('prefills the adult morphine starting regimen as typed text', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: 1 mg demand, lockout 10 min, 4-hour 30 mg.
    expect(prefillFromSet(set('adult-morphine'), adultLibrary[0], 82)).toEqual({
      ruleId: '1',
      loadingDose: '',
      demandDose: '1',
      lockoutMinutes: '10',
      basalRatePerHour: '0',
      oneHourLimit: '',
      fourHourLimit: '30',
      clinicianBolusDose: '',
    });
  });

  it('multiplies per-kg doses by the weight without binary noise', () => {
    // APAGBI Good Practice in Postoperative and Procedural Pain Management: 10–20 mcg/kg bolus;
    // 0.02 mg/kg × 24.5 kg = 0.49 mg (plain arithmetic; 0.02 × 24.5 in binary is 0.49000000000000005).
    const prefill = prefillFromSet(set('paediatric-morphine'), rule(7, 'morphine', 1, 'mg', true), 24.5);
    expect(prefill?.demandDose).toBe('0.49');
    expect(prefill?.lockoutMinutes).toBe('10');
    // Written wrong before: no limits of its own, so 0.49 mg every 10 min could give 11.76 mg
    // (0.48 mg/kg) in 4 hours, over the Wren rule's 0.4 mg/kg hard maximum. 0.1 and 0.3 mg/kg:
    // common practice [from memory]; 2.45 and 7.35 mg for 24.5 kg.
    expect(prefill?.oneHourLimit).toBe('2.45');
    expect(prefill?.fourHourLimit).toBe('7.35');
    expect(prefillFromSet(set('paediatric-morphine'), rule(7, 'morphine', 1, 'mg', true), 38)?.demandDose).toBe('0.76');
  });

  it('refuses a per-kg set for a patient with no weight', () => {
    expect(prefillFromSet(set('paediatric-morphine'), rule(7, 'morphine', 1, 'mg', true), null)).toBeNull();
    expect(prefillFromSet(set('paediatric-morphine'), rule(7, 'morphine', 1, 'mg', true), 0)).toBeNull();
  });
});
