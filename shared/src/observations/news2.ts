/**
 * NEWS2: the National Early Warning Score 2 (Royal College of Physicians, National Early Warning Score (NEWS)
 * 2: Standardising the assessment of acute-illness severity in the NHS, updated report of a working party,
 * London: RCP, 2017). Reproduced with acknowledgement of the Royal College of Physicians, as it asks. Every
 * band below is the RCP's Chart 1 (The NEWS scoring system), scale 2 included.
 *
 * Scored only for adults (16 and over): the RCP states NEWS2 is not validated for children or under-16s.
 */

export const NEWS2_CREDIT = 'NEWS2 © Royal College of Physicians 2017, reproduced with acknowledgement';
/** NEWS2 is not for children (RCP, NEWS2, 2017): scored from this age. */
export const NEWS2_MIN_AGE_YEARS = 16;
export const NEWS2_NOT_FOR_CHILDREN = 'NEWS2 is not scored for patients under 16: the RCP has not validated it for children';

export const CONSCIOUSNESS_LEVELS = ['alert', 'new-confusion', 'voice', 'pain', 'unresponsive'] as const;
export type Consciousness = (typeof CONSCIOUSNESS_LEVELS)[number];
export const CONSCIOUSNESS_LABELS: Record<Consciousness, string> = {
  alert: 'Alert',
  'new-confusion': 'New confusion',
  voice: 'Responds to voice',
  pain: 'Responds to pain',
  unresponsive: 'Unresponsive',
};

/** SpO2 scale 1 for most patients; scale 2 for confirmed hypercapnic respiratory failure, chosen by a prescriber. */
export const SPO2_SCALES = ['1', '2'] as const;
export type Spo2Scale = (typeof SPO2_SCALES)[number];

export type News2Input = {
  respiratoryRate: number;
  spo2: number;
  /** Litres per minute of supplemental oxygen; 0 (or null) is air. */
  oxygenLitresPerMinute: number | null;
  systolicBp: number | null;
  heartRate: number | null;
  consciousness: Consciousness | null;
  temperatureC: number | null;
};

export type News2Parameter = 'respiration' | 'spo2' | 'airOrOxygen' | 'systolicBp' | 'pulse' | 'consciousness' | 'temperature';

export type News2Response = 'low' | 'low-medium' | 'medium' | 'high';

export type News2Score = {
  parameters: Record<News2Parameter, number>;
  total: number;
  /** Aggregate 5–6 or any single parameter 3: urgent response; 7 or more: emergency response (RCP, NEWS2, 2017). */
  response: News2Response;
};

/** Respiration rate per minute: ≤8 3; 9–11 1; 12–20 0; 21–24 2; ≥25 3 (RCP, NEWS2, 2017). */
export function news2RespirationScore(rate: number): number {
  if (rate <= 8) return 3;
  if (rate <= 11) return 1;
  if (rate <= 20) return 0;
  if (rate <= 24) return 2;
  return 3;
}

/**
 * SpO2 in %. Scale 1: ≤91 3; 92–93 2; 94–95 1; ≥96 0 (RCP, NEWS2, 2017). Scale 2 (RCP NEWS2 Chart 1, 2017,
 * for hypercapnic respiratory failure with a target of 88–92 %): ≤83 3; 84–85 2; 86–87 1; 88–92, or ≥93 on air, 0; on oxygen 93–94 1, 95–96 2, ≥97 3.
 */
export function news2Spo2Score(spo2: number, scale: Spo2Scale, onOxygen: boolean): number {
  if (scale === '1') {
    if (spo2 <= 91) return 3;
    if (spo2 <= 93) return 2;
    if (spo2 <= 95) return 1;
    return 0;
  }
  if (spo2 <= 83) return 3;
  if (spo2 <= 85) return 2;
  if (spo2 <= 87) return 1;
  if (spo2 <= 92 || !onOxygen) return 0;
  if (spo2 <= 94) return 1;
  if (spo2 <= 96) return 2;
  return 3;
}

/** Systolic blood pressure mmHg: ≤90 3; 91–100 2; 101–110 1; 111–219 0; ≥220 3 (RCP, NEWS2, 2017). */
export function news2SystolicScore(systolic: number): number {
  if (systolic <= 90) return 3;
  if (systolic <= 100) return 2;
  if (systolic <= 110) return 1;
  if (systolic <= 219) return 0;
  return 3;
}

/** Pulse per minute: ≤40 3; 41–50 1; 51–90 0; 91–110 1; 111–130 2; ≥131 3 (RCP, NEWS2, 2017). */
export function news2PulseScore(pulse: number): number {
  if (pulse <= 40) return 3;
  if (pulse <= 50) return 1;
  if (pulse <= 90) return 0;
  if (pulse <= 110) return 1;
  if (pulse <= 130) return 2;
  return 3;
}

/** Temperature °C: ≤35.0 3; 35.1–36.0 1; 36.1–38.0 0; 38.1–39.0 1; ≥39.1 2 (RCP, NEWS2, 2017). */
export function news2TemperatureScore(celsius: number): number {
  const t = Math.round(celsius * 10) / 10; // the chart reads to one decimal
  if (t <= 35.0) return 3;
  if (t <= 36.0) return 1;
  if (t <= 38.0) return 0;
  if (t <= 39.0) return 1;
  return 2;
}

/** Alert 0; new confusion, voice, pain or unresponsive 3 (ACVPU, RCP, NEWS2, 2017). */
export function news2ConsciousnessScore(level: Consciousness): number {
  return level === 'alert' ? 0 : 3;
}

/**
 * The NEWS2 score when the full set is present on an adult; null when a value is missing or not finite, or the
 * patient is under 16 (or of unknown age). Pure.
 */
export function news2(input: News2Input, scale: Spo2Scale, ageYears: number | null): News2Score | null {
  if (ageYears === null || !Number.isFinite(ageYears) || ageYears < NEWS2_MIN_AGE_YEARS) return null;
  const { respiratoryRate, spo2, oxygenLitresPerMinute, systolicBp, heartRate, consciousness, temperatureC } = input;
  const numbers = [respiratoryRate, spo2, systolicBp, heartRate, temperatureC];
  if (numbers.some((n) => n === null || !Number.isFinite(n)) || consciousness === null) return null;
  if (oxygenLitresPerMinute !== null && !Number.isFinite(oxygenLitresPerMinute)) return null;
  const onOxygen = (oxygenLitresPerMinute ?? 0) > 0;
  const parameters: Record<News2Parameter, number> = {
    respiration: news2RespirationScore(respiratoryRate),
    spo2: news2Spo2Score(spo2, scale, onOxygen),
    airOrOxygen: onOxygen ? 2 : 0,
    systolicBp: news2SystolicScore(systolicBp!),
    pulse: news2PulseScore(heartRate!),
    consciousness: news2ConsciousnessScore(consciousness),
    temperature: news2TemperatureScore(temperatureC!),
  };
  const total = Object.values(parameters).reduce((a, b) => a + b, 0);
  return {
    parameters,
    total,
    response: news2Response(
      total,
      Object.values(parameters).some((s) => s === 3),
    ),
  };
}

/** 0–4 low; a single 3 low-medium (urgent ward review); 5–6 medium (urgent); 7+ high (emergency) (RCP, NEWS2, 2017). */
export function news2Response(total: number, anySingleThree: boolean): News2Response {
  if (total >= 7) return 'high';
  if (total >= 5) return 'medium';
  if (anySingleThree) return 'low-medium';
  return 'low';
}

export const NEWS2_RESPONSE_WORDS: Record<News2Response, string> = {
  low: 'Low: continue ward monitoring',
  'low-medium': 'A single parameter scores 3: urgent ward-based response',
  medium: 'Urgent response: a clinician competent in acute illness reviews the patient now',
  high: 'Emergency response: call the critical-care outreach or emergency team now',
};
