import { describe, expect, it } from 'vitest';
import type { NamedRule } from '@lockstep/shared';
import { formatLimit, parameterRows, ruleTitle } from './rule-rows';

// Demo library values (invented, not for clinical use).
const hydromorphone: NamedRule = {
  drugId: 2,
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  perKg: false,
  limits: {
    demandDose: { hardMin: 0.05, softMin: 0.1, softMax: 0.4, hardMax: 0.6 },
    basalRatePerHour: { softMax: 0.2, hardMax: 0.4 },
    lockoutMinutes: { hardMin: 5, softMin: 6, softMax: 15, hardMax: 30 },
    loadingDose: { hardMin: null },
  },
};

describe('ruleTitle', () => {
  it('tall-man letters the drug and writes the concentration safely', () => {
    expect(ruleTitle(hydromorphone)).toBe('HYDROmorphone 0.2 mg/mL');
    expect(ruleTitle({ drugName: 'fentanyl', concentrationPerMl: 10, doseUnit: 'mcg' })).toBe('fentaNYL 10 mcg/mL');
    expect(ruleTitle({ drugName: 'morphine', concentrationPerMl: 1, doseUnit: 'mg' })).toBe('morphine 1 mg/mL');
  });
});

describe('parameterRows', () => {
  it('lists the limited parameters in order-form order, each limit with its unit', () => {
    const rows = parameterRows(hydromorphone);
    expect(rows.map((row) => row.label)).toEqual(['Demand dose', 'Lockout', 'Basal rate']);
    expect(rows[0]).toEqual({
      field: 'demandDose',
      label: 'Demand dose',
      unit: 'mg',
      limits: { hardMin: '0.05 mg', softMin: '0.1 mg', softMax: '0.4 mg', hardMax: '0.6 mg' },
      ceiling: null,
    });
    expect(rows[1].limits).toEqual({ hardMin: '5 min', softMin: '6 min', softMax: '15 min', hardMax: '30 min' });
    expect(rows[2].limits).toEqual({ hardMin: null, softMin: null, softMax: '0.2 mg/h', hardMax: '0.4 mg/h' });
  });

  it('writes per-kg limits per kg, but never the lockout', () => {
    const paediatric: NamedRule = {
      ...hydromorphone,
      drugName: 'morphine',
      concentrationPerMl: 1,
      perKg: true,
      limits: { demandDose: { softMax: 0.02, ceiling: 1.5 }, lockoutMinutes: { hardMin: 5 }, basalRatePerHour: { hardMax: 0.004 } },
    };
    const rows = parameterRows(paediatric);
    expect(rows.map((row) => row.unit)).toEqual(['mg/kg', 'min', 'mg/kg/h']);
    expect(rows[0].limits.softMax).toBe('0.02 mg/kg');
    // The absolute ceiling is in the dose unit itself, whatever the weight (demo value, invented).
    expect(rows[0].ceiling).toBe('1.5 mg');
    expect(rows[1].ceiling).toBeNull();
    expect(rows[2].limits.hardMax).toBe('0.004 mg/kg/h');
  });

  it('uses thousands separators and no trailing zeros', () => {
    const big: NamedRule = {
      ...hydromorphone,
      drugName: 'fentanyl',
      doseUnit: 'mcg',
      limits: { fourHourLimit: { softMax: 1200.5, hardMax: 1500 } },
    };
    expect(parameterRows(big)[0].limits).toMatchObject({ softMax: '1,200.5 mcg', hardMax: '1,500 mcg' });
  });
});

describe('formatLimit', () => {
  it('shows a limit to its full stored precision, never rounded, and without an exponent', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations for the spelling.
    // Written wrong before: 0.0125 mg/kg showed as 0.013 mg/kg and 0.0004 mg as 0 mg.
    expect(formatLimit(0.0125, 'demandDose', 'mg', true)).toBe('0.0125 mg/kg');
    expect(formatLimit(0.0004, 'basalRatePerHour', 'mg', false)).toBe('0.0004 mg/h');
    expect(formatLimit(1e-7, 'demandDose', 'mg', false)).toBe('0.0000001 mg');
    expect(formatLimit(null, 'demandDose', 'mg', false)).toBeNull();
  });
});
