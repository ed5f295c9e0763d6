import type {
  CreateOrderRequest,
  CreateReleaseRequest,
  LoginRequest,
  ObservationValues,
  OrderFields,
  PumpSettings,
  WristbandEntry,
} from '@lockstep/shared';
import { DEMO_PASSWORD } from './demo-accounts.js';

// The invented morphine PCA the API, crash and browser tests share: patient 1 (NOAH ACHTERBERG,
// KB100231, born 1968-03-14) on Harbour; drug 1 morphine. Regimen: demand 1 mg, lockout 10
// min, a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg
// 2005;101(5S):S44-S61, from memory], at the standard 1 mg/mL [practice; ASHP Standardize 4 Safety]; the limits it meets are
// the demo library's (invented). Plain data and types only, so tests that reach the app over HTTP
// alone (the crash test, the browser tests by a relative path) can use it too.

/** The regimen alone, as the order form's live check (`POST /api/orders/preview`) takes it. */
export const REGIMEN: OrderFields = {
  patientId: 1,
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  fourHourLimit: 30,
};

/** What the prescriber adds to sign: a review date, no soft-limit reasons, their password. */
export const SIGNING: Pick<CreateOrderRequest, 'reviewDate' | 'overrides' | 'signature'> = {
  reviewDate: '2030-01-02',
  overrides: [],
  signature: { password: DEMO_PASSWORD },
};

/** The signed order, with a clinician bolus of up to 2 mg. */
export const ORDER: CreateOrderRequest = { ...REGIMEN, clinicianBolusDose: 2, ...SIGNING };

/** The pump programmed as ordered, with a 50 mL syringe. */
export const SETTINGS: PumpSettings = {
  drugId: 1,
  concentrationPerMl: 1,
  syringeVolumeMl: 50,
  loadingDose: null,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
};

/** Patient 1's wristband. */
export const IDENTITY: WristbandEntry = { patientMrn: 'KB100231', patientDateOfBirth: '1968-03-14' };

/**
 * A demo patient with no PCA: AMARU CONDORI (KB100983, born 1998-10-14, 70 kg weighed yesterday,
 * no known allergies, opioid-naive), Harbour bed H06. For
 * tests that reach the app only over HTTP and sign a PCA of their own (the crash test, the browser
 * tests): a patient may have only one open PCA, and patient 1 has the demo's order awaiting
 * verification. Find the id by MRN (`GET /api/patients`); the API tests add patients instead
 * (TestApp.addPatient).
 */
export const FREE_PATIENT = {
  name: 'CONDORI, Amaru',
  bed: 'H06',
  weight: '70 kg',
  identity: { patientMrn: 'KB100983', patientDateOfBirth: '1998-10-14' } satisfies WristbandEntry,
};

/** A 50 mL syringe of the ordered concentration. */
export const RELEASE: CreateReleaseRequest = {
  concentrationPerMl: 1,
  volumeMl: 50,
  batch: 'KB-77',
  expiresAt: '2030-01-01T12:00:00Z',
  preparedBy: 'Lin Park',
  checkedBy: 'Tomas Ortiz',
};

/** The second nurse (bedside checks) and witness. */
export const ROSA: LoginRequest = { username: 'rosa.adeyemi', password: DEMO_PASSWORD };

/**
 * An unremarkable hourly observation of the running 50 mL syringe: it raises no flag, and its pump
 * totals stay put, so any number of them can be written in any order.
 */
export const CALM_OBSERVATION: Omit<ObservationValues, 'at'> = {
  painScore: 3,
  sedationLevel: '1',
  respiratoryRate: 14,
  spo2: 97,
  oxygenLitresPerMinute: 0, // air: always recorded beside SpO2
  // One dose: tests record it moments after the start, and a lockout allows only one press in no time.
  attempts: 2,
  delivered: 1,
  volumeInfusedMl: 1,
  syringeRemainingMl: 49,
};
