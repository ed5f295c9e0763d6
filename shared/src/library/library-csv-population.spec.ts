import { describe, expect, it } from 'vitest';
import type { Drug } from '../drugs/drug.schema.js';
import { checkCsvHeader, csvRowsFromRules, LIBRARY_CSV_COLUMNS, rulesFromCsvRecords, type CsvRecord } from './library-csv.js';

// Demo values, invented; the per-kg demand band follows the Association of Paediatric
// Anaesthetists of Great Britain and Ireland, Good Practice in Postoperative and Procedural Pain
// Management (morphine PCA bolus 10–20 mcg/kg). Ceilings are invented.
const drugs: Drug[] = [{ id: 1, genericName: 'morphine', doseUnit: 'mg' }];
const child = (values: Partial<CsvRecord>): CsvRecord => ({
  drug: 'morphine',
  concentration_per_ml: '1',
  dose_unit: 'mg',
  per_kg: 'yes',
  parameter: 'demand_dose',
  hard_min: '',
  soft_min: '0.01',
  soft_max: '0.02',
  hard_max: '0.03',
  population: 'paediatric',
  min_age_years: '1',
  max_age_years: '18',
  min_weight_kg: '10',
  max_weight_kg: '',
  ceiling: '1.5',
  ...values,
});
const adult = (values: Partial<CsvRecord>): CsvRecord => ({
  drug: 'morphine',
  concentration_per_ml: '1',
  dose_unit: 'mg',
  per_kg: 'no',
  parameter: 'demand_dose',
  hard_min: '',
  soft_min: '0.5',
  soft_max: '2',
  hard_max: '3',
  ...values,
});

describe('library CSV: population and ceiling columns', () => {
  it('accepts files without the optional columns (adult rules) and refuses unknown ones', () => {
    expect(checkCsvHeader([...LIBRARY_CSV_COLUMNS])).toEqual([]);
    expect(checkCsvHeader([...LIBRARY_CSV_COLUMNS, 'population', 'ceiling'])).toEqual([]);
    expect(checkCsvHeader([...LIBRARY_CSV_COLUMNS, 'age_band']).map((p) => p.column)).toEqual(['age_band']);
  });

  it('reads an adult and a paediatric rule for one drug and concentration as two rules', () => {
    const { rules, problems } = rulesFromCsvRecords(
      [adult({}), child({}), child({ parameter: 'lockout_minutes', soft_min: '5', soft_max: '10', hard_max: '20', ceiling: '' })],
      drugs,
    );
    expect(problems).toEqual([]);
    expect(rules).toEqual([
      {
        drugId: 1,
        drugName: 'morphine',
        concentrationPerMl: 1,
        doseUnit: 'mg',
        perKg: false,
        limits: { demandDose: { softMin: 0.5, softMax: 2, hardMax: 3 } },
      },
      {
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
        limits: {
          demandDose: { softMin: 0.01, softMax: 0.02, hardMax: 0.03, ceiling: 1.5 },
          lockoutMinutes: { softMin: 5, softMax: 10, hardMax: 20 },
        },
      },
    ]);
  });

  it('refuses, at the cell, a per-kg dose row without a ceiling and a band that is not a number', () => {
    const { problems } = rulesFromCsvRecords(
      [child({ ceiling: '' }), child({ parameter: 'basal_rate_per_hour', max_age_years: 'twelve' })],
      drugs,
    );
    expect(problems).toEqual([
      { row: 2, column: 'ceiling', message: 'Demand dose: a per-kg rule needs an absolute ceiling in mg, whatever the weight' },
      { row: 3, column: 'max_age_years', message: 'max_age_years must be empty (no bound) or a plain decimal number' },
    ]);
    expect(rulesFromCsvRecords([adult({ ceiling: '3' })], drugs).problems.map((p) => p.column)).toEqual(['ceiling']);
    expect(rulesFromCsvRecords([child({ population: 'toddler' })], drugs).problems.map((p) => p.column)).toEqual(['population']);
    expect(rulesFromCsvRecords([child({ max_age_years: '25' })], drugs).problems.map((p) => p.column)).toEqual(['max_age_years']);
  });

  it('exports population and ceiling and imports them back to the same rules', () => {
    const { rules } = rulesFromCsvRecords([adult({}), child({})], drugs);
    const [header, ...body] = csvRowsFromRules(rules);
    expect(body[1].slice(9)).toEqual(['paediatric', '1', '18', '10', '', '1.5']);
    const records = body.map((cells) => Object.fromEntries(header.map((column, i) => [column, cells[i]])));
    expect(rulesFromCsvRecords(records, drugs)).toEqual({ rules, problems: [] });
  });
});
