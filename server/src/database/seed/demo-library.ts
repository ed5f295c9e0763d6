import { type DoseUnit, type Limits, populationKey, type RegimenField, type RulePopulation } from '@lockstep/shared';

// Demo dose-limit libraries: INVENTED values for the demo only, shaped after typical adult ranges
// (morphine 1 mg/mL demand 0.5–2 mg, lockout 5–10 min, 4-hour 30 mg; hydromorphone 0.2 mg/mL
// demand 0.1–0.4 mg, 4-hour 6 mg; fentanyl 10 mcg/mL demand 5–20 mcg, 4-hour 300 mcg) and the
// paediatric morphine bolus of 10–20 mcg/kg. Hard limits are invented. Not for clinical use.

type DemoRule = {
  drug: string;
  concentrationPerMl: number;
  doseUnit: DoseUnit;
  perKg: boolean;
  limits: Partial<Record<RegimenField, Limits>>;
} & Partial<RulePopulation> & { populationKey?: string };

// Wren's rules are for children from 1 to under 18 years weighing 10 kg or more (invented band);
// each per-kg dose limit has an absolute ceiling, about 50 to 62.5 kg times the per-kg hard maximum
// and never above the adult rule's hard maximum (invented; the scale seed's heaviest child is 62 kg).
const CHILDREN: RulePopulation = { population: 'paediatric', minAgeYears: 1, maxAgeYears: 18, minWeightKg: 10, maxWeightKg: null };
const forChildren = { ...CHILDREN, populationKey: populationKey(CHILDREN) };

const lockout: Limits = { hardMin: 5, softMin: 6, softMax: 15, hardMax: 30 };

const ADULT_RULES: DemoRule[] = [
  {
    drug: 'morphine',
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg: false,
    limits: {
      loadingDose: { softMax: 5, hardMax: 10 },
      demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 },
      lockoutMinutes: lockout,
      basalRatePerHour: { softMax: 1, hardMax: 2 },
      oneHourLimit: { softMax: 10, hardMax: 15 },
      fourHourLimit: { softMax: 30, hardMax: 40 },
      clinicianBolusDose: { softMax: 2, hardMax: 4 },
    },
  },
  {
    drug: 'hydromorphone',
    concentrationPerMl: 0.2,
    doseUnit: 'mg',
    perKg: false,
    limits: {
      loadingDose: { softMax: 1, hardMax: 2 },
      demandDose: { hardMin: 0.05, softMin: 0.1, softMax: 0.4, hardMax: 0.6 },
      lockoutMinutes: lockout,
      basalRatePerHour: { softMax: 0.2, hardMax: 0.4 },
      oneHourLimit: { softMax: 2, hardMax: 3 },
      fourHourLimit: { softMax: 6, hardMax: 8 },
      clinicianBolusDose: { softMax: 0.4, hardMax: 0.8 },
    },
  },
  {
    drug: 'fentanyl',
    concentrationPerMl: 10,
    doseUnit: 'mcg',
    perKg: false,
    limits: {
      loadingDose: { softMax: 50, hardMax: 100 },
      demandDose: { hardMin: 2, softMin: 5, softMax: 20, hardMax: 30 },
      lockoutMinutes: { hardMin: 4, softMin: 5, softMax: 10, hardMax: 20 },
      basalRatePerHour: { softMax: 20, hardMax: 50 },
      oneHourLimit: { softMax: 100, hardMax: 150 },
      fourHourLimit: { softMax: 300, hardMax: 400 },
      clinicianBolusDose: { softMax: 25, hardMax: 50 },
    },
  },
];

const PAEDIATRIC_RULES: DemoRule[] = [
  {
    drug: 'morphine',
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg: true,
    ...forChildren,
    limits: {
      loadingDose: { softMax: 0.05, hardMax: 0.1, ceiling: 5 },
      demandDose: { hardMin: 0.005, softMin: 0.01, softMax: 0.02, hardMax: 0.03, ceiling: 1.5 },
      lockoutMinutes: { hardMin: 5, softMin: 5, softMax: 10, hardMax: 20 },
      basalRatePerHour: { softMax: 0.004, hardMax: 0.01, ceiling: 0.5 },
      oneHourLimit: { softMax: 0.1, hardMax: 0.12, ceiling: 7.5 },
      fourHourLimit: { softMax: 0.3, hardMax: 0.4, ceiling: 25 },
      clinicianBolusDose: { softMax: 0.02, hardMax: 0.05, ceiling: 2.5 },
    },
  },
  {
    drug: 'fentanyl',
    concentrationPerMl: 10,
    doseUnit: 'mcg',
    perKg: true,
    ...forChildren,
    limits: {
      demandDose: { hardMin: 0.1, softMin: 0.25, softMax: 0.5, hardMax: 1, ceiling: 25 },
      lockoutMinutes: { hardMin: 5, softMin: 5, softMax: 10, hardMax: 20 },
      basalRatePerHour: { softMax: 0.15, hardMax: 0.5, ceiling: 25 },
      fourHourLimit: { softMax: 4, hardMax: 6, ceiling: 300 },
    },
  },
];

export const DEMO_LIBRARIES: { wardCode: string; note: string; rules: DemoRule[] }[] = [
  { wardCode: 'HAR', note: 'Adult surgical limits (demo)', rules: ADULT_RULES },
  { wardCode: 'CED', note: 'Adult orthopaedic limits (demo)', rules: ADULT_RULES },
  { wardCode: 'WRE', note: 'Paediatric weight-based limits (demo)', rules: PAEDIATRIC_RULES },
  { wardCode: 'SUM', note: 'High-dependency limits (demo)', rules: ADULT_RULES },
];

/** A draft awaiting a second pharmacist, so the approval screen has work from the first start. */
export const DEMO_PENDING_CHANGE = {
  wardCode: 'HAR',
  note: 'Lower the morphine demand soft maximum to 1.5 mg after the audit (demo)',
  drug: 'morphine',
  demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 1.5, hardMax: 3 } satisfies Limits,
};
