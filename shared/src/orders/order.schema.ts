import { z } from 'zod';
import { calendarDaySchema, momentSchema } from '../api/date-time.js';
import { atLeast, atMost, isPlainObject, listOf, must } from '../api/request-rules.js';
import type { DoseUnit } from '../drugs/drug.schema.js';
import type { Finding } from '../dose/types.js';
import type { LimitRuleResponse } from '../library/library.schema.js';
import type { ObservationDue } from '../observations/observation-due.js';
import type { SyringeState } from '../bedside/bedside-actions.js';
import type { OtherPcaOrder } from './duplicate-therapy.js';
import { orderFieldsSchema, type OrderDerivedValues } from './order-fields.schema.js';
import type { OrderStatus } from './order-status.js';

export const REGIMEN_TYPES = ['demand_only', 'demand_basal'] as const;
export type RegimenType = (typeof REGIMEN_TYPES)[number];
export const REGIMEN_TYPE_LABELS: Record<RegimenType, string> = { demand_only: 'Demand only', demand_basal: 'Demand + basal' };

/** Demand + basal when a basal rate runs; demand only otherwise. */
export function regimenTypeOf(basalRatePerHour: number): RegimenType {
  return basalRatePerHour > 0 ? 'demand_basal' : 'demand_only';
}

export const MIN_REASON_LENGTH = 10;

/** A reason: trimmed, then at least MIN_REASON_LENGTH and at most 1,000 characters; the DTO's words for missing and too long. */
export const reasonText = (required: string, wrongType: string, tooLong = 'The reason is at most 1,000 characters') =>
  z
    .string(must(required, wrongType))
    .trim()
    .refine(atLeast(MIN_REASON_LENGTH), `Give a reason of at least ${MIN_REASON_LENGTH} characters`)
    .refine(atMost(1000), tooLong);

export const overrideSchema = z.strictObject({
  field: z.string(must('field is required', 'field must name the order field')).refine(atMost(64), 'field is at most 64 characters'),
  reason: reasonText('Give a reason for going past the soft limit', 'reason must be text'),
});
export type Override = z.infer<typeof overrideSchema>;

const signatureFields = {
  password: z
    .string(must('Enter your password to sign', 'signature.password must be text'))
    .refine(atLeast(1), 'Enter your password to sign')
    .refine(atMost(256), 'Password is at most 256 characters'),
};
const NOT_A_SIGNATURE = 'signature must be an object with your password';

/** A signature is the signed-in person's password, typed again at the moment of signing. */
export const signatureSchema = z.strictObject(signatureFields, must('signature is required: enter your password to sign', NOT_A_SIGNATURE));
export type Signature = z.infer<typeof signatureSchema>;

/** What a prescriber signs: the regimen, a review date, a reason for each soft finding, the password. */
export const createOrderSchema = orderFieldsSchema.extend({
  reviewDate: calendarDaySchema('Enter the review date', 'Enter the review date (yyyy-mm-dd)'),
  overrides: listOf(
    overrideSchema,
    {
      required: 'overrides is required (an empty list when there are no soft findings)',
      type: 'overrides must be a list of {field, reason}',
      max: [20, 'At most 20 overrides'],
    },
    [[isPlainObject, 'Each override is {field, reason}']],
  ),
  signature: z.strictObject(signatureFields, must('Sign with your password', NOT_A_SIGNATURE)),
});
export type CreateOrderRequest = z.infer<typeof createOrderSchema>;

export const reasonRequestSchema = z.strictObject({ reason: reasonText('Give a reason', 'reason must be text') });
export type ReasonRequest = z.infer<typeof reasonRequestSchema>;

export type OrderEventResponse = {
  id: number;
  fromStatus: OrderStatus | null;
  toStatus: OrderStatus;
  userId: number;
  userName: string;
  at: string;
  reason: string | null;
};

export type OrderSummary = {
  id: number;
  version: number;
  supersedesId: number | null;
  status: OrderStatus;
  regimenType: RegimenType;
  patientId: number;
  patientName: string;
  patientMrn: string;
  wardId: number;
  wardName: string;
  bed: string;
  drugId: number;
  drugName: string;
  doseUnit: DoseUnit;
  concentrationPerMl: number;
  loadingDose: number | null;
  demandDose: number;
  lockoutMinutes: number;
  basalRatePerHour: number;
  oneHourLimit: number | null;
  fourHourLimit: number | null;
  clinicianBolusDose: number | null;
  indication: string;
  reviewDate: string;
  prescriberId: number;
  prescriberName: string;
  signedAt: string;
  statusChangedAt: string;
  statusReason: string | null;
};

/**
 * An order as `GET /api/orders` lists it: the summary, where its syringes stand and when its next
 * observation is due, so a ward's list of PCAs is one request.
 */
export type OrderListEntry = OrderSummary & {
  syringeState: SyringeState;
  nextObservation: ObservationDue | null;
  /** How many urgent flags on this order are open (not yet acknowledged). */
  openUrgentFlags: number;
  /** A running PCA paused by a nurse or by naloxone given, until a two-nurse resume. */
  paused: boolean;
  /** The patient's other unfinished orders (shared `otherOpioidOrders`), for the pharmacist's queue. */
  otherOpenOrders: OtherPcaOrder[];
};

export type OrderDetail = OrderSummary & {
  derived: OrderDerivedValues;
  findings: Finding[];
  overrides: Override[];
  rule: LimitRuleResponse | null;
  verifiedByName: string | null;
  verifiedAt: string | null;
  events: OrderEventResponse[];
  releases: SyringeReleaseResponse[];
  flags: FlagResponse[];
  startedAt: string | null;
  /** When the next observation of a running PCA is due, by the ward's policy; null unless active. */
  nextObservation: ObservationDue | null;
  /** A running PCA paused by a nurse or by naloxone given, until a two-nurse resume; false unless active. */
  paused: boolean;
};

export type FlagSeverity = 'info' | 'review' | 'urgent';
export const FLAG_SEVERITY_LABELS: Record<FlagSeverity, string> = { urgent: 'Urgent', review: 'Review', info: 'Info' };

export type FlagResponse = {
  id: number;
  severity: FlagSeverity;
  code: string;
  message: string;
  action: string;
  raisedAt: string;
  acknowledgedAt: string | null;
  acknowledgedByName: string | null;
  acknowledgeNote: string | null;
};

export const RELEASE_STATUSES = ['ready', 'in_use', 'finished'] as const;
export type ReleaseStatus = (typeof RELEASE_STATUSES)[number];
export const RELEASE_STATUS_LABELS: Record<ReleaseStatus, string> = { ready: 'Ready', in_use: 'In use', finished: 'Finished' };

export const USUAL_SYRINGE_ML = { min: 20, max: 60 } as const;

const name = (required: string, wrongType: string) =>
  z.string(must(required, wrongType)).trim().refine(atLeast(1), required).refine(atMost(120), 'At most 120 characters');

export const createReleaseSchema = z.strictObject({
  concentrationPerMl: z
    .number(must('Enter the concentration on the label', 'Concentration must be a number'))
    .positive('Concentration must be more than 0'),
  volumeMl: z
    .number(must('Enter the syringe volume in mL', 'Volume must be a number of mL'))
    .positive('Volume must be more than 0')
    .max(100, 'A PCA syringe holds at most 100 mL'),
  batch: z
    .string(must('Enter the batch', 'Batch must be text'))
    .trim()
    .refine(atLeast(1), 'Enter the batch')
    .refine(atMost(40), 'Batch is at most 40 characters'),
  expiresAt: momentSchema('Enter the expiry', 'Enter the expiry as a date and time'),
  preparedBy: name('Enter who prepared the syringe', 'preparedBy must be text'),
  checkedBy: name('Enter who checked the syringe', 'checkedBy must be text'),
  overrideReason: reasonText('overrideReason must be text', 'overrideReason must be text').nullish(),
  /** Needed when the order already has a ready or running syringe (secondReleaseRefusal). */
  secondSyringeReason: reasonText('secondSyringeReason must be text', 'secondSyringeReason must be text').nullish(),
});
export type CreateReleaseRequest = z.infer<typeof createReleaseSchema>;

export type SyringeReleaseResponse = {
  id: number;
  orderId: number;
  releaseCode: string;
  status: ReleaseStatus;
  concentrationPerMl: number;
  volumeMl: number;
  totalAmount: number;
  doseUnit: DoseUnit;
  batch: string;
  expiresAt: string;
  preparedBy: string;
  checkedBy: string;
  overrideReason: string | null;
  releasedByName: string;
  releasedAt: string;
};
