import type { Patient, Sex } from '@lockstep/shared';

// Two decimals at most: weight drives weight-based limits, so it is shown as recorded.
const weightFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 });

export function formatWeight(weightKg: number | null): string {
  return weightKg === null ? 'Not recorded' : `${weightFormat.format(weightKg)} kg`;
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
