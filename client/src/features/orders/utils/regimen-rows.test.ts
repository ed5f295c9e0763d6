import { describe, expect, it } from 'vitest';
import { rulePopulationOf, type OrderDetail } from '@lockstep/shared';
import { regimenRows } from './regimen-rows';

// A returned version (demand 2.5 mg, outside the soft maximum) and its revision (demand 1 mg),
// against the demo Harbour morphine rule (invented demo values).
const rule = {
  id: 4,
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg' as const,
  perKg: false,
  ...rulePopulationOf({}),
  limits: { demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 }, fourHourLimit: { softMax: 30, hardMax: 40 } },
};
const base = {
  drugId: 1,
  drugName: 'morphine',
  doseUnit: 'mg',
  concentrationPerMl: 1,
  loadingDose: null,
  demandDose: 2.5,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
  clinicianBolusDose: null,
  indication: 'Pain after laparotomy',
  reviewDate: '2026-03-06',
  rule,
  findings: [
    { field: 'demandDose', severity: 'soft', code: 'limit.soft-high', message: 'Demand dose 2.5 mg is above the soft maximum 2 mg' },
  ],
} as unknown as OrderDetail;

describe('regimenRows', () => {
  it('sets each field beside its limits, with the worst finding', () => {
    const rows = regimenRows(base, null, 82);
    const demand = rows.find((row) => row.field === 'demandDose')!;
    expect(demand).toEqual({
      field: 'demandDose',
      limited: true,
      set: true,
      label: 'Demand dose',
      ordered: '2.5 mg',
      perKg: null,
      soft: '0.5–2 mg',
      hard: '0.2–3 mg',
      previous: null,
      changed: false,
      worst: 'soft',
    });
    expect(rows.map((row) => row.label)).toEqual([
      'Drug',
      'Concentration',
      'Loading dose',
      'Demand dose',
      'Lockout',
      'Basal rate',
      '1-hour limit',
      '4-hour limit',
      'Clinician bolus',
      'Indication',
      'Review date',
    ]);
    expect(rows.find((row) => row.field === 'fourHourLimit')).toMatchObject({ ordered: '30 mg', soft: 'up to 30 mg', hard: 'up to 40 mg' });
    expect(rows.find((row) => row.field === 'reviewDate')).toMatchObject({ ordered: '6 Mar 2026', limited: false, set: true });
    expect(rows.find((row) => row.field === 'loadingDose')).toMatchObject({ ordered: 'Not set', set: false });
  });

  it('marks what the revision changed and shows the previous value', () => {
    const revised = { ...base, demandDose: 1, findings: [] } as OrderDetail;
    const rows = regimenRows(revised, base, 82);
    expect(rows.filter((row) => row.changed).map((row) => row.field)).toEqual(['demandDose']);
    expect(rows.find((row) => row.field === 'demandDose')).toMatchObject({ ordered: '1 mg', previous: '2.5 mg', worst: null });
  });

  it('works the amount per kg for a per-kg rule', () => {
    const perKg = {
      ...base,
      demandDose: 0.49,
      rule: { ...rule, perKg: true, limits: { demandDose: { softMax: 0.02 } } },
      findings: [],
    } as OrderDetail;
    expect(regimenRows(perKg, null, 24.5).find((row) => row.field === 'demandDose')).toMatchObject({
      perKg: '0.02 mg/kg',
      soft: 'up to 0.02 mg/kg',
    });
    expect(regimenRows(perKg, null, null).find((row) => row.field === 'demandDose')?.perKg).toBeNull();
  });
});
