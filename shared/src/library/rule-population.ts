import { formatLimit } from '../dose/format-dose.js';
import { DOSE_FIELDS, REGIMEN_FIELD_LABELS } from '../dose/regimen-fields.js';
import type { Limits, RegimenField } from '../dose/types.js';
import { ADULT_AGE_YEARS } from '../patients/adult-age.js';

/** Who a limit rule is for: adults, or children within an age band and a weight band. */
export const POPULATIONS = ['adult', 'paediatric'] as const;
export type Population = (typeof POPULATIONS)[number];
export const POPULATION_LABELS: Readonly<Record<Population, string>> = { adult: 'Adult', paediatric: 'Paediatric' };

/**
 * A rule's population. A paediatric band runs from its minimum (inclusive) to under its maximum
 * (exclusive), so "1 to 12" and "12 to 18" do not overlap; a blank bound is open. Adult rules have
 * no band. Age is in years (fractions allowed: 0.5 is six months), weight in kg.
 */
export type RulePopulation = {
  population: Population;
  minAgeYears: number | null;
  maxAgeYears: number | null;
  minWeightKg: number | null;
  maxWeightKg: number | null;
};

export const BAND_FIELDS = ['minAgeYears', 'maxAgeYears', 'minWeightKg', 'maxWeightKg'] as const;
export type BandField = (typeof BAND_FIELDS)[number];

/** The heaviest band bound accepted, in kg: a sanity bound against typing slips [practice]. */
export const MAX_BAND_WEIGHT_KG = 250;

/** A rule's population with its defaults: a rule written without one is an adult rule with no band. */
export function rulePopulationOf(rule: Partial<Record<keyof RulePopulation, unknown>>): RulePopulation {
  const bound = (value: unknown) => (typeof value === 'number' ? value : null);
  return {
    population: rule.population === 'paediatric' ? 'paediatric' : 'adult',
    minAgeYears: bound(rule.minAgeYears),
    maxAgeYears: bound(rule.maxAgeYears),
    minWeightKg: bound(rule.minWeightKg),
    maxWeightKg: bound(rule.maxWeightKg),
  };
}

const keyNumber = (value: number | null) => (value === null ? '' : String(Number(value.toPrecision(12))));

/** Identifies a rule's population within a drug and concentration: 'adult' or 'paediatric:1-18:10-'. */
export function populationKey(rule: Partial<RulePopulation>): string {
  const p = rulePopulationOf(rule);
  if (p.population === 'adult') return 'adult';
  return `paediatric:${keyNumber(p.minAgeYears)}-${keyNumber(p.maxAgeYears)}:${keyNumber(p.minWeightKg)}-${keyNumber(p.maxWeightKg)}`;
}

function bandWords(min: number | null, max: number | null, unit: string): string | null {
  if (min === null && max === null) return null;
  if (min === null) return `under ${max} ${unit}`;
  if (max === null) return `${min} ${unit} and over`;
  return `${min} to under ${max} ${unit}`;
}

/** e.g. "Adult", "Paediatric, 1 to under 18 years, 10 kg and over", "Paediatric, any age or weight". */
export function populationLabel(rule: Partial<RulePopulation>): string {
  const p = rulePopulationOf(rule);
  if (p.population === 'adult') return POPULATION_LABELS.adult;
  const bands = [bandWords(p.minAgeYears, p.maxAgeYears, 'years'), bandWords(p.minWeightKg, p.maxWeightKg, 'kg')].filter(Boolean);
  return bands.length === 0 ? 'Paediatric, any age or weight' : `Paediatric, ${bands.join(', ')}`;
}

/** The patient facts a population is matched on. */
export type PatientForRule = { ageYears?: number | null; ageMonths?: number | null; weightKg?: number | null };

/** Age in years with months where known (8 years 6 months is 8.5), or null. */
export function exactAgeYears(patient: PatientForRule): number | null {
  if (typeof patient.ageMonths === 'number' && Number.isFinite(patient.ageMonths)) return patient.ageMonths / 12;
  if (typeof patient.ageYears === 'number' && Number.isFinite(patient.ageYears)) return patient.ageYears;
  return null;
}

function inBand(value: number | null, min: number | null, max: number | null): boolean {
  if (min === null && max === null) return true;
  // A bounded band needs the fact: a child with no weight matches no weight band.
  if (value === null || !Number.isFinite(value)) return false;
  return (min === null || value >= min) && (max === null || value < max);
}

/** Whether a paediatric rule's bands contain the child; an adult rule contains any adult. */
export function populationContains(rule: Partial<RulePopulation>, patient: PatientForRule): boolean {
  const p = rulePopulationOf(rule);
  const age = exactAgeYears(patient);
  if (age === null) return false;
  if (p.population === 'adult') return age >= ADULT_AGE_YEARS;
  if (age >= ADULT_AGE_YEARS) return false;
  const weight = typeof patient.weightKg === 'number' && patient.weightKg > 0 ? patient.weightKg : null;
  return inBand(age, p.minAgeYears, p.maxAgeYears) && inBand(weight, p.minWeightKg, p.maxWeightKg);
}

function overlaps(aMin: number | null, aMax: number | null, bMin: number | null, bMax: number | null): boolean {
  return (aMin === null || bMax === null || aMin < bMax) && (bMin === null || aMax === null || bMin < aMax);
}

/** The fields of a rule that population and ceiling checks read. */
export type RuleForPopulationCheck = Partial<RulePopulation> & {
  drugId: number;
  concentrationPerMl: number;
  doseUnit: string;
  perKg: boolean;
  limits: Partial<Record<RegimenField, Limits | undefined>>;
};

/** An adult rule from another active library, against which a per-kg ceiling is also checked. */
export type AdultRuleElsewhere = RuleForPopulationCheck & { wardName: string };

type Problem = { path: string; message: string };

const sameDrugAndConcentration = (a: RuleForPopulationCheck, b: RuleForPopulationCheck) =>
  a.drugId === b.drugId && Math.abs(a.concentrationPerMl - b.concentrationPerMl) < 1e-9;

function bandProblems(rule: RuleForPopulationCheck, path: string): Problem[] {
  const p = rulePopulationOf(rule);
  const problems: Problem[] = [];
  if (p.population === 'adult') {
    for (const field of BAND_FIELDS) {
      if (p[field] !== null)
        problems.push({
          path: `${path}.${field}`,
          message: 'An adult rule has no age or weight band: leave it blank, or make the rule paediatric',
        });
    }
    return problems;
  }
  const check = (field: BandField, max: number, unit: string) => {
    const value = p[field];
    if (value === null) return;
    if (!Number.isFinite(value) || value < 0 || value > max) {
      problems.push({ path: `${path}.${field}`, message: `Enter a number from 0 to ${max} ${unit}, or leave it blank for no bound` });
    }
  };
  check('minAgeYears', ADULT_AGE_YEARS, 'years');
  check('maxAgeYears', ADULT_AGE_YEARS, 'years');
  check('minWeightKg', MAX_BAND_WEIGHT_KG, 'kg');
  check('maxWeightKg', MAX_BAND_WEIGHT_KG, 'kg');
  if (problems.length > 0) return problems;
  if (p.minAgeYears !== null && p.maxAgeYears !== null && !(p.minAgeYears < p.maxAgeYears)) {
    problems.push({ path: `${path}.maxAgeYears`, message: `The age band must end after it starts (${p.minAgeYears} years)` });
  }
  if (p.minWeightKg !== null && p.maxWeightKg !== null && !(p.minWeightKg < p.maxWeightKg)) {
    problems.push({ path: `${path}.maxWeightKg`, message: `The weight band must end above where it starts (${p.minWeightKg} kg)` });
  }
  return problems;
}

function ceilingProblems(
  rule: RuleForPopulationCheck,
  path: string,
  adultRules: readonly { rule: RuleForPopulationCheck; where: string }[],
): Problem[] {
  const problems: Problem[] = [];
  for (const [field, limits] of Object.entries(rule.limits) as [RegimenField, Limits | undefined][]) {
    if (!limits) continue;
    const ceiling = limits.ceiling;
    const at = `${path}.limits.${field}.ceiling`;
    const label = REGIMEN_FIELD_LABELS[field];
    const hasCeiling = ceiling !== null && ceiling !== undefined;
    if (!rule.perKg || !DOSE_FIELDS.includes(field)) {
      if (hasCeiling) {
        problems.push({
          path: at,
          message: rule.perKg ? `${label}: the lockout has no ceiling` : `${label}: only a per-kg rule has an absolute ceiling`,
        });
      }
      continue;
    }
    const setsLimit = (['hardMin', 'softMin', 'softMax', 'hardMax'] as const).some(
      (key) => limits[key] !== null && limits[key] !== undefined,
    );
    if (!hasCeiling) {
      if (setsLimit)
        problems.push({ path: at, message: `${label}: a per-kg rule needs an absolute ceiling in ${rule.doseUnit}, whatever the weight` });
      continue;
    }
    if (!Number.isFinite(ceiling) || ceiling <= 0) {
      problems.push({ path: at, message: `${label}: the ceiling must be a number more than 0` });
      continue;
    }
    for (const adult of adultRules) {
      const adultMax = adult.rule.limits[field]?.hardMax;
      if (typeof adultMax === 'number' && ceiling > adultMax) {
        problems.push({
          path: at,
          message: `${label}: the ceiling ${formatLimit(ceiling, rule.doseUnit)} is above the adult hard maximum ${formatLimit(adultMax, rule.doseUnit)} (${adult.where})`,
        });
        break;
      }
    }
  }
  return problems;
}

/**
 * Population and ceiling problems of a set of rules (one library version): a band on an adult
 * rule; a band bound out of range or ending before it starts; two paediatric bands for one drug
 * and concentration that overlap (a child would match both); a per-kg dose field that limits
 * without an absolute ceiling; a ceiling on a rule that is not per kg, or above the adult rule's
 * hard maximum for the same drug and concentration (in this version or, given, another active
 * library). Paths are `rules.<index>.…`.
 */
export function populationProblems(
  rules: readonly RuleForPopulationCheck[],
  adultRulesElsewhere: readonly AdultRuleElsewhere[] = [],
): Problem[] {
  const problems: Problem[] = [];
  rules.forEach((rule, index) => {
    const path = `rules.${index}`;
    const bands = bandProblems(rule, path);
    problems.push(...bands);
    const p = rulePopulationOf(rule);
    if (bands.length === 0 && p.population === 'paediatric') {
      const earlier = rules.findIndex(
        (other, otherIndex) =>
          otherIndex < index &&
          sameDrugAndConcentration(rule, other) &&
          rulePopulationOf(other).population === 'paediatric' &&
          bandProblems(other, '').length === 0 &&
          overlaps(p.minAgeYears, p.maxAgeYears, rulePopulationOf(other).minAgeYears, rulePopulationOf(other).maxAgeYears) &&
          overlaps(p.minWeightKg, p.maxWeightKg, rulePopulationOf(other).minWeightKg, rulePopulationOf(other).maxWeightKg),
      );
      if (earlier !== -1 && populationKey(rules[earlier]) !== populationKey(rule)) {
        problems.push({
          path: `${path}.minAgeYears`,
          message: `Rule ${index + 1}'s band (${populationLabel(rule)}) overlaps rule ${earlier + 1}'s (${populationLabel(rules[earlier])}): a child would match both`,
        });
      }
    }
    const adults = [
      ...rules
        .filter(
          (other) =>
            other !== rule && !other.perKg && rulePopulationOf(other).population === 'adult' && sameDrugAndConcentration(rule, other),
        )
        .map((other) => ({ rule: other, where: 'this version' })),
      ...adultRulesElsewhere
        .filter((other) => !other.perKg && rulePopulationOf(other).population === 'adult' && sameDrugAndConcentration(rule, other))
        .map((other) => ({ rule: other, where: `${other.wardName}'s active library` })),
    ];
    problems.push(...ceilingProblems(rule, path, adults));
  });
  return problems;
}
