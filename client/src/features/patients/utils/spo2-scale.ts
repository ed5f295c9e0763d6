import {
  ADULT_VITALS_PATIENT,
  breathingFlags,
  DEFAULT_WARD_POLICY,
  type FlagSeverity,
  SPO2_SCALES,
  type Spo2Scale,
  type WardPolicy,
} from '@lockstep/shared';

/** Where SpO2 raises an urgent or a review flag on one scale, for an adult on air. */
export type Spo2Bands = { urgentAtOrBelow: number; reviewFrom: number; reviewTo: number };

/** A calm respiratory rate beside each SpO2 tried, so only the SpO2 flag can be raised. */
const CALM_RATE = 16;

function spo2Severity(spo2: number, scale: Spo2Scale, policy: WardPolicy): FlagSeverity | null {
  const flags = breathingFlags(
    { respiratoryRate: CALM_RATE, spo2, oxygenLitresPerMinute: 0 },
    { ...ADULT_VITALS_PATIENT, spo2Scale: scale },
    policy,
  );
  const flag = flags.find((candidate) => candidate.code.startsWith('spo2'));
  return flag?.severity ?? null;
}

/**
 * The SpO2 bands of a scale, read from the shared breathing flags the server raises (so the words on
 * screen can never drift from them): NEWS2 (Royal College of Physicians, National Early Warning Score
 * (NEWS) 2, 2017) scale 1: 91 % or below urgent, 92–93 % review (a ward may flag earlier); scale 2, for
 * confirmed hypercapnic respiratory failure only: 83 % or below urgent, 84–87 % review.
 */
export function spo2Bands(scale: Spo2Scale, policy: WardPolicy = DEFAULT_WARD_POLICY): Spo2Bands {
  let urgentAtOrBelow = 0;
  let reviewFrom = 101;
  let reviewTo = 0;
  for (let spo2 = 50; spo2 <= 100; spo2++) {
    const severity = spo2Severity(spo2, scale, policy);
    if (severity === 'urgent') urgentAtOrBelow = spo2;
    if (severity === 'review') {
      reviewFrom = Math.min(reviewFrom, spo2);
      reviewTo = Math.max(reviewTo, spo2);
    }
  }
  return { urgentAtOrBelow, reviewFrom, reviewTo };
}

export const SPO2_SCALE_NAMES: Record<Spo2Scale, string> = {
  '1': 'Scale 1 (usual)',
  '2': 'Scale 2 (confirmed hypercapnic respiratory failure only)',
};

/** "SpO2 83 % or below raises an urgent flag, 84–87 % a review flag". */
export function spo2BandsText(scale: Spo2Scale, policy?: WardPolicy): string {
  const { urgentAtOrBelow, reviewFrom, reviewTo } = spo2Bands(scale, policy);
  return `SpO2 ${urgentAtOrBelow} % or below raises an urgent flag, ${reviewFrom}–${reviewTo} % a review flag`;
}

/** The scale the prescriber would change to. */
export function otherSpo2Scale(scale: Spo2Scale): Spo2Scale {
  return SPO2_SCALES.find((candidate) => candidate !== scale) ?? scale;
}

/**
 * What changing from one scale to the other does, said before the prescriber confirms: the bands
 * before and after, and who scale 2 is for.
 */
export function spo2ScaleChangeConsequence(to: Spo2Scale, policy?: WardPolicy): string {
  const from = otherSpo2Scale(to);
  const before = spo2Bands(from, policy);
  const after = spo2Bands(to, policy);
  const lowers = to === '2' ? 'lowers' : 'raises';
  return (
    `Scale ${to} ${lowers} the SpO2 bands for this patient’s observations from now on: ` +
    `${after.urgentAtOrBelow} % or below urgent and ${after.reviewFrom}–${after.reviewTo} % review, ` +
    `instead of ${before.urgentAtOrBelow} % or below and ${before.reviewFrom}–${before.reviewTo} %.` +
    (to === '2' ? ' Use it only for confirmed hypercapnic respiratory failure: for anyone else it hides falling oxygen saturation.' : '')
  );
}
