import { describe, expect, it } from 'vitest';
import type { Drug } from '../drugs/drug.schema.js';
import type { NamedRule } from './diff-library.js';
import { checkCsvHeader, csvRowsFromRules, LIBRARY_CSV_COLUMNS, rulesFromCsvRecords, type CsvRecord } from './library-csv.js';

const drugs: Drug[] = [
  { id: 1, genericName: 'morphine', doseUnit: 'mg' },
  { id: 3, genericName: 'fentanyl', doseUnit: 'mcg' },
];

const row = (values: Partial<CsvRecord>): CsvRecord => ({
  drug: 'morphine',
  concentration_per_ml: '1',
  dose_unit: 'mg',
  per_kg: 'no',
  parameter: 'demand_dose',
  hard_min: '',
  soft_min: '0.5',
  soft_max: '2',
  hard_max: '4',
  ...values,
});

// Values are the demo library's (invented), except the typical adult morphine ranges
// [read, a widely used clinical reference table: demand 0.5–2 mg, lockout 5–10 min].
describe('library CSV', () => {
  it('groups rows into one rule per drug and concentration', () => {
    const { rules, problems } = rulesFromCsvRecords(
      [
        row({}),
        row({ parameter: 'lockout_minutes', soft_min: '5', soft_max: '10', hard_max: '' }),
        row({ drug: 'fentanyl', concentration_per_ml: '10', dose_unit: 'mcg', soft_min: '5', soft_max: '20', hard_max: '40' }),
      ],
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
        limits: { demandDose: { softMin: 0.5, softMax: 2, hardMax: 4 }, lockoutMinutes: { softMin: 5, softMax: 10 } },
      },
      {
        drugId: 3,
        drugName: 'fentanyl',
        concentrationPerMl: 10,
        doseUnit: 'mcg',
        perKg: false,
        limits: { demandDose: { softMin: 5, softMax: 20, hardMax: 40 } },
      },
    ]);
  });

  it('names the row and column of every problem', () => {
    const { problems } = rulesFromCsvRecords(
      [row({}), row({ drug: 'aspirin' }), row({ soft_max: 'two' }), row({ dose_unit: 'mcg' }), row({ soft_max: '5' }), row({})],
      drugs,
    );
    expect(problems).toEqual([
      { row: 3, column: 'drug', message: 'Unknown drug aspirin; known: morphine, fentanyl' },
      { row: 4, column: 'soft_max', message: 'A limit must be empty or a number of 0 or more' },
      { row: 5, column: 'dose_unit', message: 'morphine is dosed in mg, not mcg' },
      { row: 6, column: 'hard_max', message: 'demand_dose: the hard maximum (4) is below the soft maximum (5)' },
      { row: 7, column: 'parameter', message: 'demand_dose is already set in row 2 for this drug and concentration' },
    ]);
  });

  it('checks the header for missing and unknown columns', () => {
    expect(checkCsvHeader([...LIBRARY_CSV_COLUMNS])).toEqual([]);
    expect(checkCsvHeader([...LIBRARY_CSV_COLUMNS, 'hard_max'])).toEqual([
      { row: 1, column: 'hard_max', message: 'The column hard_max appears more than once; keep one' },
    ]);
    const problems = checkCsvHeader([
      'drug',
      'concentration',
      'dose_unit',
      'per_kg',
      'parameter',
      'hard_min',
      'soft_min',
      'soft_max',
      'hard_max',
    ]);
    expect(problems.map((p) => p.column)).toEqual(['concentration_per_ml', 'concentration']);
  });

  it('refuses a limit too long to be a number, or outside its bound, naming the cell (never read as no limit)', () => {
    const { rules, problems } = rulesFromCsvRecords(
      [
        row({ hard_max: '9'.repeat(400) }),
        row({ parameter: 'lockout_minutes', soft_min: '5', soft_max: '10', hard_max: '100000' }),
        row({ concentration_per_ml: '1'.repeat(400) }),
      ],
      drugs,
    );
    expect(rules).toEqual([]);
    expect(problems).toEqual([
      { row: 2, column: 'hard_max', message: '400 digits is too long to be a limit' },
      { row: 3, column: 'hard_max', message: 'lockout_minutes: a limit is at most 1440 minutes; this is 100000' },
      { row: 4, column: 'concentration_per_ml', message: 'Concentration must be a number more than 0' },
    ]);
  });

  it('holds at most 500 rules, said once at the row starting rule 501', () => {
    const records = Array.from({ length: 999 }, (_, i) => row({ concentration_per_ml: String(i + 1) }));
    const { problems } = rulesFromCsvRecords(records, drugs);
    expect(problems).toEqual([
      {
        row: 502,
        column: 'drug',
        message: 'A library version holds at most 500 rules (one per drug and concentration); this row starts rule 501',
      },
    ]);
  });

  it('exports tiny and large values as plain decimals that import back to the same rules', () => {
    const tiny: NamedRule = {
      drugId: 1,
      drugName: 'morphine',
      concentrationPerMl: 0.0000001,
      doseUnit: 'mg',
      perKg: false,
      limits: { demandDose: { hardMin: 0.0000001, softMax: 0.1 + 0.2, hardMax: 10_000 }, lockoutMinutes: { hardMax: 1440 } },
    };
    const [header, ...body] = csvRowsFromRules([tiny]);
    expect(body[0]).toEqual([
      ...['morphine', '0.0000001', 'mg', 'no', 'demand_dose', '0.0000001', '', '0.30000000000000004', '10000'],
      ...['adult', '', '', '', '', ''],
    ]);
    const records = body.map((cells) => Object.fromEntries(header.map((column, i) => [column, cells[i]])));
    const back = rulesFromCsvRecords(records, drugs);
    expect(back.problems).toEqual([]);
    expect(back.rules).toEqual([tiny]);
  });

  it('exports rows that import back to the same rules', () => {
    const { rules } = rulesFromCsvRecords(
      [row({}), row({ parameter: 'four_hour_limit', soft_min: '', soft_max: '30', hard_max: '40' })],
      drugs,
    );
    const [header, ...body] = csvRowsFromRules(rules);
    const records = body.map((cells) => Object.fromEntries(header.map((column, i) => [column, cells[i]])));
    expect(rulesFromCsvRecords(records, drugs).rules).toEqual(rules);
  });
});
