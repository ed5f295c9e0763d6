import { formatDose, tallMan, type HandoverBoard, type HandoverRow } from '@lockstep/shared';
import { formatCalendarDate, formatDateTime } from '@/utils/format-date';

const MINUTE_MS = 60_000;

function clockParts(isoTimestamp: string, timeZone: string | undefined, withSeconds: boolean): string | null {
  const date = new Date(isoTimestamp);
  if (Number.isNaN(date.getTime())) return null;
  return new Intl.DateTimeFormat('en-GB', {
    hour: '2-digit',
    minute: '2-digit',
    ...(withSeconds ? { second: '2-digit' } : {}),
    hourCycle: 'h23',
    timeZone,
  }).format(date);
}

/** "06:40": a moment on the 24-hour clock, in the browser's time zone (or the one given). */
export function formatClock(isoTimestamp: string, timeZone?: string): string {
  return clockParts(isoTimestamp, timeZone, false) ?? '—';
}

/** "06:40:05", for the board's "Updated" time. */
export function formatClockSeconds(isoTimestamp: string, timeZone?: string): string {
  return clockParts(isoTimestamp, timeZone, true) ?? '—';
}

/**
 * A moment near `now` (within 12 hours either way) as its clock time, "06:05"; a farther one with
 * its date, "6 Dec 2026, 06:05", so a projection days ahead never reads as later today.
 */
export function formatNearTime(isoTimestamp: string, now: Date, timeZone?: string): string {
  const at = Date.parse(isoTimestamp);
  if (Number.isNaN(at)) return '—';
  if (Math.abs(at - now.getTime()) < 12 * 60 * MINUTE_MS) return formatClock(isoTimestamp, timeZone);
  return formatDateTime(isoTimestamp, timeZone);
}

/** "45 min", "3 h 5 min", "2 d 4 h": how long ago something started, short enough for a column. */
export function formatElapsed(minutes: number): string {
  const whole = Math.max(0, Math.floor(minutes));
  if (whole === 0) return 'under 1 min';
  if (whole < 60) return `${whole} min`;
  const hours = Math.floor(whole / 60);
  if (hours < 24) {
    const rest = whole % 60;
    return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
  }
  const days = Math.floor(hours / 24);
  const restHours = hours % 24;
  return restHours === 0 ? `${days} d` : `${days} d ${restHours} h`;
}

/** "Night shift, 1 Dec 2026, 19:00–07:00". */
export function formatShift(shift: HandoverBoard['shift'], timeZone?: string): string {
  const name = shift.shift === 'day' ? 'Day shift' : 'Night shift';
  return `${name}, ${formatCalendarDate(shift.shiftDate)}, ${formatClock(shift.startsAt, timeZone)}–${formatClock(shift.endsAt, timeZone)}`;
}

/**
 * "since 05:10" within the last day, "since 1 Dec 2026, 05:10" before it; a calendar date (the
 * review date) as "since 1 Dec 2026".
 */
export function formatSince(since: string, now: Date, timeZone?: string): string {
  if (/^\d{4}-\d{2}-\d{2}$/.test(since)) return `since ${formatCalendarDate(since)}`;
  const at = Date.parse(since);
  if (Number.isNaN(at)) return '';
  if (now.getTime() - at < 24 * 60 * MINUTE_MS) return `since ${formatClock(since, timeZone)}`;
  return `since ${formatDateTime(since, timeZone)}`;
}

/** "HYDROmorphone 0.2 mg/mL": tall-man name and safe concentration. */
export function drugLine(row: Pick<HandoverRow, 'drugName' | 'concentrationPerMl' | 'doseUnit'>): string {
  return `${tallMan(row.drugName)} ${formatDose(row.concentrationPerMl, `${row.doseUnit}/mL`)}`;
}

/** "0.2 mg / 10 min, basal 0.1 mg/h, 4-h limit 6 mg": the regimen in one safe line. */
export function regimenSummary(row: Pick<HandoverRow, 'regimen' | 'doseUnit'>): string {
  const { regimen } = row;
  const unit = row.doseUnit;
  const parts = [`${formatDose(regimen.demandDose, unit)} / ${formatDose(regimen.lockoutMinutes, 'min')}`];
  if (regimen.basalRatePerHour > 0) parts.push(`basal ${formatDose(regimen.basalRatePerHour, `${unit}/h`)}`);
  if (regimen.oneHourLimit !== null) parts.push(`1-h limit ${formatDose(regimen.oneHourLimit, unit)}`);
  if (regimen.fourHourLimit !== null) parts.push(`4-h limit ${formatDose(regimen.fourHourLimit, unit)}`);
  return parts.join(', ');
}

/** The regimen as labelled lines, for comparing with the pump field by field. */
export function regimenLines(
  row: Pick<HandoverRow, 'regimen' | 'doseUnit' | 'drugName' | 'concentrationPerMl'>,
): { label: string; value: string }[] {
  const { regimen } = row;
  const unit = row.doseUnit;
  const notSet = (value: number | null, valueUnit: string) => (value === null ? 'Not set' : formatDose(value, valueUnit));
  return [
    { label: 'Drug and concentration', value: drugLine(row) },
    { label: 'Demand dose', value: formatDose(regimen.demandDose, unit) },
    { label: 'Lockout interval', value: formatDose(regimen.lockoutMinutes, 'min') },
    { label: 'Basal rate', value: regimen.basalRatePerHour > 0 ? formatDose(regimen.basalRatePerHour, `${unit}/h`) : 'None (demand only)' },
    { label: '1-hour limit', value: notSet(regimen.oneHourLimit, unit) },
    { label: '4-hour limit', value: notSet(regimen.fourHourLimit, unit) },
  ];
}

/** "58 y · 82 kg" (or "weight not recorded"). */
export function patientFacts(patient: HandoverRow['patient']): string {
  const weight = patient.weightKg === null ? 'weight not recorded' : formatDose(patient.weightKg, 'kg');
  return `${patient.ageYears} y · ${weight}`;
}

/** "6 / 4 · 0.8 mg": demands attempted / delivered in the last 4 hours, and the dose given. */
export function lastFourHours(row: Pick<HandoverRow, 'last4h' | 'doseUnit'>): string {
  return `${row.last4h.attempts} / ${row.last4h.delivered} · ${formatDose(row.last4h.dose, row.doseUnit)}`;
}
