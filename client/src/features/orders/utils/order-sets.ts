import { withoutFloatNoise, type DoseUnit, type LimitRuleResponse, type RegimenField } from '@lockstep/shared';

/** A standard starting regimen a prescriber can load into the form and then adjust. */
export type OrderSet = {
  id: string;
  label: string;
  /** Generic name, matched to the limit rule's drug name whatever its case. */
  drugName: string;
  concentrationPerMl: number;
  doseUnit: DoseUnit;
  /** Doses below are per kg of body weight: offered on weight-based wards only. */
  perKg: boolean;
  demandDose: number;
  lockoutMinutes: number;
  basalRatePerHour: number;
  /** The order's own 1-hour limit, or null to leave it to the rule. */
  oneHourLimit: number | null;
  fourHourLimit: number | null;
};

export const ORDER_SETS: readonly OrderSet[] = [
  // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: adult opioid-naive starting demand doses,
  // no basal rate, lockout 10 minutes, at the standard concentrations.
  {
    id: 'adult-morphine',
    label: 'Adult morphine',
    drugName: 'morphine',
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg: false,
    demandDose: 1,
    lockoutMinutes: 10,
    basalRatePerHour: 0,
    oneHourLimit: null,
    fourHourLimit: 30,
  },
  // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory].
  {
    id: 'adult-hydromorphone',
    label: 'Adult hydromorphone',
    drugName: 'hydromorphone',
    concentrationPerMl: 0.2,
    doseUnit: 'mg',
    perKg: false,
    demandDose: 0.2,
    lockoutMinutes: 10,
    basalRatePerHour: 0,
    oneHourLimit: null,
    fourHourLimit: 6,
  },
  // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory].
  {
    id: 'adult-fentanyl',
    label: 'Adult fentanyl',
    drugName: 'fentanyl',
    concentrationPerMl: 10,
    doseUnit: 'mcg',
    perKg: false,
    demandDose: 10,
    lockoutMinutes: 10,
    basalRatePerHour: 0,
    oneHourLimit: null,
    fourHourLimit: 300,
  },
  // Association of Paediatric Anaesthetists of Great Britain and Ireland, Good Practice in
  // Postoperative and Procedural Pain Management: morphine PCA bolus 10–20 mcg/kg; 0.02 mg/kg
  // is 20 mcg/kg, lockout 10 minutes, no background infusion. Every 10 minutes that could add up
  // to 0.12 mg/kg an hour and 0.48 mg/kg in 4 hours, so the set holds them with the order's own
  // limits of 0.1 mg/kg an hour and 0.3 mg/kg in 4 hours: common practice [from memory], the
  // ward's rule decides.
  {
    id: 'paediatric-morphine',
    label: 'Paediatric morphine (per kg)',
    drugName: 'morphine',
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg: true,
    demandDose: 0.02,
    lockoutMinutes: 10,
    basalRatePerHour: 0,
    oneHourLimit: 0.1,
    fourHourLimit: 0.3,
  },
];

const SAME_CONCENTRATION = 1e-9;

export type AvailableOrderSet = { set: OrderSet; rule: LimitRuleResponse };

/**
 * The sets a ward can use: its active library has the set's drug and concentration in the same
 * unit with limits of the same kind (per kg or not), and the set is weight-based exactly when the
 * ward doses by weight.
 */
export function availableOrderSets(
  rules: readonly LimitRuleResponse[],
  weightBasedWard: boolean,
  sets: readonly OrderSet[] = ORDER_SETS,
): AvailableOrderSet[] {
  const available: AvailableOrderSet[] = [];
  for (const set of sets) {
    if (set.perKg !== weightBasedWard) continue;
    const rule = rules.find(
      (candidate) =>
        candidate.drugName.toLowerCase() === set.drugName.toLowerCase() &&
        candidate.doseUnit === set.doseUnit &&
        candidate.perKg === set.perKg &&
        Math.abs(candidate.concentrationPerMl - set.concentrationPerMl) < SAME_CONCENTRATION,
    );
    if (rule) available.push({ set, rule });
  }
  return available;
}

/** The regimen values a set puts into the form, as the text the inputs hold. */
export type OrderSetPrefill = { ruleId: string } & Record<RegimenField, string>;

function amountText(value: number | null): string {
  return value === null ? '' : String(withoutFloatNoise(value));
}

/**
 * The form values for a set; per-kg doses are multiplied by the patient's weight (0.02 mg/kg ×
 * 24.5 kg = 0.49 mg). Null when a per-kg set meets a patient with no usable weight.
 */
export function prefillFromSet(set: OrderSet, rule: LimitRuleResponse, weightKg: number | null): OrderSetPrefill | null {
  let factor = 1;
  if (set.perKg) {
    if (weightKg === null || !Number.isFinite(weightKg) || weightKg <= 0) return null;
    factor = weightKg;
  }
  return {
    ruleId: String(rule.id),
    loadingDose: '',
    demandDose: amountText(set.demandDose * factor),
    lockoutMinutes: amountText(set.lockoutMinutes),
    basalRatePerHour: amountText(set.basalRatePerHour * factor),
    oneHourLimit: amountText(set.oneHourLimit === null ? null : set.oneHourLimit * factor),
    fourHourLimit: amountText(set.fourHourLimit === null ? null : set.fourHourLimit * factor),
    clinicianBolusDose: '',
  };
}
