import { DOSE_UNITS, type DoseUnit } from '../drugs/drug.schema.js';
import { allergyFindings } from './allergy-findings.js';
import { childFindings } from './child-findings.js';
import { consistencyFindings } from './order-consistency-findings.js';
import { limitFindings } from './order-limit-findings.js';
import { invalidNumberFindings } from './order-number-findings.js';
import { patientCautions } from './patient-cautions.js';
import { possibleTotalFindings } from './possible-totals.js';
import type { Finding, FindingSeverity, LimitRule, OrderCheckContext, PatientFactors, Regimen } from './types.js';

// Worst first, so a screen can show findings in the order they must be dealt with.
const SEVERITY_ORDER: Readonly<Record<FindingSeverity, number>> = { error: 0, hard: 1, soft: 2, caution: 3 };

function isDoseUnit(unit: unknown): unit is DoseUnit {
  return (DOSE_UNITS as readonly unknown[]).includes(unit);
}

function doseUnitFindings(r: Regimen, rule: LimitRule): Finding[] {
  if (!isDoseUnit(r.doseUnit)) {
    return [{ field: 'doseUnit', severity: 'error', code: 'unit.invalid', message: 'Dose unit must be mg or mcg' }];
  }
  if (rule.doseUnit !== undefined && rule.doseUnit !== r.doseUnit) {
    return [
      {
        field: 'doseUnit',
        severity: 'error',
        code: 'unit.mismatch',
        message: `Dose unit ${r.doseUnit} does not match the limit rule, which is in ${rule.doseUnit}`,
      },
    ];
  }
  return [];
}

function weightFindings(p: PatientFactors): Finding[] {
  const weight = p.weightKg;
  if (weight === null || weight === undefined || weight === 0) {
    return [
      {
        field: 'weightKg',
        severity: 'error',
        code: 'weight.missing',
        message: "Weight is needed for this weight-based limit rule: enter the patient's weight in kg",
      },
    ];
  }
  if (!Number.isFinite(weight) || weight < 0) {
    return [{ field: 'weightKg', severity: 'error', code: 'weight.invalid', message: 'Weight must be a number of kg, more than 0' }];
  }
  return [];
}

/**
 * Every finding for an order against its limit rule and patient: errors (unusable numbers, dose
 * unit, weight for a per-kg rule, contradictions within the regimen), hard and soft limit
 * findings per field (per kg where the rule is), what the pump could give in 1 and 4 hours
 * against the rule's maxima (`possibleTotalFindings`), patient risk findings, recorded
 * allergies to the drug, and the checks that protect children and weight-based dosing.
 * Sorted worst first: error, hard, soft, caution.
 */
export function checkOrder(r: Regimen, rule: LimitRule, p: PatientFactors, context: OrderCheckContext = {}): Finding[] {
  const unitErrors = doseUnitFindings(r, rule);
  const weightErrors = rule.perKg ? weightFindings(p) : [];
  const doseUnit = isDoseUnit(r.doseUnit) ? r.doseUnit : 'mg';
  const limitContext = {
    weightKg: rule.perKg && weightErrors.length === 0 ? (p.weightKg ?? null) : null,
    doseUnitMatches: unitErrors.length === 0,
  };
  const findings = [
    ...invalidNumberFindings(r),
    ...unitErrors,
    ...weightErrors,
    ...consistencyFindings(r),
    ...limitFindings(r, rule, doseUnit, limitContext),
    ...possibleTotalFindings(r, rule, doseUnit, limitContext, { clinicianBolusesPerFourHours: context.clinicianBolusesPerFourHours }),
    ...patientCautions(r, p),
    ...allergyFindings(context.drug, p.allergies),
    ...childFindings(r, rule, p, context),
  ];
  return findings.sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}
