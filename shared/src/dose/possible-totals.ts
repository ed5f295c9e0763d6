import type { DoseUnit } from '../drugs/drug.schema.js';
import { type LimitCheck, checkAgainstRule } from './check-against-rule.js';
import { withoutFloatNoise } from './float-noise.js';
import { formatDose, formatLimit } from './format-dose.js';
import { maxDemandsInWindow } from './max-demands-per-hour.js';
import { isUsableNumber } from './order-number-findings.js';
import { REGIMEN_FIELD_LABELS } from './regimen-fields.js';
import type { Finding, LimitRule, Regimen } from './types.js';

const ONE_HOUR_MINUTES = 60;
const FOUR_HOURS_MINUTES = 240;

/**
 * Clinician boluses counted in every window until boluses carry their own count per 4 hours:
 * one. Lockstep's own design (docs/design.md, "Order fields and dosing conventions"), not a
 * clinical source: the most a clinician may give is a local protocol.
 */
export const DEFAULT_CLINICIAN_BOLUSES_PER_FOUR_HOURS = 1;

/** The windows the pump's possible totals are given for; the first ones include the loading dose. */
export type PossibleWindow = 'firstHour' | 'anyHour' | 'firstFourHours' | 'anyFourHours';

/** The order's own limit that lowered a figure: the 1-hour or the 4-hour limit; null when none did. */
export type WindowCap = 'oneHourLimit' | 'fourHourLimit' | null;

export type PossibleTotal = {
  /** Most the pump can give in the window, after the order's own limits. */
  dose: number;
  /** The same before the order's own limits. */
  uncapped: number;
  cappedBy: WindowCap;
};

/**
 * The most the pump can give: in the first hour and the first 4 hours (loading dose included),
 * and in any other hour and any other 4 hours (after the loading dose).
 */
export type PossibleTotals = Record<PossibleWindow, PossibleTotal>;

export const POSSIBLE_WINDOWS: readonly PossibleWindow[] = ['firstHour', 'anyHour', 'firstFourHours', 'anyFourHours'];

export const POSSIBLE_WINDOW_LABELS: Readonly<Record<PossibleWindow, string>> = {
  firstHour: 'First hour',
  anyHour: 'Any other hour',
  firstFourHours: 'First 4 hours',
  anyFourHours: 'Any other 4 hours',
};

/** The order field (and so the rule's limits) each window is checked against. */
export const POSSIBLE_WINDOW_FIELD: Readonly<Record<PossibleWindow, 'oneHourLimit' | 'fourHourLimit'>> = {
  firstHour: 'oneHourLimit',
  anyHour: 'oneHourLimit',
  firstFourHours: 'fourHourLimit',
  anyFourHours: 'fourHourLimit',
};

export type PossibleTotalsOptions = {
  /** Clinician boluses allowed in 4 hours; all of them may fall in one hour. Default 1. */
  clinicianBolusesPerFourHours?: number;
};

type Cap = { limit: number; by: Exclude<WindowCap, null> };

function usableLimit(value: number | null | undefined): number | null {
  return isUsableNumber(value) ? value : null;
}

function capped(uncapped: number, caps: readonly (Cap | null)[]): PossibleTotal {
  let dose = uncapped;
  let cappedBy: WindowCap = null;
  for (const cap of caps) {
    if (cap !== null && cap.limit < dose) {
      dose = cap.limit;
      cappedBy = cap.by;
    }
  }
  return { dose, uncapped, cappedBy };
}

/**
 * The most the pump can give in each window, by definition (docs/design.md, "Order fields and
 * dosing conventions"): basal × hours + demand × ceil(window ÷ lockout) + the clinician boluses
 * allowed (one per window by default), plus the loading dose in the first hour and first 4 hours.
 * The order's own limits cap the figures, and each window caps the other: an hour can never give
 * more than the 4-hour limit, and 4 hours never more than 4 × the 1-hour limit. A blank optional
 * dose adds nothing; an unusable number gives NaN (its own error finding says why) rather than a
 * figure that looks safe.
 */
export function possibleTotals(r: Regimen, options: PossibleTotalsOptions = {}): PossibleTotals {
  const boluses = options.clinicianBolusesPerFourHours ?? DEFAULT_CLINICIAN_BOLUSES_PER_FOUR_HOURS;
  const loading = r.loadingDose ?? 0;
  const bolusDose = r.clinicianBolusDose ?? 0;
  const bolusTotal = bolusDose === 0 || boluses === 0 ? 0 : bolusDose * boluses;
  const window = (minutes: number) => {
    const demands = maxDemandsInWindow(r.lockoutMinutes, minutes);
    // 0 × Infinity is NaN: a zero demand dose adds nothing whatever the lockout.
    const demandTotal = r.demandDose === 0 ? 0 : r.demandDose * demands;
    return withoutFloatNoise((r.basalRatePerHour * minutes) / ONE_HOUR_MINUTES + demandTotal + bolusTotal);
  };
  const hour = window(ONE_HOUR_MINUTES);
  const fourHours = window(FOUR_HOURS_MINUTES);
  const oneHourLimit = usableLimit(r.oneHourLimit);
  const fourHourLimit = usableLimit(r.fourHourLimit);
  const hourCaps: (Cap | null)[] = [
    oneHourLimit === null ? null : { limit: oneHourLimit, by: 'oneHourLimit' },
    fourHourLimit === null ? null : { limit: fourHourLimit, by: 'fourHourLimit' },
  ];
  const fourHourCaps: (Cap | null)[] = [
    fourHourLimit === null ? null : { limit: fourHourLimit, by: 'fourHourLimit' },
    oneHourLimit === null ? null : { limit: withoutFloatNoise(4 * oneHourLimit), by: 'oneHourLimit' },
  ];
  return {
    firstHour: capped(withoutFloatNoise(hour + loading), hourCaps),
    anyHour: capped(hour, hourCaps),
    firstFourHours: capped(withoutFloatNoise(fourHours + loading), fourHourCaps),
    anyFourHours: capped(fourHours, fourHourCaps),
  };
}

/** One window's possible total beside the rule's maximum for it, as the live check shows it. */
export type PossibleTotalAgainstRule = {
  window: PossibleWindow;
  total: PossibleTotal;
  /** The total per kg of weight when the rule is per kg; null otherwise. */
  perKg: number | null;
  /** The rule's soft and hard maximum for the window (per kg when the rule is); null when unset. */
  softMax: number | null;
  hardMax: number | null;
  check: LimitCheck;
};

export type PossibleTotalsContext = {
  /** Weight for a per-kg rule; null when missing or unusable (then nothing is compared). */
  weightKg: number | null;
  /** False when the regimen's dose unit is unusable or differs from the rule's. */
  doseUnitMatches: boolean;
};

function regimenIsUsable(r: Regimen): boolean {
  const optional = [r.loadingDose, r.clinicianBolusDose, r.oneHourLimit, r.fourHourLimit];
  return (
    isUsableNumber(r.demandDose) &&
    isUsableNumber(r.basalRatePerHour) &&
    isUsableNumber(r.lockoutMinutes) &&
    r.lockoutMinutes > 0 &&
    optional.every((value) => value === null || value === undefined || isUsableNumber(value))
  );
}

/**
 * Each window's possible total against the rule's 1-hour or 4-hour soft and hard maximum, whether
 * or not the order states its own limits; per kg of weight where the rule is per kg. Empty when a
 * number is unusable, the unit differs from the rule's, or a per-kg rule has no usable weight:
 * those have their own error findings.
 */
export function possibleTotalsAgainstRule(
  r: Regimen,
  rule: LimitRule,
  context: PossibleTotalsContext,
  options: PossibleTotalsOptions = {},
): PossibleTotalAgainstRule[] {
  if (!regimenIsUsable(r) || !context.doseUnitMatches) return [];
  const weightKg = rule.perKg ? context.weightKg : null;
  if (rule.perKg && (weightKg === null || !(weightKg > 0))) return [];
  const totals = possibleTotals(r, options);
  return POSSIBLE_WINDOWS.map((window) => {
    const total = totals[window];
    const limits = rule.limits[POSSIBLE_WINDOW_FIELD[window]];
    const softMax = usableLimit(limits?.softMax);
    const hardMax = usableLimit(limits?.hardMax);
    // Noise removal so 2.94 mg for 24.5 kg is 0.12 mg/kg exactly.
    const perKg = weightKg === null ? null : withoutFloatNoise(total.dose / weightKg);
    const check = checkAgainstRule(perKg ?? total.dose, { softMax, hardMax });
    return { window, total, perKg, softMax, hardMax, check };
  });
}

const WINDOW_WORDS: Readonly<Record<PossibleWindow, string>> = {
  firstHour: 'in the first hour',
  anyHour: 'in an hour',
  firstFourHours: 'in the first 4 hours',
  anyFourHours: 'in 4 hours',
};

const PER_WINDOW_WORDS: Readonly<Record<'oneHourLimit' | 'fourHourLimit', string>> = {
  oneHourLimit: 'an hour',
  fourHourLimit: 'in 4 hours',
};

function whatAddsUp(r: Regimen, row: PossibleTotalAgainstRule, unit: DoseUnit, boluses: number): string {
  const parts: string[] = [];
  const first = row.window === 'firstHour' || row.window === 'firstFourHours';
  if (first && isUsableNumber(r.loadingDose) && r.loadingDose > 0) parts.push(`loading dose ${formatDose(r.loadingDose, unit)}`);
  if (r.demandDose > 0) parts.push(`demand ${formatDose(r.demandDose, unit)} every ${formatDose(r.lockoutMinutes, 'min')}`);
  if (r.basalRatePerHour > 0) parts.push(`basal ${formatDose(r.basalRatePerHour, `${unit}/h`)}`);
  if (isUsableNumber(r.clinicianBolusDose) && r.clinicianBolusDose > 0 && boluses > 0) {
    parts.push(`${boluses === 1 ? 'one clinician bolus' : `${boluses} clinician boluses`} of ${formatDose(r.clinicianBolusDose, unit)}`);
  }
  const cap = row.total.cappedBy;
  if (cap !== null) parts.push(`held to the order's ${REGIMEN_FIELD_LABELS[cap].toLowerCase()}`);
  return parts.join(', ');
}

/**
 * Hard and soft findings for what the pump could give, on the 1-hour and 4-hour limit fields: the
 * worse of the first window (with the loading dose) and any other. Over a hard maximum blocks;
 * over a soft maximum needs a reason. Left out when the order's own limit for that window is what
 * holds the figure down: the check of that stated limit already says the same.
 */
export function possibleTotalFindings(
  r: Regimen,
  rule: LimitRule,
  doseUnit: DoseUnit,
  context: PossibleTotalsContext,
  options: PossibleTotalsOptions = {},
): Finding[] {
  const boluses = options.clinicianBolusesPerFourHours ?? DEFAULT_CLINICIAN_BOLUSES_PER_FOUR_HOURS;
  const rows = possibleTotalsAgainstRule(r, rule, context, options);
  const findings: Finding[] = [];
  for (const field of ['oneHourLimit', 'fourHourLimit'] as const) {
    // First windows are never less than the others, so the first window is the worse one.
    const [first, other] = rows.filter((candidate) => POSSIBLE_WINDOW_FIELD[candidate.window] === field);
    // Without a loading dose the first window gives no more than any other: say "in an hour".
    const row = [first?.total.dose === other?.total.dose ? other : first, first].find((candidate) => candidate && candidate.check !== 'ok');
    if (row === undefined || row.total.cappedBy === field) continue;
    const hard = row.check === 'hard-high';
    const limit = (hard ? row.hardMax : row.softMax) ?? Number.NaN;
    const perKg = rule.perKg && context.weightKg !== null ? context.weightKg : null;
    const total =
      perKg === null || row.perKg === null
        ? formatDose(row.total.dose, doseUnit)
        : `${formatDose(row.total.dose, doseUnit)} (${formatDose(row.perKg, `${doseUnit}/kg`)} for ${formatDose(perKg, 'kg')})`;
    const limitText =
      perKg === null
        ? formatLimit(limit, doseUnit)
        : `${formatLimit(limit, `${doseUnit}/kg`)} (${formatDose(withoutFloatNoise(limit * perKg), doseUnit)} for this weight)`;
    findings.push({
      field,
      severity: hard ? 'hard' : 'soft',
      code: `possible.${field === 'oneHourLimit' ? 'one-hour' : 'four-hour'}.${row.check}`,
      message:
        `The pump could give up to ${total} ${WINDOW_WORDS[row.window]} (${whatAddsUp(r, row, doseUnit, boluses)}): ` +
        `above the ${hard ? 'hard' : 'soft'} maximum of ${limitText} ${PER_WINDOW_WORDS[field]}`,
    });
  }
  return findings;
}
