import { isAcceptableSedation, SEDATION_LEVELS, type SedationLevel } from '@lockstep/shared';

/**
 * A sedation level as a number for a chart: S (asleep, easy to arouse) is 0, so the line rises
 * with sedation. The level itself stays the label wherever it is shown.
 */
export function sedationToNumber(level: SedationLevel): number {
  return SEDATION_LEVELS.indexOf(level);
}

/** The level for a chart value (0 → 'S'); null for a value that is not a level. */
export function sedationFromNumber(value: number): SedationLevel | null {
  return Number.isInteger(value) ? (SEDATION_LEVELS[value] ?? null) : null;
}

/** An axis tick: 'S', '1' … '4', or '' between levels. */
export function sedationTick(value: number): string {
  return sedationFromNumber(value) ?? '';
}

/** 3 and 4 need action now (Pasero Opioid-induced Sedation Scale). */
export function isUnacceptableSedation(level: SedationLevel): boolean {
  return !isAcceptableSedation(level);
}
