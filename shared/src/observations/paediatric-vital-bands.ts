/**
 * Age-banded respiratory and heart rates for children, used instead of the adult (NEWS2) bands on a paediatric
 * ward or for a patient under 16.
 *
 * Normal ranges: Advanced Life Support Group, Advanced Paediatric Life Support (APLS): a practical approach to
 * emergencies, 6th edition, Wiley-Blackwell, 2016, table of normal vital signs by age (values from memory of
 * that table; confirm against the edition the ward uses). Outside the normal range → review.
 *
 * Urgent respiratory rates for a child on an opioid infusion or PCA: from memory of the Association of
 * Paediatric Anaesthetists of Great Britain and Ireland, Good Practice in Postoperative and Procedural Pain
 * Management, 2nd edition, 2012 (monitoring of children on opioid infusions), which gives a minimum rate by age
 * below which to call for help; the values here are from memory, to be confirmed by the ward.
 */
export type PaediatricVitalBand = {
  /** Applies from this age in whole years (inclusive) up to the next band's. */
  fromYears: number;
  label: string;
  /** APLS normal respiratory rate per minute (from memory). */
  respiratoryRate: { low: number; high: number };
  /** Below this rate per minute is urgent (APAGBI 2012, from memory). */
  respiratoryRateUrgentBelow: number;
  /** APLS normal heart rate per minute (from memory). */
  heartRate: { low: number; high: number };
};

export const PAEDIATRIC_VITAL_BANDS: readonly PaediatricVitalBand[] = [
  {
    fromYears: 0,
    label: 'under 1 year',
    respiratoryRate: { low: 30, high: 40 },
    respiratoryRateUrgentBelow: 20,
    heartRate: { low: 110, high: 160 },
  },
  {
    fromYears: 1,
    label: '1 to 2 years',
    respiratoryRate: { low: 25, high: 35 },
    respiratoryRateUrgentBelow: 15,
    heartRate: { low: 100, high: 150 },
  },
  {
    fromYears: 2,
    label: '2 to 5 years',
    respiratoryRate: { low: 25, high: 30 },
    respiratoryRateUrgentBelow: 15,
    heartRate: { low: 95, high: 140 },
  },
  {
    fromYears: 5,
    label: '5 to 12 years',
    respiratoryRate: { low: 20, high: 25 },
    respiratoryRateUrgentBelow: 12,
    heartRate: { low: 80, high: 120 },
  },
  {
    fromYears: 12,
    label: 'over 12 years',
    respiratoryRate: { low: 15, high: 20 },
    respiratoryRateUrgentBelow: 10,
    heartRate: { low: 60, high: 100 },
  },
];

export const PAEDIATRIC_BANDS_SOURCE =
  'APLS normal values (Advanced Life Support Group, 6th ed., 2016) and APAGBI Good Practice in Postoperative and Procedural Pain Management (2012), from memory';

/** The band for a child's age in whole years; null for an unknown, negative or non-finite age. */
export function paediatricVitalBand(ageYears: number | null): PaediatricVitalBand | null {
  if (ageYears === null || !Number.isFinite(ageYears) || ageYears < 0) return null;
  let band: PaediatricVitalBand | null = null;
  for (const candidate of PAEDIATRIC_VITAL_BANDS) if (ageYears >= candidate.fromYears) band = candidate;
  return band;
}
