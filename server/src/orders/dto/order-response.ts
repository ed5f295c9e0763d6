import { deriveOrderValues, type ObservationDue, type OrderDetail, type OrderSummary, patientDisplayName } from '@lockstep/shared';
import { toFlagResponse } from '../../flags/dto/flag-response.js';
import type { Flag } from '../../flags/entities/flag.entity.js';
import type { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { toReleaseResponse } from '../../releases/dto/release-response.js';
import type { OrderEvent } from '../entities/order-event.entity.js';
import type { PcaOrder } from '../entities/pca-order.entity.js';

/** Relations the summary needs. */
export const ORDER_SUMMARY_RELATIONS = { patient: { ward: true }, prescriber: true, drug: true } as const;

export function toOrderSummary(order: PcaOrder): OrderSummary {
  const { patient } = order;
  return {
    id: order.id,
    version: order.version,
    supersedesId: order.supersedesId,
    status: order.status,
    regimenType: order.regimenType,
    patientId: order.patientId,
    patientName: patientDisplayName(patient),
    patientMrn: patient.mrn,
    wardId: patient.wardId,
    wardName: patient.ward.name,
    bed: patient.bed,
    drugId: order.drugId,
    drugName: order.drug.genericName,
    doseUnit: order.doseUnit,
    concentrationPerMl: order.concentrationPerMl,
    loadingDose: order.loadingDose,
    demandDose: order.demandDose,
    lockoutMinutes: order.lockoutMinutes,
    basalRatePerHour: order.basalRatePerHour,
    oneHourLimit: order.oneHourLimit,
    fourHourLimit: order.fourHourLimit,
    clinicianBolusDose: order.clinicianBolusDose,
    indication: order.indication,
    reviewDate: order.reviewDate,
    prescriberId: order.prescriberId,
    prescriberName: order.prescriber.displayName,
    signedAt: order.signedAt.toISOString(),
    statusChangedAt: order.statusChangedAt.toISOString(),
    statusReason: order.statusReason,
  };
}

/** Expects the summary relations plus `verifiedBy`; events and releases with their users. */
export function toOrderDetail(
  order: PcaOrder,
  events: OrderEvent[],
  releases: SyringeRelease[],
  flags: Flag[],
  nextObservation: ObservationDue | null,
  paused: boolean,
): OrderDetail {
  return {
    ...toOrderSummary(order),
    derived: deriveOrderValues(order),
    findings: order.findingsSnapshot,
    overrides: order.overrides,
    rule: order.ruleSnapshot,
    verifiedByName: order.verifiedBy?.displayName ?? null,
    verifiedAt: order.verifiedAt?.toISOString() ?? null,
    events: events.map((event) => ({
      id: event.id,
      fromStatus: event.fromStatus,
      toStatus: event.toStatus,
      userId: event.userId,
      userName: event.user.displayName,
      at: event.at.toISOString(),
      reason: event.reason,
    })),
    releases: releases.map((release) => toReleaseResponse(release, order.doseUnit)),
    flags: flags.map(toFlagResponse),
    startedAt: order.startedAt?.toISOString() ?? null,
    nextObservation,
    paused,
  };
}
