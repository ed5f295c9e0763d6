import { isChild } from '../patients/adult-age.js';
import { IMPLAUSIBLE_WEIGHT_Z, weightPlausibility } from '../patients/growth-reference.js';
import { withoutFloatNoise } from './float-noise.js';
import { formatDose, formatLimit } from './format-dose.js';
import { isUsableNumber } from './order-number-findings.js';
import { POSSIBLE_WINDOW_FIELD, POSSIBLE_WINDOW_LABELS, POSSIBLE_WINDOWS, possibleTotals } from './possible-totals.js';
import { DOSE_FIELDS, REGIMEN_FIELD_LABELS, regimenFieldUnit } from './regimen-fields.js';
import type { Finding, LimitRule, OrderCheckContext, PatientFactors, Regimen, RegimenField } from './types.js';

const DAY_MS = 24 * 60 * 60 * 1000;

/** Whole days from one yyyy-mm-dd to another; null when either is not a real date. */
function daysBetween(from: string, to: string): number | null {
  const a = Date.parse(`${from}T00:00:00Z`);
  const b = Date.parse(`${to}T00:00:00Z`);
  if (!Number.isFinite(a) || !Number.isFinite(b)) return null;
  return Math.round((b - a) / DAY_MS);
}

function ageWords(p: PatientFactors): string {
  const months = p.ageMonths;
  if (typeof months === 'number' && months < 24) return `${months}-month-old`;
  return `${p.ageYears}-year-old`;
}

function sexWords(sex: PatientFactors['sex']): string {
  return sex === 'female' ? 'girl' : sex === 'male' ? 'boy' : 'child';
}

/** A child's weight against the CDC 2000 weight-for-age reference: implausible needs a reason; an age outside it is said. */
function weightPlausibilityFindings(p: PatientFactors, weightKg: number): Finding[] {
  if (typeof p.ageMonths !== 'number' || !Number.isFinite(p.ageMonths)) {
    return [
      { field: 'weightKg', severity: 'caution', code: 'weight.not-checked', message: 'The weight is not checked: the age is not known' },
    ];
  }
  const result = weightPlausibility(weightKg, p.ageMonths, p.sex);
  if (result.kind === 'plausible') return [];
  if (result.kind === 'not-checked') {
    return [
      {
        field: 'weightKg',
        severity: 'caution',
        code: 'weight.not-checked',
        message: `The weight is not checked against a growth reference: ${result.reason}. Make sure it is today's weight in kg`,
      },
    ];
  }
  const range = `${formatDose(result.low, 'kg')} to ${formatDose(result.high, 'kg')}`;
  return [
    {
      field: 'weightKg',
      severity: 'soft',
      code: 'weight.implausible',
      message:
        `Check the weight: ${formatDose(weightKg, 'kg')} is unusual for a ${ageWords(p)} ${sexWords(p.sex)} ` +
        `(${range} is within ${IMPLAUSIBLE_WEIGHT_Z} SD of the median ${formatDose(result.median, 'kg')}, ${result.reference}). ` +
        'Was it typed in pounds, or a decimal point slipped? Weigh again, or give a reason',
    },
  ];
}

/** The weight's measured date against the ward's rule: missing or too old is a caution. */
function weightAgeFindings(p: PatientFactors, context: OrderCheckContext): Finding[] {
  const measuredOn = p.weightMeasuredOn;
  if (!measuredOn) {
    return [
      {
        field: 'weightKg',
        severity: 'caution',
        code: 'weight.undated',
        message: 'The weight has no measured date: record when it was measured, or weigh the patient',
      },
    ];
  }
  if (!context.today) return [];
  const days = daysBetween(measuredOn, context.today);
  if (days === null) return [];
  if (days < 0) {
    return [
      {
        field: 'weightKg',
        severity: 'caution',
        code: 'weight.future-date',
        message: `The weight's measured date ${measuredOn} is after today`,
      },
    ];
  }
  const maxDays = context.weightMaxAgeDays;
  if (typeof maxDays === 'number' && Number.isFinite(maxDays) && days > maxDays) {
    return [
      {
        field: 'weightKg',
        severity: 'caution',
        code: 'weight.old',
        message: `The weight was measured ${days} days ago (${measuredOn}); this ward asks for one at most ${maxDays} days old: weigh the patient`,
      },
    ];
  }
  return [];
}

/**
 * A per-kg rule's absolute ceilings: a dose field above its ceiling (in the dose unit, whatever
 * the weight) blocks; a dose field the rule limits per kg without a ceiling is said, so a missing
 * ceiling never passes as "no limit" unnoticed.
 */
function ceilingFindings(r: Regimen, rule: LimitRule): Finding[] {
  if (!rule.perKg) return [];
  const findings: Finding[] = [];
  for (const field of DOSE_FIELDS) {
    const limits = rule.limits[field];
    const value = r[field];
    if (!limits || !isUsableNumber(value) || value <= 0) continue;
    const unit = regimenFieldUnit(field, r.doseUnit, false);
    const ceiling = ruleCeiling(rule, field);
    if (ceiling === null || ceiling === undefined) {
      findings.push({
        field,
        severity: 'caution',
        code: 'limit.no-ceiling',
        message: `${REGIMEN_FIELD_LABELS[field]}: this per-kg rule has no absolute ceiling; ask pharmacy to add one`,
      });
    } else if (!(withoutFloatNoise(value) <= ceiling)) {
      findings.push({
        field,
        severity: 'hard',
        code: 'limit.ceiling',
        message: `${REGIMEN_FIELD_LABELS[field]} ${formatDose(value, unit)} is above the rule's absolute ceiling ${formatLimit(ceiling, unit)}, whatever the weight`,
      });
    }
  }
  return findings;
}

/**
 * What the pump could give in each window (possible-totals.ts) against the per-kg rule's ceiling
 * for the 1-hour and 4-hour limits: over it blocks, however much the patient weighs. A window whose
 * field already is over its ceiling is said once, there.
 */
function possibleCeilingFindings(r: Regimen, rule: LimitRule, already: readonly Finding[]): Finding[] {
  if (!rule.perKg) return [];
  const totals = possibleTotals(r);
  const findings: Finding[] = [];
  for (const window of POSSIBLE_WINDOWS) {
    const field = POSSIBLE_WINDOW_FIELD[window];
    const ceiling = ruleCeiling(rule, field);
    const dose = totals[window].dose;
    if (ceiling === null || !Number.isFinite(dose) || dose <= ceiling) continue;
    if (already.some((finding) => finding.field === field) || findings.some((finding) => finding.field === field)) continue;
    const unit = regimenFieldUnit(field, r.doseUnit, false);
    findings.push({
      field,
      severity: 'hard',
      code: 'possible.ceiling',
      message: `${POSSIBLE_WINDOW_LABELS[window]}: the pump could give ${formatDose(dose, unit)}, above the rule's absolute ceiling ${formatDose(ceiling, unit)} for the ${REGIMEN_FIELD_LABELS[field].toLowerCase()}, whatever the weight`,
    });
  }
  return findings;
}

/** The per-kg rule's ceiling for a dose field, in the dose unit; null when the rule is not per kg or sets none. */
export function ruleCeiling(rule: LimitRule, field: RegimenField): number | null {
  if (!rule.perKg) return null;
  return rule.limits[field]?.ceiling ?? null;
}

/**
 * Findings that protect children and weight-based dosing: per-kg doses, and what the pump could
 * give in an hour or 4 hours, over the rule's absolute ceiling (`hard`); for a child, a weight implausible for the age and sex against the CDC 2000
 * weight-for-age reference (`soft`, "Check the weight"), or an age the reference does not cover
 * (`caution`); for a child or a per-kg rule, a weight with no measured date or older than the
 * ward's `weightMaxAgeDays` (`caution`).
 */
export function childFindings(r: Regimen, rule: LimitRule, p: PatientFactors, context: OrderCheckContext): Finding[] {
  const ceilings = ceilingFindings(r, rule);
  const findings = [...ceilings, ...possibleCeilingFindings(r, rule, ceilings)];
  const weight = p.weightKg;
  // A missing or unusable weight has its own error when the rule is per kg.
  if (!isUsableNumber(weight) || weight <= 0) return findings;
  const child = isChild(p.ageYears) === true;
  if (child) findings.push(...weightPlausibilityFindings(p, weight));
  if (child || rule.perKg) findings.push(...weightAgeFindings(p, context));
  return findings;
}
