import { formatDose } from '../dose/format-dose.js';
import type { AllergySeverity } from '../dose/types.js';
import { ALLERGY_SEVERITIES } from './patient.schema.js';
import { meetsOpioidTolerance } from './opioid-tolerance.js';

/** "OKAFOR, Grace": family name in capitals, so it cannot be mistaken for a given name. */
export function patientDisplayName(patient: { familyName: string; givenName: string }): string {
  return `${patient.familyName.toLocaleUpperCase('en-GB')}, ${patient.givenName}`;
}

export const ALLERGY_SEVERITY_LABELS: Readonly<Record<AllergySeverity, string>> = {
  intolerance: 'Intolerance',
  allergy: 'Allergy',
  anaphylaxis: 'Anaphylaxis',
};

type AllergyRecord = {
  allergies: readonly { substance: string; reaction: string; severity: AllergySeverity }[];
  noKnownAllergies: boolean;
};

/**
 * What the record says about allergies: entries, "no known allergies" recorded by a clinician, or
 * nothing recorded yet. An empty list is never shown as "no known allergies" unless someone said so.
 */
export type AllergyStatus = 'recorded' | 'no-known-allergies' | 'not-recorded';

export function allergyStatus(patient: AllergyRecord): AllergyStatus {
  if (patient.allergies.length > 0) return 'recorded';
  return patient.noKnownAllergies ? 'no-known-allergies' : 'not-recorded';
}

/** The words for a record without entries. */
export const ALLERGY_STATUS_TEXT: Readonly<Record<Exclude<AllergyStatus, 'recorded'>, string>> = {
  'no-known-allergies': 'No known allergies',
  'not-recorded': 'Allergies not recorded',
};

/** Entries most severe first (anaphylaxis, allergy, intolerance), then by substance. */
export function sortAllergies<T extends { substance: string; severity: AllergySeverity }>(allergies: readonly T[]): T[] {
  const rank = (severity: AllergySeverity) => -ALLERGY_SEVERITIES.indexOf(severity);
  return [...allergies].sort((a, b) => rank(a.severity) - rank(b.severity) || a.substance.localeCompare(b.substance));
}

/** One entry in words: "Morphine: itch (Intolerance)". */
function allergyText(allergy: { substance: string; reaction: string; severity: AllergySeverity }): string {
  return `${allergy.substance}: ${allergy.reaction} (${ALLERGY_SEVERITY_LABELS[allergy.severity]})`;
}

/** Every entry in one line, most severe first, or the words for none: for tables and the board. */
export function allergiesSummary(patient: AllergyRecord): string {
  const status = allergyStatus(patient);
  return status === 'recorded' ? sortAllergies(patient.allergies).map(allergyText).join('; ') : ALLERGY_STATUS_TEXT[status];
}

export type PatientRiskFactor =
  'anaphylaxis' | 'allergies' | 'allergies-not-recorded' | 'opioid-tolerant' | 'sleep-apnoea' | 'other-sedatives';

export const PATIENT_RISK_FACTOR_LABELS: Readonly<Record<PatientRiskFactor, string>> = {
  anaphylaxis: 'Anaphylaxis',
  allergies: 'Allergies',
  'allergies-not-recorded': 'Allergies not recorded',
  'opioid-tolerant': 'Opioid tolerant',
  'sleep-apnoea': 'Sleep apnoea',
  'other-sedatives': 'Other sedatives',
};

/**
 * The patient's recorded risk factors for PCA, in the order screens show them. Any anaphylaxis
 * entry is its own marker; opioid tolerance counts only with a basis that meets the definition.
 */
export function patientRiskFactors(
  patient: AllergyRecord & {
    opioidTolerant: boolean;
    toleranceOralMorphineMgPerDay: number | null;
    toleranceDays: number | null;
    sleepApnoea: boolean;
    otherSedatives: boolean;
  },
): PatientRiskFactor[] {
  const factors: PatientRiskFactor[] = [];
  const status = allergyStatus(patient);
  if (patient.allergies.some((allergy) => allergy.severity === 'anaphylaxis')) factors.push('anaphylaxis');
  if (status === 'recorded') factors.push('allergies');
  if (status === 'not-recorded') factors.push('allergies-not-recorded');
  if (isOpioidTolerant(patient)) factors.push('opioid-tolerant');
  if (patient.sleepApnoea) factors.push('sleep-apnoea');
  if (patient.otherSedatives) factors.push('other-sedatives');
  return factors;
}

/** Tolerant for every check and screen: the claim, with a basis that meets the definition. */
export function isOpioidTolerant(patient: {
  opioidTolerant: boolean;
  toleranceOralMorphineMgPerDay: number | null;
  toleranceDays: number | null;
}): boolean {
  return (
    patient.opioidTolerant &&
    meetsOpioidTolerance({ oralMorphineMgPerDay: patient.toleranceOralMorphineMgPerDay, days: patient.toleranceDays })
  );
}

/** How the tolerance reads on screen, with its basis ("Opioid tolerant: 90 mg oral morphine a day for 30 days"). */
export function opioidToleranceText(patient: {
  opioidTolerant: boolean;
  toleranceOralMorphineMgPerDay: number | null;
  toleranceDays: number | null;
}): string {
  const mg = patient.toleranceOralMorphineMgPerDay;
  const days = patient.toleranceDays;
  const basis = mg !== null && days !== null ? `${formatDose(mg, 'mg')} oral morphine a day for ${days} day${days === 1 ? '' : 's'}` : null;
  if (isOpioidTolerant(patient)) return `Opioid tolerant: ${basis}`;
  if (patient.opioidTolerant) return 'Recorded as tolerant without a basis that meets the definition: checked as opioid-naive';
  return basis ? `Opioid-naive (${basis})` : 'Opioid-naive';
}
