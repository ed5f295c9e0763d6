import { formatDose } from '../dose/format-dose.js';
import { usageBetween } from '../dose/usage-between.js';
import { isSedationOrBreathingFlag } from '../observations/observation-flags.js';
import { isAcceptableSedation, type SedationLevel } from '../observations/sedation-scale.js';
import type { BolusEntry, SyringeReading } from '../observations/usage-summary.js';

/** What a clinician bolus is checked against besides its dose: the latest observation and the open flags. */
export type BolusSafetyInput = {
  /** The order's latest observation's POSS level; null when there is none yet. */
  lastSedation: SedationLevel | null;
  /** Codes of the order's urgent flags not yet acknowledged. */
  openUrgentFlagCodes: readonly string[];
};

/**
 * Refuses a clinician bolus while sedation or breathing is a concern: the latest observation's
 * sedation is 3 or 4 on the Pasero Opioid-induced Sedation Scale (Pasero C, 1994; Pasero &
 * McCaffery, Pain Assessment and Pharmacologic Management, 2011: 3 and 4 are unacceptable, the
 * opioid is reduced or stopped and the prescriber told), or an urgent sedation or breathing flag
 * (`isSedationOrBreathingFlag`: respiratory rate, SpO2, NEWS2, consciousness, sedation) is open.
 * Null when the bolus may go ahead. Pure.
 */
export function bolusSafetyRefusal(input: BolusSafetyInput): string | null {
  const reasons: string[] = [];
  if (input.lastSedation !== null && !isAcceptableSedation(input.lastSedation)) {
    reasons.push(`the last observation shows sedation ${input.lastSedation} (POSS 3 or more is unacceptable)`);
  }
  const breathing = [...new Set(input.openUrgentFlagCodes.filter(isSedationOrBreathingFlag))];
  if (breathing.length > 0) reasons.push(`an urgent sedation or breathing flag is open (${breathing.join(', ')})`);
  if (reasons.length === 0) return null;
  return `No clinician bolus: ${reasons.join('; ')}. Contact the prescriber`;
}

/** The order's regimen the bolus limits read, in its dose unit. */
export type BolusLimitRegimen = {
  doseUnit: string;
  demandDose: number;
  basalRatePerHour: number;
  oneHourLimit: number | null;
  fourHourLimit: number | null;
  /** When the PCA started; basal counts from then at the earliest. Null: the whole window. */
  startedAt: string | null;
};

const MS_PER_MINUTE = 60_000;

/**
 * Given in the `minutes` ending `now`: demand doses delivered by the pump totals (each difference
 * between consecutive readings of one syringe counts when its later reading falls in the window,
 * as `usageSummary` counts hours) × the demand dose, plus basal over the window (from the start
 * of the PCA at the earliest), plus clinician boluses in the window. A counter that went backwards
 * gives NaN, which is never taken as safe.
 */
export function givenInWindow(
  readings: readonly SyringeReading[],
  boluses: readonly BolusEntry[],
  regimen: BolusLimitRegimen,
  now: Date,
  minutes: number,
): number {
  const end = now.getTime();
  const start = end - minutes * MS_PER_MINUTE;
  const inWindow = (time: number) => time > start && time <= end;
  let demands = 0;
  const sorted = [...readings].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  for (let i = 1; i < sorted.length; i++) {
    const [a, b] = [sorted[i - 1], sorted[i]];
    if (a.syringeId !== b.syringeId || !inWindow(Date.parse(b.at))) continue;
    demands += usageBetween(a, b).delivered;
  }
  const started = regimen.startedAt === null ? start : Math.max(start, Date.parse(regimen.startedAt));
  const basalMinutes = Math.max(0, (end - started) / MS_PER_MINUTE);
  const bolusTotal = boluses.filter((bolus) => inWindow(Date.parse(bolus.at))).reduce((sum, bolus) => sum + bolus.amount, 0);
  return demands * regimen.demandDose + (regimen.basalRatePerHour * basalMinutes) / 60 + bolusTotal;
}

/**
 * Refuses a clinician bolus that would take the hour's or the 4 hours' total (`givenInWindow` +
 * this bolus) over the order's own 1-hour or 4-hour limit; reaching a limit exactly is allowed.
 * No limit on the order: no refusal for that window (the order check held the regimen to the
 * ward's rule when it was signed); a limit or total that is not a finite number is refused. Pure.
 */
export function bolusLimitRefusal(
  amount: number,
  readings: readonly SyringeReading[],
  boluses: readonly BolusEntry[],
  regimen: BolusLimitRegimen,
  now: Date,
): string | null {
  const unit = regimen.doseUnit;
  const windows: [number | null, number, string, string][] = [
    [regimen.oneHourLimit, 60, '1-hour', 'the last hour'],
    [regimen.fourHourLimit, 240, '4-hour', 'the last 4 hours'],
  ];
  const reasons: string[] = [];
  for (const [limit, minutes, label, span] of windows) {
    if (limit === null) continue;
    const given = givenInWindow(readings, boluses, regimen, now, minutes);
    const total = given + amount;
    if (!Number.isFinite(limit) || !Number.isFinite(total)) {
      reasons.push(`the ${label} total cannot be worked out from the pump readings`);
    } else if (total > limit + 1e-9) {
      reasons.push(
        `${formatDose(given, unit)} given in ${span} + this bolus of ${formatDose(amount, unit)} = ${formatDose(total, unit)}, over the ${label} limit of ${formatDose(limit, unit)}`,
      );
    }
  }
  if (reasons.length === 0) return null;
  return `No clinician bolus: ${reasons.join('; ')}. Contact the prescriber`;
}
