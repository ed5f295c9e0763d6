/**
 * Age-banded respiratory and heart rates for children, used instead of the adult (NEWS2) bands on a paediatric
 * ward or for a patient under 16.
 *
 * Normal ranges: the Advanced Paediatric Life Support (APLS, Advanced Life Support Group) ranges as published in
 * Fleming S, Thompson M, Stevens R, Heneghan C, Plüddemann A, Maconochie I, Tarassenko L, Mant D. Normal ranges
 * of heart rate and respiratory rate in children from birth to 18 years of age: a systematic review of
 * observational studies. Lancet 2011;377(9770):1011–1018, web appendix, Web Box 1 "Existing reference ranges"
 * (row APLS/PHPLS). That table states, per age in years, RR 30–40 (0–1), 25–35 (1–2), 25–30 (2–3, 3–4, 4–5),
 * 20–25 (5–6, 6–12), 15–20 (12–13, 13–18) and HR 110–160 (0–1), 100–150 (1–2), 95–140 (2–3, 3–5), 80–120
 * (5–6, 6–10, 10–12), 60–100 (12–13, 13–18): the bands below, unchanged. Fleming et al. found these ranges
 * often disagree with measured centiles, and the APLS 6th edition (2016) gives 5th–95th centile ranges at rest
 * instead; a ward using those should change these values. Outside the normal range → review.
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
  /** APLS normal respiratory rate per minute (Fleming et al., Lancet 2011, web appendix Web Box 1). */
  respiratoryRate: { low: number; high: number };
  /** Below this rate per minute is urgent (APAGBI 2012, from memory). */
  respiratoryRateUrgentBelow: number;
  /** APLS normal heart rate per minute (Fleming et al., Lancet 2011, web appendix Web Box 1). */
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
  'APLS normal ranges as tabulated by Fleming et al., Lancet 2011 (web appendix, Web Box 1); urgent rates from memory of APAGBI Good Practice in Postoperative and Procedural Pain Management (2012)';

/** The band for a child's age in whole years; null for an unknown, negative or non-finite age. */
export function paediatricVitalBand(ageYears: number | null): PaediatricVitalBand | null {
  if (ageYears === null || !Number.isFinite(ageYears) || ageYears < 0) return null;
  let band: PaediatricVitalBand | null = null;
  for (const candidate of PAEDIATRIC_VITAL_BANDS) if (ageYears >= candidate.fromYears) band = candidate;
  return band;
}
