/** An input sanity bound, not a clinical threshold (common practice): a weight above this is a typing error. */
export const WEIGHT_MAX_KG = 500;

/**
 * Why a weight's measurement date cannot be right, or null: it must be a real yyyy-mm-dd day, not
 * after `today` and not before the date of birth. Days compare as text (both yyyy-mm-dd).
 */
export function weightDateProblem(measuredOn: string, dateOfBirth: string, today: string): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(measuredOn)) return 'Enter the date the weight was measured (yyyy-mm-dd)';
  if (measuredOn > today) return 'The weight cannot have been measured in the future';
  if (measuredOn < dateOfBirth) return 'The weight cannot have been measured before the date of birth';
  return null;
}

/** Whole days from `measuredOn` to `today` (both yyyy-mm-dd), or null when either is missing or not a day. */
export function weightAgeDays(measuredOn: string | null, today: string): number | null {
  if (!measuredOn) return null;
  const from = Date.parse(`${measuredOn}T00:00:00Z`);
  const to = Date.parse(`${today}T00:00:00Z`);
  if (!Number.isFinite(from) || !Number.isFinite(to)) return null;
  return Math.round((to - from) / 86_400_000);
}

/**
 * The latest calendar day anywhere on Earth at `now` (UTC+14): a weight dated up to this day is
 * not in the future for the ward entering it, whatever its time zone.
 */
export function latestTodayAnywhere(now: Date): string {
  return new Date(now.getTime() + 14 * 3_600_000).toISOString().slice(0, 10);
}
