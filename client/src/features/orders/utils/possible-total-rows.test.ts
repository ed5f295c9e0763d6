import { describe, expect, it } from 'vitest';
import type { LimitRuleResponse, OrderFields } from '@lockstep/shared';
import { possibleTotalRows } from './possible-total-rows';

// The demo Cedar and Wren morphine 1 mg/mL rules' 1-hour and 4-hour maxima (invented demo values,
// server/src/database/seed/demo-library.ts). Figures by the definitions in docs/design.md.
const rule = (perKg: boolean, oneHour: { softMax: number; hardMax: number }, fourHour: { softMax: number; hardMax: number }) =>
  ({
    id: 1,
    drugId: 1,
    drugName: 'morphine',
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg,
    limits: { oneHourLimit: oneHour, fourHourLimit: fourHour },
  }) as unknown as LimitRuleResponse;
const cedar = rule(false, { softMax: 10, hardMax: 15 }, { softMax: 30, hardMax: 40 });
const wren = rule(true, { softMax: 0.1, hardMax: 0.12 }, { softMax: 0.3, hardMax: 0.4 });
const fields: OrderFields = {
  patientId: 7,
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  demandDose: 2,
  lockoutMinutes: 6,
  basalRatePerHour: 0,
};

describe('possibleTotalRows', () => {
  it('shows Cedar demand 2 mg every 6 min over both hard maxima, with the limit beside each', () => {
    expect(possibleTotalRows(fields, cedar, 80)).toEqual([
      { window: 'firstHour', label: 'First hour', total: '20 mg', limit: 'soft 10 mg, hard 15 mg', status: 'over-hard' },
      { window: 'anyHour', label: 'Any other hour', total: '20 mg', limit: 'soft 10 mg, hard 15 mg', status: 'over-hard' },
      { window: 'firstFourHours', label: 'First 4 hours', total: '80 mg', limit: 'soft 30 mg, hard 40 mg', status: 'over-hard' },
      { window: 'anyFourHours', label: 'Any other 4 hours', total: '80 mg', limit: 'soft 30 mg, hard 40 mg', status: 'over-hard' },
    ]);
  });

  it('adds the loading dose to the first windows only, and marks a soft excess', () => {
    const rows = possibleTotalRows({ ...fields, demandDose: 1, lockoutMinutes: 10, loadingDose: 5 }, cedar, 80);
    expect(rows.map((row) => [row.total, row.status])).toEqual([
      ['11 mg', 'over-soft'],
      ['6 mg', 'within'],
      ['29 mg', 'within'],
      ['24 mg', 'within'],
    ]);
  });

  it('shows per kg for a per-kg rule, with the limit to its full precision', () => {
    // 24.5 kg child, 0.49 mg every 10 min: 11.76 mg in 4 hours = 0.48 mg/kg, over 0.4 mg/kg.
    const rows = possibleTotalRows({ ...fields, demandDose: 0.49, lockoutMinutes: 10 }, wren, 24.5);
    expect(rows[3]).toEqual({
      window: 'anyFourHours',
      label: 'Any other 4 hours',
      total: '11.76 mg (0.48 mg/kg)',
      limit: 'soft 0.3 mg/kg, hard 0.4 mg/kg',
      status: 'over-hard',
    });
    expect(possibleTotalRows(fields, wren, null)).toEqual([]);
  });

  it('is empty until the numbers read and a rule is chosen', () => {
    expect(possibleTotalRows(null, cedar, 80)).toEqual([]);
    expect(possibleTotalRows(fields, null, 80)).toEqual([]);
  });
});
