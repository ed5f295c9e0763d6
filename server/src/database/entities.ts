import { AuditEvent } from '../audit/entities/audit-event.entity.js';
import { RevokedToken } from '../auth/entities/revoked-token.entity.js';
import { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import { PcaPause } from '../bedside/entities/pca-pause.entity.js';
import { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import { Drug } from '../drugs/entities/drug.entity.js';
import { EquianalgesicFactor } from '../equianalgesic/entities/equianalgesic-factor.entity.js';
import { IdempotencyKey } from '../common/idempotency/idempotency-key.entity.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { HandoverSignoff } from '../handover/entities/handover-signoff.entity.js';
import { LibraryVersion } from '../library/entities/library-version.entity.js';
import { LibraryVersionEvent } from '../library/entities/library-version-event.entity.js';
import { LimitRule } from '../library/entities/limit-rule.entity.js';
import { MailboxMessage } from '../mail/entities/mailbox-message.entity.js';
import { Observation } from '../observations/entities/observation.entity.js';
import { OrderEvent } from '../orders/entities/order-event.entity.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { Patient } from '../patients/entities/patient.entity.js';
import { PatientAllergy } from '../patients/entities/patient-allergy.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { User } from '../users/entities/user.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import { WardPolicyChange } from '../wards/entities/ward-policy-change.entity.js';

/** Every entity, for the data source used outside Nest (migrations, reset, schema check). */
export const ENTITIES = [
  Ward,
  User,
  Patient,
  PatientAllergy,
  Drug,
  LibraryVersion,
  LimitRule,
  LibraryVersionEvent,
  PcaOrder,
  OrderEvent,
  SyringeRelease,
  MailboxMessage,
  BedsideCheck,
  ClinicianBolus,
  ReleaseReconciliation,
  Flag,
  Observation,
  HandoverSignoff,
  AuditEvent,
  RevokedToken,
  EquianalgesicFactor,
  PcaPause,
  WardPolicyChange,
  IdempotencyKey,
];
