/**
 * Weight-for-age references. From birth to 2 years: the WHO Child Growth Standards (WHO
 * Multicentre Growth Reference Study Group, WHO Child Growth Standards: length/height-for-age,
 * weight-for-age, weight-for-length, weight-for-height and body mass index-for-age: methods and
 * development, World Health Organization, Geneva, 2006), weight-for-age tables by month (Month, L,
 * M, S). From 2 to 20 years: the CDC 2000 growth charts
 * (National Center for Health Statistics, CDC; Kuczmarski RJ et al., "2000 CDC Growth Charts for
 * the United States: Methods and Development", Vital Health Stat 11(246), 2002), LMS parameters as
 * published in the chart data file `wtage.csv` ("Weight-for-age charts, 2 to 20 years, LMS
 * parameters and selected smoothed weight percentiles in kilograms, by sex and age").
 *
 * Only the yearly rows are embedded (the file has one row per half month); between rows L, M and S
 * are interpolated linearly. `ageMonths` in the rows is the file's `Agemos`: 24.5 is the middle of
 * the month from 24 to 25 months, so a child of whole months m is looked up at m + 0.5.
 */

export type GrowthSex = 'male' | 'female';

/** One row of `wtage.csv`: age in months (Agemos), the Box-Cox power L, the median M (kg), the coefficient of variation S. */
export type LmsRow = { ageMonths: number; l: number; m: number; s: number };

/** WHO Child Growth Standards weight-for-age, boys: months 0 to 6, then every 3 months to 24. */
const WHO_WEIGHT_FOR_AGE_BOYS: readonly LmsRow[] = [
  { ageMonths: 0, l: 0.3487, m: 3.3464, s: 0.14602 },
  { ageMonths: 1, l: 0.2297, m: 4.4709, s: 0.13395 },
  { ageMonths: 2, l: 0.197, m: 5.5675, s: 0.12385 },
  { ageMonths: 3, l: 0.1738, m: 6.3762, s: 0.11727 },
  { ageMonths: 4, l: 0.1553, m: 7.0023, s: 0.11316 },
  { ageMonths: 5, l: 0.1395, m: 7.5105, s: 0.1108 },
  { ageMonths: 6, l: 0.1257, m: 7.934, s: 0.10958 },
  { ageMonths: 9, l: 0.0917, m: 8.9014, s: 0.10881 },
  { ageMonths: 12, l: 0.0644, m: 9.6479, s: 0.10925 },
  { ageMonths: 15, l: 0.0413, m: 10.3108, s: 0.11007 },
  { ageMonths: 18, l: 0.0211, m: 10.9385, s: 0.11119 },
  { ageMonths: 21, l: 0.0029, m: 11.5486, s: 0.11261 },
  { ageMonths: 24, l: -0.0137, m: 12.1515, s: 0.11426 },
];

/** WHO Child Growth Standards weight-for-age, girls: the same months. */
const WHO_WEIGHT_FOR_AGE_GIRLS: readonly LmsRow[] = [
  { ageMonths: 0, l: 0.3809, m: 3.2322, s: 0.14171 },
  { ageMonths: 1, l: 0.1714, m: 4.1873, s: 0.13724 },
  { ageMonths: 2, l: 0.0962, m: 5.1282, s: 0.13 },
  { ageMonths: 3, l: 0.0402, m: 5.8458, s: 0.12619 },
  { ageMonths: 4, l: -0.005, m: 6.4237, s: 0.12402 },
  { ageMonths: 5, l: -0.043, m: 6.8985, s: 0.12274 },
  { ageMonths: 6, l: -0.0756, m: 7.297, s: 0.12204 },
  { ageMonths: 9, l: -0.1507, m: 8.2254, s: 0.12199 },
  { ageMonths: 12, l: -0.2024, m: 8.9481, s: 0.12268 },
  { ageMonths: 15, l: -0.2384, m: 9.6008, s: 0.12299 },
  { ageMonths: 18, l: -0.2637, m: 10.2315, s: 0.12309 },
  { ageMonths: 21, l: -0.2815, m: 10.8534, s: 0.12335 },
  { ageMonths: 24, l: -0.2941, m: 11.4775, s: 0.1239 },
];

/** CDC 2000 `wtage.csv`, Sex = 1 (male), rows at Agemos 24, 36.5, 48.5 … 228.5 and 240. */
const CDC_WEIGHT_FOR_AGE_MALE: readonly LmsRow[] = [
  { ageMonths: 24, l: -0.20615245, m: 12.6707633, s: 0.108125811 },
  { ageMonths: 36.5, l: -0.621319726, m: 14.40262749, s: 0.111874514 },
  { ageMonths: 48.5, l: -0.915241589, m: 16.31676727, s: 0.11995532 },
  { ageMonths: 60.5, l: -1.000453886, m: 18.48592413, s: 0.129879257 },
  { ageMonths: 72.5, l: -1.087471249, m: 20.77769565, s: 0.139142773 },
  { ageMonths: 84.5, l: -1.236497304, m: 23.16741888, s: 0.147337375 },
  { ageMonths: 96.5, l: -1.351813296, m: 25.75256528, s: 0.155973912 },
  { ageMonths: 108.5, l: -1.339405453, m: 28.68130005, s: 0.166659247 },
  { ageMonths: 120.5, l: -1.206688407, m: 32.08799062, s: 0.17892874 },
  { ageMonths: 132.5, l: -1.019277299, m: 36.07262569, s: 0.190029545 },
  { ageMonths: 144.5, l: -0.836961905, m: 40.67443658, s: 0.196591612 },
  { ageMonths: 156.5, l: -0.698166437, m: 45.81336172, s: 0.196662115 },
  { ageMonths: 168.5, l: -0.631876912, m: 51.23096332, s: 0.190808471 },
  { ageMonths: 180.5, l: -0.665609025, m: 56.49095862, s: 0.181665781 },
  { ageMonths: 192.5, l: -0.801993069, m: 61.09536847, s: 0.172459052 },
  { ageMonths: 204.5, l: -0.973244762, m: 64.69961427, s: 0.16564009 },
  { ageMonths: 216.5, l: -1.066224038, m: 67.28992603, s: 0.161922819 },
  { ageMonths: 228.5, l: -1.023291946, m: 69.19467288, s: 0.160138158 },
  { ageMonths: 240, l: -0.91648762, m: 70.59761453, s: 0.161476792 },
];

/** CDC 2000 `wtage.csv`, Sex = 2 (female), the same ages. */
const CDC_WEIGHT_FOR_AGE_FEMALE: readonly LmsRow[] = [
  { ageMonths: 24, l: -0.73533951, m: 12.05503983, s: 0.107399495 },
  { ageMonths: 36.5, l: -1.024471278, m: 13.94108332, s: 0.119491669 },
  { ageMonths: 48.5, l: -1.177029925, m: 15.87823668, s: 0.131802186 },
  { ageMonths: 60.5, l: -1.287691525, m: 18.02313904, s: 0.141190842 },
  { ageMonths: 72.5, l: -1.326763834, m: 20.33635961, s: 0.149589838 },
  { ageMonths: 84.5, l: -1.265548787, m: 22.86804258, s: 0.159693163 },
  { ageMonths: 96.5, l: -1.127684095, m: 25.7570168, s: 0.172147043 },
  { ageMonths: 108.5, l: -0.970685789, m: 29.14291171, s: 0.185201039 },
  { ageMonths: 120.5, l: -0.846872805, m: 33.06392318, s: 0.195947008 },
  { ageMonths: 132.5, l: -0.787374433, m: 37.39088668, s: 0.201971282 },
  { ageMonths: 144.5, l: -0.807599577, m: 41.82797963, s: 0.202298783 },
  { ageMonths: 156.5, l: -0.915513542, m: 45.98368656, s: 0.197363191 },
  { ageMonths: 168.5, l: -1.111606122, m: 49.49075409, s: 0.188559804 },
  { ageMonths: 180.5, l: -1.376478254, m: 52.13568193, s: 0.177946804 },
  { ageMonths: 192.5, l: -1.651248208, m: 53.94543725, s: 0.168124538 },
  { ageMonths: 204.5, l: -1.838091576, m: 55.18216811, s: 0.161752634 },
  { ageMonths: 216.5, l: -1.850946286, m: 56.22969564, s: 0.16036959 },
  { ageMonths: 228.5, l: -1.693267093, m: 57.35175792, s: 0.163138124 },
  { ageMonths: 240, l: -1.51336185, m: 58.21897289, s: 0.166644749 },
];

type Reference = { name: string; tables: Readonly<Record<GrowthSex, readonly LmsRow[]>> };
const WHO: Reference = {
  name: 'WHO Child Growth Standards weight-for-age',
  tables: { male: WHO_WEIGHT_FOR_AGE_BOYS, female: WHO_WEIGHT_FOR_AGE_GIRLS },
};
const CDC: Reference = { name: 'CDC 2000 weight-for-age', tables: { male: CDC_WEIGHT_FOR_AGE_MALE, female: CDC_WEIGHT_FOR_AGE_FEMALE } };

/**
 * Under 24 months the WHO standard, from 24 months the CDC reference: the split the CDC recommends
 * (Grummer-Strawn LM et al., Use of World Health Organization and CDC growth charts for children
 * aged 0-59 months in the United States, MMWR Recomm Rep 2010;59(RR-9):1-15; from memory).
 */
const CDC_FROM_MONTHS = 24;

/** The oldest whole-month age the references cover (up to, not including, 240 months). */
export const WEIGHT_FOR_AGE_MAX_MONTHS = 239;

/**
 * A weight whose z-score is beyond ±3 (outside about the 0.1st to 99.9th centile) is asked to be
 * checked. Common practice for a re-check prompt, not a published cut-off: the WHO calls weight-
 * for-age below −3 z "severely underweight" (WHO Training Course on Child Growth Assessment, 2008),
 * and the CDC's own cut-offs for biologically implausible weights (modified z below −5 or above +8;
 * CDC, "Cut-offs to define outliers in the 2000 CDC Growth Charts", from memory) are meant for
 * cleaning survey data and would let a weight typed in pounds through.
 */
export const IMPLAUSIBLE_WEIGHT_Z = 3;

/**
 * L, M and S for an age in months, interpolated linearly between the embedded rows: WHO's below
 * 24 months, the CDC's (Agemos) from 24 to 240; null outside.
 */
export function weightForAgeLms(sex: GrowthSex, ageMonths: number): LmsRow | null {
  const rows = (ageMonths < CDC_FROM_MONTHS ? WHO : CDC).tables[sex];
  if (!Number.isFinite(ageMonths) || ageMonths < rows[0].ageMonths || ageMonths > rows[rows.length - 1].ageMonths) return null;
  const upper = rows.findIndex((row) => row.ageMonths >= ageMonths);
  const b = rows[upper];
  if (b.ageMonths === ageMonths || upper === 0) return b;
  const a = rows[upper - 1];
  const t = (ageMonths - a.ageMonths) / (b.ageMonths - a.ageMonths);
  const mix = (x: number, y: number) => x + (y - x) * t;
  return { ageMonths, l: mix(a.l, b.l), m: mix(a.m, b.m), s: mix(a.s, b.s) };
}

/**
 * The LMS z-score of a measurement: ((X/M)^L − 1) / (L·S), or ln(X/M)/S when L is 0 (Cole TJ,
 * "The LMS method for constructing normalized growth standards", Eur J Clin Nutr 1990;44:45-60).
 */
export function lmsZScore(value: number, lms: LmsRow): number {
  if (lms.l === 0) return Math.log(value / lms.m) / lms.s;
  return ((value / lms.m) ** lms.l - 1) / (lms.l * lms.s);
}

/** The weight at a z-score: M·(1 + L·S·z)^(1/L) (the inverse of `lmsZScore`). */
export function lmsValueAt(z: number, lms: LmsRow): number {
  if (lms.l === 0) return lms.m * Math.exp(lms.s * z);
  return lms.m * (1 + lms.l * lms.s * z) ** (1 / lms.l);
}

export type WeightPlausibility =
  | { kind: 'plausible'; zScore: number }
  | { kind: 'implausible'; zScore: number; low: number; high: number; median: number; reference: string }
  /** The age is outside the references (20 years and over, or not a real age): the weight is not checked. */
  | { kind: 'not-checked'; reason: string };

/**
 * Whether a child's weight is plausible for their age (whole months, looked up at the middle of the
 * month) and sex: WHO Child Growth Standards under 2 years, CDC 2000 from 2 to 20 years; outside ±3
 * z is implausible. With a sex other than female or male the weight is plausible if it is plausible
 * for either. Never answers "plausible" for an age the references do not cover.
 */
export function weightPlausibility(weightKg: number, ageMonths: number, sex: string | null | undefined): WeightPlausibility {
  if (!Number.isFinite(ageMonths) || ageMonths < 0 || ageMonths > WEIGHT_FOR_AGE_MAX_MONTHS) {
    return { kind: 'not-checked', reason: 'the weight-for-age references cover ages from birth to 20 years' };
  }
  const sexes: GrowthSex[] = sex === 'male' || sex === 'female' ? [sex] : ['female', 'male'];
  const results = sexes.map((s) => {
    const lms = weightForAgeLms(s, ageMonths + 0.5)!;
    return { lms, z: lmsZScore(weightKg, lms) };
  });
  const plausible = results.find((result) => Number.isFinite(result.z) && Math.abs(result.z) <= IMPLAUSIBLE_WEIGHT_Z);
  if (plausible) return { kind: 'plausible', zScore: plausible.z };
  const closest = results.reduce((a, b) => (Math.abs(a.z) <= Math.abs(b.z) ? a : b));
  const low = Math.min(...results.map((result) => lmsValueAt(-IMPLAUSIBLE_WEIGHT_Z, result.lms)));
  const high = Math.max(...results.map((result) => lmsValueAt(IMPLAUSIBLE_WEIGHT_Z, result.lms)));
  const reference = `${(ageMonths < CDC_FROM_MONTHS ? WHO : CDC).name}`;
  return { kind: 'implausible', zScore: closest.z, low, high, median: closest.lms.m, reference };
}
