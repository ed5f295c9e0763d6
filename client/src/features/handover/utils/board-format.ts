import { formatDose, tallMan, type HandoverBoard, type HandoverRow } from '@lockstep/shared';
import { formatClock } from '@/utils/clock';
import { formatCalendarDate } from '@/utils/format-date';

/** "Night shift, 1 Dec 2026, 19:00–07:00". */
export function formatShift(shift: HandoverBoard['shift'], timeZone?: string): string {
  const name = shift.shift === 'day' ? 'Day shift' : 'Night shift';
  return `${name}, ${formatCalendarDate(shift.shiftDate)}, ${formatClock(shift.startsAt, timeZone)}–${formatClock(shift.endsAt, timeZone)}`;
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
