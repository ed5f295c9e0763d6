import { z } from 'zod';
import type { DoseUnit } from '../drugs/drug.schema.js';
import type { Finding } from '../dose/types.js';
import type { LimitRuleResponse } from '../library/library.schema.js';
import type { ObservationDue } from '../observations/observation-due.js';
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
const reason = z.string().trim().min(MIN_REASON_LENGTH, `Give a reason of at least ${MIN_REASON_LENGTH} characters`).max(1000);

export const overrideSchema = z.object({ field: z.string().min(1), reason });
export type Override = z.infer<typeof overrideSchema>;

export const signatureSchema = z.object({ password: z.string().min(1, 'Enter your password to sign') });

/** What a prescriber signs: the regimen, a review date, a reason for each soft finding, the password. */
export const createOrderSchema = orderFieldsSchema.extend({
  reviewDate: z.iso.date('Enter the review date'),
  overrides: z.array(overrideSchema).max(20),
  signature: signatureSchema,
});
export type CreateOrderRequest = z.infer<typeof createOrderSchema>;

export const reasonRequestSchema = z.object({ reason });
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

export const createReleaseSchema = z.object({
  concentrationPerMl: z.number().finite().positive(),
  volumeMl: z.number().finite().positive().max(100, 'A PCA syringe holds at most 100 mL'),
  batch: z.string().trim().min(1, 'Enter the batch').max(40),
  expiresAt: z.iso.datetime({ offset: true, error: 'Enter the expiry date and time' }),
  preparedBy: z.string().trim().min(1, 'Enter who prepared the syringe').max(120),
  checkedBy: z.string().trim().min(1, 'Enter who checked the syringe').max(120),
  overrideReason: reason.optional(),
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
