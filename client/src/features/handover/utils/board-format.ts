import {
  ALLERGY_SEVERITY_LABELS,
  ALLERGY_STATUS_TEXT,
  allergyStatus,
  formatDose,
  type AllergySeverity,
  type HandoverBoard,
  type HandoverRow,
} from '@lockstep/shared';
import { formatClock } from '@/utils/clock';
import { formatCalendarDate } from '@/utils/format-date';

/** "Night shift, 1 Dec 2026, 19:00–07:00". */
export function formatShift(shift: HandoverBoard['shift'], timeZone?: string): string {
  const name = shift.shift === 'day' ? 'Day shift' : 'Night shift';
  return `${name}, ${formatCalendarDate(shift.shiftDate)}, ${formatClock(shift.startsAt, timeZone)}–${formatClock(shift.endsAt, timeZone)}`;
}

/** "58 y · 82 kg" (or "weight not recorded"). */
export function patientFacts(patient: HandoverRow['patient']): string {
  const weight = patient.weightKg === null ? 'weight not recorded' : formatDose(patient.weightKg, 'kg');
  return `${patient.ageYears} y · ${weight}`;
}

/**
 * The patient's allergies as the board writes them, one line each, most severe first
 * ("Anaphylaxis: Latex (throat swelling)"), or the words for none recorded / no known allergies.
 */
export function allergyLines(patient: HandoverRow['patient']): { text: string; severity: AllergySeverity | null }[] {
  const status = allergyStatus(patient);
  if (status !== 'recorded') return [{ text: ALLERGY_STATUS_TEXT[status], severity: null }];
  return patient.allergies.map(({ substance, reaction, severity }) => ({
    text: `${ALLERGY_SEVERITY_LABELS[severity]}: ${substance} (${reaction})`,
    severity,
  }));
}

/** "6 / 4 · 0.8 mg": demands attempted / delivered in the last 4 hours, and the dose given. */
export function lastFourHours(row: Pick<HandoverRow, 'last4h' | 'doseUnit'>): string {
  return `${row.last4h.attempts} / ${row.last4h.delivered} · ${formatDose(row.last4h.dose, row.doseUnit)}`;
}
