import type { DoseUnit } from '../drugs/drug.schema.js';
import type { AllergySeverity } from '../dose/types.js';
import type { SedationLevel } from '../observations/sedation-scale.js';
import type { ObservationDue } from '../observations/observation-due.js';
import type { FlagResponse } from '../orders/order.schema.js';
import type { OrderStatus } from '../orders/order-status.js';

export const SHIFTS = ['day', 'night'] as const;
export type Shift = (typeof SHIFTS)[number];
export const SIGNOFF_ROLES = ['outgoing', 'incoming'] as const;
export type SignoffRole = (typeof SIGNOFF_ROLES)[number];

export type PendingTask =
  | { code: 'awaiting_verification'; since: string }
  | { code: 'awaiting_bedside_check'; since: string }
  | { code: 'reconciliation_discrepancy'; since: string }
  | { code: 'review_date_passed'; since: string };

export type HandoverSignoffResponse = {
  id: number;
  orderId: number;
  shiftDate: string;
  shift: Shift;
  role: SignoffRole;
  nurseName: string;
  pumpSettingsMatch: boolean | null;
  at: string;
};

export type HandoverRow = {
  orderId: number;
  status: OrderStatus;
  bed: string;
  patient: {
    id: number;
    name: string;
    mrn: string;
    ageYears: number;
    weightKg: number | null;
    /** Every recorded allergy, most severe first; `noKnownAllergies` says whether an empty list was recorded as such. */
    allergies: { substance: string; reaction: string; severity: AllergySeverity }[];
    noKnownAllergies: boolean;
  };
  drugName: string;
  doseUnit: DoseUnit;
  concentrationPerMl: number;
  regimen: {
    demandDose: number;
    lockoutMinutes: number;
    basalRatePerHour: number;
    oneHourLimit: number | null;
    fourHourLimit: number | null;
  };
  startedAt: string | null;
  minutesSinceStart: number | null;
  lastObservation: { at: string; painScore: number; sedationLevel: SedationLevel; respiratoryRate: number; spo2: number } | null;
  nextObservation: ObservationDue | null;
  last4h: { attempts: number; delivered: number; dose: number };
  total24hDose: number;
  syringe: { remainingMl: number | null; projectedEmptyAt: string | null; emptiesThisShift: boolean };
  flags: { urgent: number; review: number; info: number; open: FlagResponse[] };
  /** A running PCA paused by a nurse or by naloxone given, until a two-nurse resume. */
  paused: boolean;
  pendingTasks: PendingTask[];
  signoffs: HandoverSignoffResponse[];
  /** 0 urgent flags, 1 overdue observation, 2 syringe empties within the shift, 3 the rest. */
  riskTier: 0 | 1 | 2 | 3;
};

export type HandoverBoard = {
  wardId: number;
  wardName: string;
  generatedAt: string;
  shift: { shift: Shift; shiftDate: string; startsAt: string; endsAt: string };
  rows: HandoverRow[];
};
