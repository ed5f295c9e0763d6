import {
  blockingFindings,
  checkOrder,
  type Finding,
  type LimitRuleResponse,
  type Override,
  type PatientFactors,
  type Regimen,
  softFindingFields,
} from '@lockstep/shared';
import type { Random } from './random.js';

export type ScaleRegimen = Required<Regimen> & { drug: string; indication: string; syringeMl: number };

const ADULT_INDICATIONS = [
  'Pain after laparotomy',
  'Pain after hip replacement',
  'Pain after knee replacement',
  'Pain after bowel resection',
  'Pain after rib fractures',
  'Pain after open nephrectomy',
  'Pain after spinal fusion',
];
const CHILD_INDICATIONS = ['Pain after appendicectomy', 'Pain after femoral fracture fixation', 'Pain after scoliosis surgery'];

const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places;

/** A regimen inside the ward library's soft limits, like those the demo orders use (invented values). */
export function pickRegimen(random: Random, child: boolean, weightKg: number): ScaleRegimen {
  const base = { loadingDose: null, oneHourLimit: null, syringeMl: 50 };
  if (child) {
    const basal = random.chance(0.2) ? round(0.004 * weightKg, 3) : 0;
    return {
      ...base,
      drug: 'morphine',
      doseUnit: 'mg',
      concentrationPerMl: 1,
      demandDose: round(0.02 * weightKg, 2),
      lockoutMinutes: random.pick([5, 10]),
      basalRatePerHour: basal,
      // Holds what the pump could give in an hour (demand every 5 minutes, basal, a bolus) to the soft maximum.
      oneHourLimit: round(0.1 * weightKg, 2),
      fourHourLimit: round(0.3 * weightKg, 2),
      clinicianBolusDose: round(0.02 * weightKg, 2),
      indication: random.pick(CHILD_INDICATIONS),
    };
  }
  const roll = random.next();
  const indication = random.pick(ADULT_INDICATIONS);
  if (roll < 0.6) {
    return {
      ...base,
      drug: 'morphine',
      doseUnit: 'mg',
      concentrationPerMl: 1,
      demandDose: 1,
      lockoutMinutes: random.pick([6, 10]),
      basalRatePerHour: random.chance(0.2) ? 0.5 : 0,
      oneHourLimit: 10,
      fourHourLimit: 30,
      clinicianBolusDose: 2,
      indication,
    };
  }
  if (roll < 0.85) {
    return {
      ...base,
      drug: 'hydromorphone',
      doseUnit: 'mg',
      concentrationPerMl: 0.2,
      demandDose: 0.2,
      lockoutMinutes: 10,
      basalRatePerHour: random.chance(0.2) ? 0.1 : 0,
      fourHourLimit: 6,
      clinicianBolusDose: 0.4,
      indication,
    };
  }
  return {
    ...base,
    drug: 'fentanyl',
    doseUnit: 'mcg',
    concentrationPerMl: 10,
    demandDose: 20,
    lockoutMinutes: 6,
    basalRatePerHour: 0,
    oneHourLimit: 100,
    fourHourLimit: 300,
    clinicianBolusDose: 25,
    indication,
  };
}

/** The findings the server would have stored at signing, and the prescriber's reason for each soft one. */
export function signingRecord(
  regimen: ScaleRegimen,
  rule: LimitRuleResponse,
  patient: PatientFactors,
  reason = 'Agreed with the acute pain team (invented)',
): { findings: Finding[]; overrides: Override[] } {
  const context = { drug: { id: rule.drugId, genericName: rule.drugName }, today: new Date().toISOString().slice(0, 10) };
  const findings = checkOrder(regimen, { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits }, patient, context);
  const blocking = blockingFindings(findings);
  if (blocking.length > 0) {
    throw new Error(`A seeded ${regimen.drug} order would be refused at signing: ${blocking.map((f) => f.message).join('; ')}`);
  }
  const overrides = softFindingFields(findings).map((field) => ({ field, reason }));
  return { findings, overrides };
}
