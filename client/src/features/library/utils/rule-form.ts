import {
  BAND_FIELDS,
  LIMIT_KEYS,
  REGIMEN_FIELD_LABELS,
  REGIMEN_FIELDS,
  rulePopulationOf,
  validateLimitRules,
  type BandField,
  type DoseUnit,
  type Drug,
  type FieldError,
  type LimitKey,
  type LimitRuleInput,
  type Limits,
  type Population,
  type RegimenField,
} from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

// The rules editor's form. Its paths are the API's (`rules.2.limits.demandDose.softMax`), so a
// problem found here, by `validateLimitRules` or by the server lands on the same input.

/** The four limits and, for a per-kg rule's dose fields, the absolute ceiling in the dose unit. */
export type RuleFormLimits = Record<RegimenField, Record<LimitKey | 'ceiling', NumberFieldValue>>;

// Type aliases, not interfaces: the form takes values as a string-keyed record.
export type RuleFormValue = {
  /** Stable React key for the list; not sent. */
  key: string;
  drugId: string | null;
  concentrationPerMl: NumberFieldValue;
  /** Follows the drug: the server accepts only the drug's own dosing unit. */
  doseUnit: DoseUnit | null;
  perKg: boolean;
  /** Adult, or paediatric within the bands (blank: open). */
  population: Population;
} & Record<BandField, NumberFieldValue> & {
    limits: RuleFormLimits;
  };

export type RulesFormValues = { rules: RuleFormValue[] };

function emptyLimits(): RuleFormLimits {
  const limits = {} as RuleFormLimits;
  for (const field of REGIMEN_FIELDS) limits[field] = { hardMin: '', softMin: '', softMax: '', hardMax: '', ceiling: '' };
  return limits;
}

export function emptyRuleForm(key: string, perKg: boolean): RuleFormValue {
  return {
    key,
    drugId: null,
    concentrationPerMl: '',
    doseUnit: null,
    perKg,
    // A weight-based ward's new rule starts as a children's rule; its bands are for the pharmacist.
    population: perKg ? 'paediatric' : 'adult',
    minAgeYears: '',
    maxAgeYears: '',
    minWeightKg: '',
    maxWeightKg: '',
    limits: emptyLimits(),
  };
}

export function ruleToForm(rule: LimitRuleInput, key: string): RuleFormValue {
  const limits = emptyLimits();
  for (const field of REGIMEN_FIELDS) {
    for (const limit of LIMIT_KEYS) limits[field][limit] = rule.limits[field]?.[limit] ?? '';
    limits[field].ceiling = rule.limits[field]?.ceiling ?? '';
  }
  const population = rulePopulationOf(rule);
  return {
    key,
    drugId: String(rule.drugId),
    concentrationPerMl: rule.concentrationPerMl,
    doseUnit: rule.doseUnit,
    perKg: rule.perKg,
    population: population.population,
    minAgeYears: population.minAgeYears ?? '',
    maxAgeYears: population.maxAgeYears ?? '',
    minWeightKg: population.minWeightKg ?? '',
    maxWeightKg: population.maxWeightKg ?? '',
    limits,
  };
}

export interface ReadRules {
  rules: LimitRuleInput[];
  /** Problems keyed by form path. */
  errors: Record<string, string>;
}

/** The form as API rules, with every problem keyed by its path: required fields, numbers, limit order. */
export function readRulesForm(values: RulesFormValues, drugs: readonly Drug[]): ReadRules {
  const errors: Record<string, string> = {};
  const rules: LimitRuleInput[] = values.rules.map((rule, index) => {
    const path = `rules.${index}`;
    const drug = drugs.find((candidate) => String(candidate.id) === rule.drugId);
    if (!drug) errors[`${path}.drugId`] = 'Choose the drug';
    const concentration = readNumber(rule.concentrationPerMl);
    if (concentration === null || concentration === undefined || concentration <= 0) {
      errors[`${path}.concentrationPerMl`] = 'Enter the concentration, a number more than 0';
    }
    const limits: Partial<Record<RegimenField, Limits>> = {};
    for (const field of REGIMEN_FIELDS) {
      const fieldLimits: Limits = {};
      for (const key of LIMIT_KEYS) {
        const value = readNumber(rule.limits[field][key]);
        if (value === undefined || (value !== null && value < 0))
          errors[`${path}.limits.${field}.${key}`] = 'Enter a number of 0 or more, or leave empty';
        else if (value !== null) fieldLimits[key] = value;
      }
      const ceiling = readNumber(rule.limits[field].ceiling);
      if (ceiling === undefined || (ceiling !== null && ceiling < 0))
        errors[`${path}.limits.${field}.ceiling`] = 'Enter a number more than 0, or leave empty';
      else if (ceiling !== null) fieldLimits.ceiling = ceiling;
      if (Object.keys(fieldLimits).length > 0) limits[field] = fieldLimits;
    }
    const bands = {} as Record<BandField, number | null>;
    for (const band of BAND_FIELDS) {
      const value = rule.population === 'paediatric' ? readNumber(rule[band]) : null;
      if (value === undefined || (value !== null && value < 0))
        errors[`${path}.${band}`] = 'Enter a number of 0 or more, or leave empty for no bound';
      bands[band] = value ?? null;
    }
    return {
      drugId: drug?.id ?? 0,
      concentrationPerMl: concentration ?? 0,
      doseUnit: drug?.doseUnit ?? rule.doseUnit ?? 'mg',
      perKg: rule.perKg,
      ...(rule.population === 'paediatric' ? { population: 'paediatric' as const, ...bands } : {}),
      limits,
    };
  });
  for (const problem of validateLimitRules(rules)) errors[problem.path] ??= problem.message;
  return { rules, errors };
}

const FIELD_PATH = /^rules\.(\d+)\.(drugId|concentrationPerMl|doseUnit|perKg|population|minAgeYears|maxAgeYears|minWeightKg|maxWeightKg)$/;
const LIMIT_PATH = /^rules\.(\d+)\.limits\.(\w+)\.(hardMin|softMin|softMax|hardMax|ceiling)$/;
const RULE_PATH = /^rules\.(\d+)(?:\.limits\.(\w+))?/;

function isRegimenField(name: string): name is RegimenField {
  return (REGIMEN_FIELDS as readonly string[]).includes(name);
}

export interface PlacedRuleErrors {
  fieldErrors: Record<string, string>;
  /** For an alert above the form, each naming its rule. */
  otherErrors: string[];
}

/** Puts a 400's `rules.…` errors on the inputs they name; the rest are worded for an alert. */
export function placeRuleErrors(errors: readonly FieldError[], ruleCount: number): PlacedRuleErrors {
  const fieldErrors: Record<string, string> = {};
  const otherErrors: string[] = [];
  for (const { field, message } of errors) {
    const fieldMatch = FIELD_PATH.exec(field);
    const limitMatch = LIMIT_PATH.exec(field);
    const index = Number((fieldMatch ?? limitMatch)?.[1] ?? -1);
    if (index >= 0 && index < ruleCount && (fieldMatch || (limitMatch && isRegimenField(limitMatch[2])))) {
      fieldErrors[field] ??= message;
      continue;
    }
    const ruleMatch = RULE_PATH.exec(field);
    if (ruleMatch) {
      const parameter = ruleMatch[2] && isRegimenField(ruleMatch[2]) ? `, ${REGIMEN_FIELD_LABELS[ruleMatch[2]]}` : '';
      otherErrors.push(`Rule ${Number(ruleMatch[1]) + 1}${parameter}: ${message}`);
    } else otherErrors.push(message);
  }
  return { fieldErrors, otherErrors };
}
