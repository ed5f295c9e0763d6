import { weightAgeDays, type Patient, type Sex } from '@lockstep/shared';
import { formatCalendarDate } from '@/utils/format-date';

// Two decimals at most: weight drives weight-based limits, so it is shown as recorded.
const weightFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 });

export function formatWeight(weightKg: number | null): string {
  return weightKg === null ? 'Not recorded' : `${weightFormat.format(weightKg)} kg`;
}

/** When the weight was measured: "measured 3 Dec 2026 (today)", "(5 days ago)", or that the date is not recorded. */
export function formatWeightDate(measuredOn: string | null, today: string): string {
  if (measuredOn === null) return 'date measured not recorded';
  const days = weightAgeDays(measuredOn, today);
  const ago = days === null ? '' : days <= 0 ? ' (today)' : days === 1 ? ' (yesterday)' : ` (${days} days ago)`;
  return `measured ${formatCalendarDate(measuredOn)}${ago}`;
}

/** The local calendar day, yyyy-mm-dd: what a ward means by "today". */
export function localToday(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

const SEX_LABELS: Record<Sex, string> = {
  female: 'Female',
  male: 'Male',
  other: 'Other',
  unknown: 'Not known',
};

export function formatSex(sex: Sex): string {
  return SEX_LABELS[sex];
}

/** Case-insensitive match on given name, family name (either order) or MRN. */
export function matchesPatientSearch(patient: Patient, search: string): boolean {
  const needle = search.trim().toLowerCase();
  if (!needle) return true;
  const haystacks = [
    `${patient.givenName} ${patient.familyName}`,
    `${patient.familyName} ${patient.givenName}`,
    `${patient.familyName}, ${patient.givenName}`,
    patient.mrn,
  ];
  return haystacks.some((text) => text.toLowerCase().includes(needle));
}
