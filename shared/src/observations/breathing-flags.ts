import type { FlagDraft } from './observation-flags.js';
import { CONSCIOUSNESS_LABELS, type Consciousness, news2, NEWS2_NOT_FOR_CHILDREN, NEWS2_RESPONSE_WORDS, type Spo2Scale } from './news2.js';
import { paediatricVitalBand } from './paediatric-vital-bands.js';
import type { WardPolicy } from './ward-policy.js';

/** The vital signs of one observation the breathing and early-warning flags read; all but RR and SpO2 optional. */
export type VitalSigns = {
  respiratoryRate: number;
  spo2: number;
  /** Litres per minute of supplemental oxygen; 0 or null is air. */
  oxygenLitresPerMinute?: number | null;
  heartRate?: number | null;
  systolicBp?: number | null;
  temperatureC?: number | null;
  consciousness?: Consciousness | null;
};

/** Who the patient is, for which bands apply. */
export type VitalsPatient = {
  /** Whole years; null when not known. */
  ageYears: number | null;
  /** The ward's population is paediatric. */
  paediatricWard: boolean;
  /** NEWS2 SpO2 scale chosen by a prescriber: 2 for confirmed hypercapnic respiratory failure. */
  spo2Scale: Spo2Scale;
};

export const ADULT_VITALS_PATIENT: VitalsPatient = { ageYears: null, paediatricWard: false, spo2Scale: '1' };

/** Children's bands apply on a paediatric ward, or for a patient under 16 (the age NEWS2 starts: RCP, NEWS2, 2017). */
export function usesPaediatricBands(patient: VitalsPatient): boolean {
  return patient.paediatricWard || (patient.ageYears !== null && patient.ageYears < 16);
}

const RR_URGENT_ACTION = 'Stay with the patient, rouse them, pause the PCA, give oxygen and call for help per protocol; consider naloxone';
const RR_REVIEW_ACTION =
  'Check sedation and breathing again within 15 minutes and tell the nurse in charge; do not give more opioid until reviewed';
const SPO2_URGENT_ACTION = 'Stay with the patient, check the airway and oxygen, pause the PCA and call for help per protocol';
const SPO2_REVIEW_ACTION = 'Recheck the probe and the patient, check sedation and breathing, and tell the nurse in charge';

/**
 * Respiratory-rate, SpO2, children's heart-rate and NEWS2 flags for one observation. Adults follow NEWS2's bands
 * (Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017): RR ≤ 8 urgent (scores 3), 9–11
 * review (scores 1); SpO2 scale 1 ≤ 91 % urgent (3), 92–93 % review (2); scale 2 ≤ 83 % urgent (3), 84–87 %
 * review (2 or 1, from memory). The ward policy's "urgent below" settings can only make these earlier. Children
 * use the age bands of `paediatric-vital-bands.ts` for RR and heart rate; SpO2 keeps scale 1's thresholds
 * (common practice). Pure.
 */
export function breathingFlags(vitals: VitalSigns, patient: VitalsPatient, policy: WardPolicy): FlagDraft[] {
  const flags: FlagDraft[] = [];
  const rr = vitals.respiratoryRate;
  const child = usesPaediatricBands(patient);
  const band = child ? paediatricVitalBand(patient.ageYears) : null;

  // Respiratory rate.
  const adultUrgentBelow = Math.max(9, policy.respiratoryRateThreshold); // ≤ 8 always urgent (NEWS2 scores 3)
  const urgentBelow = band ? Math.max(band.respiratoryRateUrgentBelow, adultUrgentBelow) : adultUrgentBelow;
  if (rr < urgentBelow) {
    flags.push({
      severity: 'urgent',
      code: 'respiratory-rate.low',
      message: band
        ? `Respiratory rate ${rr}/min, below ${urgentBelow}/min for a child ${band.label}`
        : `Respiratory rate ${rr}/min, at or below ${urgentBelow - 1}/min`,
      action: RR_URGENT_ACTION,
    });
  } else if (band ? rr < band.respiratoryRate.low : rr <= 11) {
    flags.push({
      severity: 'review',
      code: 'respiratory-rate.review',
      message: band
        ? `Respiratory rate ${rr}/min, below the normal ${band.respiratoryRate.low}–${band.respiratoryRate.high}/min for a child ${band.label}`
        : `Respiratory rate ${rr}/min (9–11/min scores 1 on NEWS2)`,
      action: RR_REVIEW_ACTION,
    });
  } else if (band && rr > band.respiratoryRate.high) {
    flags.push({
      severity: 'review',
      code: 'respiratory-rate.high',
      message: `Respiratory rate ${rr}/min, above the normal ${band.respiratoryRate.low}–${band.respiratoryRate.high}/min for a child ${band.label}`,
      action: 'Check for pain, distress, fever or a breathing problem and tell the nurse in charge',
    });
  }

  // Heart rate, children only (adults are scored by NEWS2).
  const hr = vitals.heartRate;
  if (band && typeof hr === 'number' && Number.isFinite(hr) && (hr < band.heartRate.low || hr > band.heartRate.high)) {
    flags.push({
      severity: 'review',
      code: hr < band.heartRate.low ? 'heart-rate.low' : 'heart-rate.high',
      message: `Heart rate ${hr}/min, outside the normal ${band.heartRate.low}–${band.heartRate.high}/min for a child ${band.label}`,
      action: 'Check the patient, sedation and breathing, and tell the nurse in charge',
    });
  }

  // SpO2.
  const scale2 = !child && patient.spo2Scale === '2';
  const spo2UrgentBelow = scale2 ? 84 : Math.max(92, policy.spo2Threshold);
  const spo2ReviewBelow = scale2 ? 88 : 94;
  const onOxygen = (vitals.oxygenLitresPerMinute ?? 0) > 0;
  const oxygenWords = onOxygen ? ` on ${vitals.oxygenLitresPerMinute} L/min oxygen` : '';
  if (vitals.spo2 < spo2UrgentBelow) {
    flags.push({
      severity: 'urgent',
      code: 'spo2.low',
      message: `SpO2 ${vitals.spo2} %${oxygenWords}, at or below ${spo2UrgentBelow - 1} %${scale2 ? ' (scale 2)' : ''}`,
      action: SPO2_URGENT_ACTION,
    });
  } else if (vitals.spo2 < spo2ReviewBelow) {
    flags.push({
      severity: 'review',
      code: 'spo2.review',
      message: `SpO2 ${vitals.spo2} %${oxygenWords}, below ${spo2ReviewBelow} %${scale2 ? ' (scale 2)' : ''}`,
      action: SPO2_REVIEW_ACTION,
    });
  }

  // NEWS2 for adults with a full set.
  const score = child ? null : news2Of(vitals, patient);
  if (score && score.response !== 'low') {
    flags.push({
      severity: 'urgent',
      code: score.response === 'high' ? 'news2.emergency' : 'news2.urgent',
      message: `NEWS2 ${score.total}${score.response === 'low-medium' ? ' with a single parameter scoring 3' : ''}`,
      action: NEWS2_RESPONSE_WORDS[score.response],
    });
  }
  if (vitals.consciousness && vitals.consciousness !== 'alert' && child) {
    flags.push({
      severity: 'urgent',
      code: 'consciousness.not-alert',
      message: `Consciousness: ${CONSCIOUSNESS_LABELS[vitals.consciousness]}`,
      action: 'Stay with the patient, pause the PCA and call for help per protocol; consider naloxone',
    });
  }
  return flags;
}

/** NEWS2 for these vitals, or null (child, unknown age, or an incomplete set). */
export function news2Of(vitals: VitalSigns, patient: VitalsPatient) {
  if (usesPaediatricBands(patient)) return null;
  return news2(
    {
      respiratoryRate: vitals.respiratoryRate,
      spo2: vitals.spo2,
      oxygenLitresPerMinute: vitals.oxygenLitresPerMinute ?? null,
      heartRate: vitals.heartRate ?? null,
      systolicBp: vitals.systolicBp ?? null,
      temperatureC: vitals.temperatureC ?? null,
      consciousness: vitals.consciousness ?? null,
    },
    patient.spo2Scale,
    patient.ageYears,
  );
}

/** Why NEWS2 is not scored for these vitals, or null when it is. */
export function news2NotScoredReason(vitals: VitalSigns, patient: VitalsPatient): string | null {
  if (usesPaediatricBands(patient)) return NEWS2_NOT_FOR_CHILDREN;
  if (patient.ageYears === null) return 'NEWS2 is not scored: the patient’s age is not known';
  if (news2Of(vitals, patient)) return null;
  return 'NEWS2 needs the full set: respiratory rate, SpO2, air or oxygen, systolic blood pressure, heart rate, consciousness and temperature';
}
