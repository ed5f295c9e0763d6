import {
  ALLERGY_SEVERITIES,
  DOSE_UNITS,
  MIN_REASON_LENGTH,
  PASSWORD_MIN_LENGTH,
  POPULATIONS,
  ROLES,
  SEDATION_LEVELS,
  SIGNOFF_ROLES,
  NALOXONE_UNITS,
  CONSCIOUSNESS_LEVELS,
  OXYGEN_DEVICES,
  SPO2_SCALES,
} from '@lockstep/shared';
import type { BodySpec, FieldSpec } from './bad-values.js';

// The rules of each request DTO (server/src/*/dto), written out so that bad bodies can be
// generated from them. Written by hand on purpose: a test that read the DTOs' own metadata could
// not notice a rule that went missing from a DTO.

const id: FieldSpec = { type: 'number', int: true, positive: true };
const positive: FieldSpec = { type: 'number', positive: true };
const amount: FieldSpec = { type: 'number', min: 0 };
const optionalAmount: FieldSpec = { ...amount, presence: 'optional' };
const nullableAmount: FieldSpec = { ...amount, presence: 'nullable' };
const reason: FieldSpec = { type: 'string', min: MIN_REASON_LENGTH, max: 1000, trimmed: true };
const password: FieldSpec = { type: 'string', min: 1, max: 256 };
const note1000: FieldSpec = { type: 'string', max: 1000, presence: 'optional' };

const SIGNATURE: BodySpec = { password };
const COLLEAGUE: BodySpec = { username: { type: 'string', min: 1, max: 64, trimmed: true }, password };

export const LOGIN: BodySpec = { username: { type: 'string', min: 1, max: 64, trimmed: true }, password };

export const ORDER_FIELDS: BodySpec = {
  patientId: id,
  drugId: id,
  concentrationPerMl: positive,
  doseUnit: { type: 'enum', values: DOSE_UNITS },
  loadingDose: optionalAmount,
  demandDose: amount,
  lockoutMinutes: { type: 'number', min: 1 },
  basalRatePerHour: amount,
  oneHourLimit: optionalAmount,
  fourHourLimit: optionalAmount,
  clinicianBolusDose: optionalAmount,
  indication: { type: 'string', max: 500, presence: 'optional' },
};

const OVERRIDE: BodySpec = { field: { type: 'string', max: 64 }, reason };
export const CREATE_ORDER: BodySpec = {
  ...ORDER_FIELDS,
  reviewDate: { type: 'date' },
  overrides: {
    type: 'array',
    items: { type: 'object', fields: OVERRIDE },
    maxItems: 20,
    sample: { field: 'demandDose', reason: 'Agreed with the pain team' },
  },
  signature: { type: 'object', fields: SIGNATURE },
};

export const REASON: BodySpec = { reason };
export const SIGNED: BodySpec = { signature: { type: 'object', fields: SIGNATURE } };
export const APPROVE_VERSION: BodySpec = { ...SIGNED, submittedAt: { type: 'datetime' } };
export const EQUIANALGESIC_FACTOR: BodySpec = {
  ...SIGNED,
  amount: { type: 'number', positive: true, max: 1_000_000 },
  unit: { type: 'enum', values: DOSE_UNITS },
  source: { type: 'string', min: 1, max: 500, trimmed: true },
};
export const SEND_BACK_VERSION: BodySpec = { ...SIGNED, comment: reason };

export const RELEASE: BodySpec = {
  concentrationPerMl: positive,
  volumeMl: { type: 'number', positive: true, max: 100 },
  batch: { type: 'string', min: 1, max: 40, trimmed: true },
  expiresAt: { type: 'datetime' },
  preparedBy: { type: 'string', min: 1, max: 120, trimmed: true },
  checkedBy: { type: 'string', min: 1, max: 120, trimmed: true },
  overrideReason: { ...reason, presence: 'optional' },
  secondSyringeReason: { ...reason, presence: 'optional' },
};

const PUMP_SETTINGS: BodySpec = {
  drugId: id,
  concentrationPerMl: positive,
  syringeVolumeMl: positive,
  loadingDose: nullableAmount,
  demandDose: amount,
  lockoutMinutes: amount,
  basalRatePerHour: amount,
  oneHourLimit: nullableAmount,
  fourHourLimit: nullableAmount,
};
const settings: FieldSpec = { type: 'object', fields: PUMP_SETTINGS };
const witness: FieldSpec = { type: 'object', fields: COLLEAGUE };
const releaseCode: FieldSpec = { type: 'string', min: 1, max: 16 };

export const FIRST_CHECK: BodySpec = {
  patientMrn: { type: 'string', min: 1, max: 32 },
  patientDateOfBirth: { type: 'date' },
  releaseCode,
  settings,
};
export const SECOND_CHECK: BodySpec = { ...COLLEAGUE, settings };
export const BOLUS: BodySpec = { witness, amount: positive, reason, overrideReason: { ...reason, presence: 'optional' } };
export const SYRINGE_CHANGE: BodySpec = { witness, volumeInfusedMl: amount, wastedMl: amount, newReleaseCode: releaseCode };
export const DISCONTINUE: BodySpec = { witness, reason, volumeInfusedMl: amount, wastedMl: amount };
export const NALOXONE: BodySpec = {
  dose: positive,
  doseUnit: { type: 'enum', values: NALOXONE_UNITS },
  givenAt: { type: 'datetime', presence: 'optional' },
  signature: { type: 'object', fields: SIGNATURE },
};
export const PAUSE: BodySpec = { reason };
export const RESUME: BodySpec = { reason, settings, witness: { type: 'object', fields: { ...COLLEAGUE, settings } } };

const count = (max: number): FieldSpec => ({ type: 'number', int: true, min: 0, max });
export const OBSERVATION: BodySpec = {
  at: { type: 'datetime', presence: 'optional' },
  painScore: count(10),
  sedationLevel: { type: 'enum', values: SEDATION_LEVELS },
  respiratoryRate: count(80),
  spo2: count(100),
  attempts: count(100_000),
  delivered: count(100_000),
  volumeInfusedMl: { type: 'number', min: 0, max: 1000 },
  syringeRemainingMl: { type: 'number', min: 0, max: 1000 },
  oxygenLitresPerMinute: { type: 'number', min: 0, max: 60 },
  oxygenDevice: { type: 'enum', values: OXYGEN_DEVICES, presence: 'optional' },
  heartRate: { type: 'number', int: true, min: 0, max: 300, presence: 'optional' },
  systolicBp: { type: 'number', int: true, min: 0, max: 300, presence: 'optional' },
  temperatureC: { type: 'number', min: 25, max: 45, presence: 'optional' },
  consciousness: { type: 'enum', values: CONSCIOUSNESS_LEVELS, presence: 'optional' },
  note: { type: 'string', max: 2000, presence: 'optional' },
};
export const SPO2_SCALE: BodySpec = { spo2Scale: { type: 'enum', values: SPO2_SCALES } };
export const ACKNOWLEDGE_FLAG: BodySpec = { note: { type: 'string', min: 5, max: 1000, trimmed: true } };
export const SIGNOFF: BodySpec = {
  orderId: id,
  role: { type: 'enum', values: SIGNOFF_ROLES },
  settings: { ...settings, presence: 'optional' },
  signature: { type: 'object', fields: SIGNATURE },
};

export const CREATE_DRAFT: BodySpec = { wardId: id, note: note1000 };
const LIMITS: BodySpec = {
  hardMin: optionalAmount,
  softMin: optionalAmount,
  softMax: optionalAmount,
  hardMax: optionalAmount,
  ceiling: optionalAmount,
};
const limits: FieldSpec = { type: 'object', fields: LIMITS, presence: 'partial' };
const RULE: BodySpec = {
  drugId: id,
  concentrationPerMl: positive,
  doseUnit: { type: 'enum', values: DOSE_UNITS },
  perKg: { type: 'boolean' },
  population: { type: 'enum', values: POPULATIONS, presence: 'partial' },
  minAgeYears: optionalAmount,
  maxAgeYears: optionalAmount,
  minWeightKg: optionalAmount,
  maxWeightKg: optionalAmount,
  limits: {
    type: 'object',
    fields: {
      loadingDose: limits,
      demandDose: limits,
      lockoutMinutes: limits,
      basalRatePerHour: limits,
      oneHourLimit: limits,
      fourHourLimit: limits,
      clinicianBolusDose: limits,
    },
  },
};
export const REPLACE_RULES: BodySpec = {
  rules: {
    type: 'array',
    items: { type: 'object', fields: RULE },
    maxItems: 500,
    sample: { drugId: 1, concentrationPerMl: 1, doseUnit: 'mg', perKg: false, limits: {} },
  },
};
export const SUBMIT_VERSION: BodySpec = { note: note1000 };
/** The text fields of the CSV import's multipart body (the file is multer's); bad-input-uploads sends them as a form. */
export const IMPORT_FIELDS: BodySpec = { wardId: id, note: note1000, dryRun: { type: 'boolean', presence: 'optional' } };

export const CREATE_USER: BodySpec = {
  username: { type: 'string', min: 3, max: 64, pattern: /^[a-z0-9._-]+$/ },
  displayName: { type: 'string', min: 1, max: 120, trimmed: true },
  role: { type: 'enum', values: ROLES },
  wardIds: { type: 'array', items: id, maxItems: 100, sample: 1 },
  password: { type: 'string', min: PASSWORD_MIN_LENGTH, max: 256 },
};
const { username: _username, ...updatable } = CREATE_USER;
export const UPDATE_USER: BodySpec = {
  ...Object.fromEntries(Object.entries(updatable).map(([name, spec]) => [name, { ...spec, presence: 'partial' } as FieldSpec])),
  active: { type: 'boolean', presence: 'partial' },
};

const setting = (spec: Omit<Extract<FieldSpec, { type: 'number' }>, 'type'>): FieldSpec => ({
  type: 'number',
  presence: 'partial',
  ...spec,
});
const email: FieldSpec = { type: 'email', emptyAllowed: true, presence: 'partial' };
const WARD_POLICY: BodySpec = {
  // Floors from shared WARD_POLICY_FLOORS: a ward can tighten, not loosen past them.
  observationIntervalFirst24hMinutes: setting({ int: true, min: 15, max: 60 }),
  observationIntervalMinutes: setting({ int: true, min: 15, max: 120 }),
  closeObservationIntervalMinutes: setting({ int: true, min: 5, max: 15 }),
  closeObservationPeriodMinutes: setting({ int: true, min: 60, max: 240 }),
  naloxoneClosePeriodMinutes: setting({ int: true, min: 120, max: 720 }),
  respiratoryRateThreshold: setting({ int: true, min: 9, max: 20 }),
  spo2Threshold: setting({ int: true, min: 92, max: 100 }),
  syringeLowThresholdHours: setting({ min: 0.5, max: 24 }),
  reconciliationToleranceMl: setting({ min: 0, max: 10 }),
  painNotControlledScore: setting({ int: true, min: 0, max: 10 }),
  painNotControlledRatio: setting({ min: 1, max: 20 }),
  weightMaxAgeDays: setting({ int: true, min: 1, max: 365 }),
  pharmacyEmail: email,
  nurseInChargeEmail: email,
};
/** What an admin changes alone (PATCH /wards/:wardId/policy): the e-mail addresses. */
export const WARD_CONTACTS: BodySpec = { pharmacyEmail: email, nurseInChargeEmail: email };
const { pharmacyEmail: _pharmacyEmail, nurseInChargeEmail: _nurseInChargeEmail, ...WARD_POLICY_SETTINGS } = WARD_POLICY;
export const PROPOSE_WARD_POLICY_CHANGE: BodySpec = { ...SIGNED, changes: { type: 'object', fields: WARD_POLICY_SETTINGS }, reason };
export const DECLINE_WARD_POLICY_CHANGE: BodySpec = { ...SIGNED, reason };

export const ADD_ALLERGY: BodySpec = {
  drugId: { ...id, presence: 'optional' },
  substance: { type: 'string', min: 1, max: 120, trimmed: true },
  reaction: { type: 'string', min: 1, max: 200, trimmed: true },
  severity: { type: 'enum', values: ALLERGY_SEVERITIES },
};
export const OPIOID_TOLERANCE: BodySpec = {
  opioidTolerant: { type: 'boolean' },
  oralMorphineMgPerDay: { type: 'number', positive: true, max: 20_000, presence: 'nullable' },
  days: { type: 'number', int: true, min: 1, max: 36_500, presence: 'nullable' },
};
export const RECORD_WEIGHT: BodySpec = { weightKg: { type: 'number', positive: true, max: 500 }, measuredOn: { type: 'date' } };

/**
 * Every write route and where its bad input is tested; bad-input-admin checks this against the
 * app's routes, so a new write route fails until it has a place here (and its tests).
 */
export const BAD_INPUT_COVERAGE: Record<string, string> = {
  'POST /api/orders/preview': 'bad-input-orders',
  'POST /api/orders': 'bad-input-orders',
  'POST /api/orders/:param/revise': 'bad-input-orders',
  'POST /api/orders/:param/cancel': 'bad-input-orders',
  'POST /api/orders/:param/verify': 'bad-input-orders',
  'POST /api/orders/:param/return': 'bad-input-orders',
  'POST /api/orders/:param/reject': 'bad-input-orders',
  'POST /api/orders/:param/releases': 'bad-input-orders',
  'POST /api/orders/:param/bedside-checks': 'bad-input-bedside',
  'POST /api/orders/:param/bedside-checks/:param/second': 'bad-input-bedside',
  'POST /api/orders/:param/boluses': 'bad-input-bedside',
  'POST /api/orders/:param/syringe-changes': 'bad-input-bedside',
  'POST /api/orders/:param/discontinue': 'bad-input-bedside',
  'POST /api/orders/:param/naloxone': 'bad-input-bedside',
  'POST /api/orders/:param/pause': 'bad-input-bedside',
  'POST /api/orders/:param/resume': 'bad-input-bedside',
  'POST /api/orders/:param/observations': 'bad-input-bedside',
  'POST /api/flags/:param/acknowledge': 'bad-input-bedside',
  'POST /api/wards/:param/handover/signoffs': 'bad-input-bedside',
  'POST /api/auth/login': 'bad-input-admin',
  'POST /api/users': 'bad-input-admin',
  'PATCH /api/users/:param': 'bad-input-admin',
  'PATCH /api/wards/:param/policy': 'bad-input-admin',
  'POST /api/wards/:param/policy-changes': 'ward-policy-changes',
  'POST /api/wards/policy-changes/:param/sign-off': 'ward-policy-changes',
  'POST /api/wards/policy-changes/:param/decline': 'ward-policy-changes',
  'POST /api/library/versions': 'bad-input-admin',
  'PUT /api/library/versions/:param/rules': 'bad-input-admin',
  'POST /api/library/versions/:param/submit': 'bad-input-admin',
  'POST /api/library/versions/:param/approve': 'bad-input-admin',
  'PUT /api/equianalgesic-factors/:param/:param': 'bad-input-admin',
  'POST /api/library/versions/:param/send-back': 'bad-input-admin',
  'POST /api/library/import': 'bad-input-uploads',
  'POST /api/patients/:param/allergies': 'patients',
  'PUT /api/patients/:param/opioid-tolerance': 'patients',
  'PUT /api/patients/:param/spo2-scale': 'patients',
  'POST /api/patients/:param/weights': 'patients',
  // No body: the path names the thing, and the id pipe refuses a bad id.
  'POST /api/library/versions/:param/withdraw': 'no body',
  'DELETE /api/library/versions/:param': 'no body',
  'DELETE /api/auth/lockouts/usernames/:param': 'no body',
  'DELETE /api/auth/lockouts/addresses/:param': 'no body',
  'POST /api/auth/logout': 'no body',
  'POST /api/patients/:param/no-known-allergies': 'no body',
  'DELETE /api/patients/:param/allergies/:param': 'no body',
};
