import type { Drug } from '../drugs/drug.schema.js';
import { REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import type { Limits, RegimenField } from '../dose/types.js';
import type { NamedRule } from './diff-library.js';
import { LIMIT_KEYS, type LimitKey } from './library.schema.js';
import { concentrationProblem, LIBRARY_MAX_RULES, limitValueProblem, plainDecimal } from './limit-bounds.js';
import { ruleKey } from './rule-key.js';
import { BAND_FIELDS, type BandField, type RulePopulation, populationProblems, rulePopulationOf } from './rule-population.js';
import { limitOrderProblems } from './validate-limit-rules.js';

// The dose-limit library CSV format: one row per drug, concentration and parameter. Documented
// in docs/library-csv.md; keep the two in step.
export const LIBRARY_CSV_COLUMNS = [
  'drug',
  'concentration_per_ml',
  'dose_unit',
  'per_kg',
  'parameter',
  'hard_min',
  'soft_min',
  'soft_max',
  'hard_max',
] as const;

/**
 * Columns a file may leave out: who the rule is for (blank or missing: adult, no band) and, for
 * per-kg rules, the absolute ceiling of the row's parameter in the dose unit. Export writes them all.
 */
export const LIBRARY_CSV_OPTIONAL_COLUMNS = [
  'population',
  'min_age_years',
  'max_age_years',
  'min_weight_kg',
  'max_weight_kg',
  'ceiling',
] as const;
const ALL_COLUMNS: readonly string[] = [...LIBRARY_CSV_COLUMNS, ...LIBRARY_CSV_OPTIONAL_COLUMNS];
const BAND_COLUMNS: Record<BandField, string> = {
  minAgeYears: 'min_age_years',
  maxAgeYears: 'max_age_years',
  minWeightKg: 'min_weight_kg',
  maxWeightKg: 'max_weight_kg',
};

const LIMIT_COLUMNS: Record<LimitKey, string> = { hardMin: 'hard_min', softMin: 'soft_min', softMax: 'soft_max', hardMax: 'hard_max' };

/** CSV parameter names (snake case) for each regimen field. */
export const CSV_PARAMETERS: Record<RegimenField, string> = {
  loadingDose: 'loading_dose',
  demandDose: 'demand_dose',
  lockoutMinutes: 'lockout_minutes',
  basalRatePerHour: 'basal_rate_per_hour',
  oneHourLimit: 'one_hour_limit',
  fourHourLimit: 'four_hour_limit',
  clinicianBolusDose: 'clinician_bolus_dose',
};
const FIELD_BY_PARAMETER = new Map(REGIMEN_FIELDS.map((field) => [CSV_PARAMETERS[field], field]));

/** `row` counts as a spreadsheet does: the header is row 1, the first rule row is row 2. */
export type CsvProblem = { row: number; column: string; message: string };
export type CsvRecord = Record<string, string>;

export function checkCsvHeader(header: readonly string[]): CsvProblem[] {
  const problems: CsvProblem[] = [];
  for (const column of LIBRARY_CSV_COLUMNS) {
    if (!header.includes(column)) problems.push({ row: 1, column, message: `The column ${column} is missing` });
  }
  const seen = new Set<string>();
  for (const column of header) {
    if (!ALL_COLUMNS.includes(column)) {
      problems.push({ row: 1, column, message: `Unknown column ${column}; the columns are ${ALL_COLUMNS.join(', ')}` });
    } else if (seen.has(column)) {
      // Which copy would win is a guess about a limit: refuse rather than pick one.
      problems.push({ row: 1, column, message: `The column ${column} appears more than once; keep one` });
    }
    seen.add(column);
  }
  return problems;
}

/** Turns parsed CSV records (header already checked) into rules, or lists every problem by row and column. */
export function rulesFromCsvRecords(records: readonly CsvRecord[], drugs: readonly Drug[]): { rules: NamedRule[]; problems: CsvProblem[] } {
  const problems: CsvProblem[] = [];
  const rules = new Map<string, { rule: NamedRule; firstRow: number; rows: Map<RegimenField, number> }>();
  const drugByName = new Map(drugs.map((drug) => [drug.genericName.toLowerCase(), drug]));

  records.forEach((record, index) => {
    const row = index + 2;
    const problem = (column: string, message: string) => problems.push({ row, column, message });
    const cell = (column: string) => (record[column] ?? '').trim();

    const drug = drugByName.get(cell('drug').toLowerCase());
    if (!drug)
      problem(
        'drug',
        cell('drug') ? `Unknown drug ${cell('drug')}; known: ${drugs.map((d) => d.genericName).join(', ')}` : 'Enter the drug',
      );
    const concentration = parseNumber(cell('concentration_per_ml'));
    const badConcentration = concentration == null ? 'Concentration must be a number more than 0' : concentrationProblem(concentration);
    if (badConcentration) problem('concentration_per_ml', badConcentration);
    const doseUnit = cell('dose_unit');
    if (doseUnit !== 'mg' && doseUnit !== 'mcg') problem('dose_unit', 'Dose unit must be mg or mcg');
    else if (drug && drug.doseUnit !== doseUnit) problem('dose_unit', `${drug.genericName} is dosed in ${drug.doseUnit}, not ${doseUnit}`);
    const perKg = parseBoolean(cell('per_kg'));
    if (perKg === undefined) problem('per_kg', 'per_kg must be yes or no');
    const field = FIELD_BY_PARAMETER.get(cell('parameter'));
    if (!field)
      problem('parameter', `Unknown parameter ${cell('parameter') || '(empty)'}; one of ${Object.values(CSV_PARAMETERS).join(', ')}`);

    const limits: Limits = {};
    for (const key of LIMIT_KEYS) {
      const value = parseNumber(cell(LIMIT_COLUMNS[key]));
      if (value === undefined || (value !== null && value < 0))
        problem(LIMIT_COLUMNS[key], 'A limit must be empty or a number of 0 or more');
      else if (value === null) continue;
      // Too many digits read as Infinity, which must never be stored (it would read as "no limit").
      else if (!Number.isFinite(value)) problem(LIMIT_COLUMNS[key], `${cell(LIMIT_COLUMNS[key]).length} digits is too long to be a limit`);
      else {
        const outOfRange = field ? limitValueProblem(field, value, cell('parameter')) : null;
        if (outOfRange) problem(LIMIT_COLUMNS[key], outOfRange);
        else limits[key] = value;
      }
    }
    if (LIMIT_KEYS.every((key) => limits[key] === undefined) && !problems.some((p) => p.row === row)) {
      problem('hard_min', 'The row sets no limit: fill at least one of hard_min, soft_min, soft_max, hard_max');
    }
    for (const orderProblem of limitOrderProblems(limits, '', field ? cell('parameter') : 'Limit')) {
      const key = orderProblem.path.split('.').pop() as LimitKey;
      problem(LIMIT_COLUMNS[key], orderProblem.message);
    }
    const population = populationCells(cell, problem);
    const ceiling = parseNumber(cell('ceiling'));
    if (ceiling === undefined) problem('ceiling', 'A ceiling must be empty or a plain decimal number more than 0');
    else if (ceiling !== null) limits.ceiling = ceiling;
    if (field && perKg !== undefined && concentration != null && doseUnit !== '' && population) {
      // The row's own population and ceiling problems, at its cells; across rows, validateLimitRules.
      const rowRule = { drugId: 0, concentrationPerMl: concentration, doseUnit, perKg, ...population, limits: { [field]: limits } };
      for (const rowProblem of populationProblems([rowRule])) {
        const name = rowProblem.path.split('.').pop()!;
        problem(name === 'ceiling' ? 'ceiling' : (BAND_COLUMNS[name as BandField] ?? 'population'), rowProblem.message);
      }
    }
    if (problems.some((p) => p.row === row) || !drug || !field || concentration == null || perKg === undefined || !population) return;

    const key = ruleKey({ drugId: drug.id, concentrationPerMl: concentration, ...population });
    const existing = rules.get(key);
    if (!existing) {
      if (rules.size === LIBRARY_MAX_RULES) {
        // Said once, at the row that would start one rule too many.
        if (!problems.some((p) => p.message.startsWith('A library version holds at most')))
          problem(
            'drug',
            `A library version holds at most ${LIBRARY_MAX_RULES} rules (one per drug and concentration); this row starts rule ${LIBRARY_MAX_RULES + 1}`,
          );
        return;
      }
      const rule: NamedRule = {
        drugId: drug.id,
        drugName: drug.genericName,
        concentrationPerMl: concentration,
        doseUnit: drug.doseUnit,
        perKg,
        // An adult rule is written as before, without population fields (absent means adult).
        ...(population.population === 'adult' ? {} : population),
        limits: { [field]: limits },
      };
      rules.set(key, { rule, firstRow: row, rows: new Map([[field, row]]) });
      return;
    }
    if (existing.rule.perKg !== perKg)
      problem('per_kg', `per_kg differs from row ${existing.firstRow} for the same drug and concentration`);
    else if (existing.rows.has(field))
      problem('parameter', `${cell('parameter')} is already set in row ${existing.rows.get(field)} for this drug and concentration`);
    else {
      existing.rule.limits[field] = limits;
      existing.rows.set(field, row);
    }
  });

  return { rules: [...rules.values()].map((entry) => entry.rule), problems };
}

/** Rows for export, header first, in the same format the importer reads. */
export function csvRowsFromRules(rules: readonly NamedRule[]): string[][] {
  const rows: string[][] = [[...LIBRARY_CSV_COLUMNS, ...LIBRARY_CSV_OPTIONAL_COLUMNS]];
  for (const rule of rules) {
    for (const field of REGIMEN_FIELDS) {
      const limits = rule.limits[field];
      if (!limits || LIMIT_KEYS.every((key) => limits[key] == null)) continue;
      rows.push([
        rule.drugName,
        plainDecimal(rule.concentrationPerMl),
        rule.doseUnit,
        rule.perKg ? 'yes' : 'no',
        CSV_PARAMETERS[field],
        // Plain decimals with every digit: 1e-7 is written 0.0000001, which the importer reads back exactly.
        ...LIMIT_KEYS.map((key) => (limits[key] == null ? '' : plainDecimal(limits[key]))),
        ...populationRow(rule),
        limits.ceiling == null ? '' : plainDecimal(limits.ceiling),
      ]);
    }
  }
  return rows;
}

/** The population cells of a row (blank population: adult), or undefined after saying what is wrong. */
function populationCells(cell: (column: string) => string, problem: (column: string, message: string) => void): RulePopulation | undefined {
  const text = cell('population').toLowerCase();
  const population = text === '' || text === 'adult' ? 'adult' : text === 'paediatric' || text === 'pediatric' ? 'paediatric' : undefined;
  if (!population) {
    problem('population', 'population must be adult or paediatric (or empty for adult)');
    return undefined;
  }
  const result: RulePopulation = { population, minAgeYears: null, maxAgeYears: null, minWeightKg: null, maxWeightKg: null };
  let ok = true;
  for (const field of BAND_FIELDS) {
    const value = parseNumber(cell(BAND_COLUMNS[field]));
    if (value === undefined || (value !== null && !Number.isFinite(value))) {
      problem(BAND_COLUMNS[field], `${BAND_COLUMNS[field]} must be empty (no bound) or a plain decimal number`);
      ok = false;
    } else result[field] = value;
  }
  return ok ? result : undefined;
}

function populationRow(rule: NamedRule): string[] {
  const p = rulePopulationOf(rule);
  return [p.population, ...BAND_FIELDS.map((field) => (p[field] === null ? '' : plainDecimal(p[field])))];
}

/** null for an empty cell, undefined for text that is not a plain decimal number. */
function parseNumber(text: string): number | null | undefined {
  if (text === '') return null;
  if (!/^[+]?(\d+(\.\d*)?|\.\d+)$/.test(text)) return undefined;
  return Number(text);
}

function parseBoolean(text: string): boolean | undefined {
  const value = text.toLowerCase();
  if (['yes', 'true', 'y', '1'].includes(value)) return true;
  if (['no', 'false', 'n', '0'].includes(value)) return false;
  return undefined;
}
