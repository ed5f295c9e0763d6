import {
  ageInYears,
  compareHandoverRows,
  type HandoverRow,
  patientDisplayName,
  pcaPaused,
  sortAllergies,
  type PendingTask,
  riskTier,
  type WardPolicy,
} from '@lockstep/shared';
import { toFlagResponse } from '../flags/dto/flag-response.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { toSignoffResponse } from './dto/signoff-response.js';
import { type BoardInputs, emptyInputs, inputsByOrder, type OrderInputs, rowFigures } from './row-figures.js';

/**
 * The board's rows, sorted by risk, from what was fetched for the ward's orders. Pure: the
 * benchmark's bare baseline server builds its answer with this too, from its own queries.
 */
export function boardRows(
  orders: PcaOrder[],
  inputs: BoardInputs,
  policy: WardPolicy,
  shift: { endsAt: string },
  now: Date,
): HandoverRow[] {
  const byOrder = inputsByOrder(inputs);
  const rows = orders.map((order) => {
    const mine = byOrder.get(order.id) ?? emptyInputs();
    const figures = rowFigures(order, mine, policy, now, Date.parse(shift.endsAt));
    // The inputs hold recent acknowledged urgent flags too, for the monitoring schedule.
    const openFlags = mine.flags.filter((flag) => flag.acknowledgedAt === null);
    const flags = {
      urgent: openFlags.filter((flag) => flag.severity === 'urgent').length,
      review: openFlags.filter((flag) => flag.severity === 'review').length,
      info: openFlags.filter((flag) => flag.severity === 'info').length,
      open: openFlags.map(toFlagResponse),
    };
    const row: Omit<HandoverRow, 'riskTier'> = {
      orderId: order.id,
      status: order.status,
      bed: order.patient.bed,
      patient: {
        id: order.patientId,
        name: patientDisplayName(order.patient),
        mrn: order.patient.mrn,
        ageYears: ageInYears(order.patient.dateOfBirth, now),
        weightKg: order.patient.weightKg,
        allergies: sortAllergies(order.patient.allergies).map(({ substance, reaction, severity }) => ({ substance, reaction, severity })),
        noKnownAllergies: order.patient.noKnownAllergies,
      },
      drugName: order.drug.genericName,
      doseUnit: order.doseUnit,
      concentrationPerMl: order.concentrationPerMl,
      regimen: {
        demandDose: order.demandDose,
        lockoutMinutes: order.lockoutMinutes,
        basalRatePerHour: order.basalRatePerHour,
        oneHourLimit: order.oneHourLimit,
        fourHourLimit: order.fourHourLimit,
      },
      startedAt: order.startedAt?.toISOString() ?? null,
      minutesSinceStart: order.startedAt ? Math.floor((now.getTime() - order.startedAt.getTime()) / 60_000) : null,
      ...figures,
      flags,
      paused: pcaPaused(mine.pauses ?? []),
      pendingTasks: pendingTasks(order, mine, now),
      signoffs: mine.signoffs.map(toSignoffResponse),
    };
    return { ...row, riskTier: riskTier(row) };
  });
  return rows.sort(compareHandoverRows);
}

function pendingTasks(order: PcaOrder, mine: OrderInputs, now: Date): PendingTask[] {
  const tasks: PendingTask[] = [];
  if (order.status === 'awaiting_verification') tasks.push({ code: 'awaiting_verification', since: order.signedAt.toISOString() });
  if (order.status === 'verified') tasks.push({ code: 'awaiting_bedside_check', since: order.statusChangedAt.toISOString() });
  const discrepancy = mine.discrepancies[0];
  if (discrepancy) tasks.push({ code: 'reconciliation_discrepancy', since: discrepancy.at.toISOString() });
  if (order.reviewDate < now.toISOString().slice(0, 10)) tasks.push({ code: 'review_date_passed', since: order.reviewDate });
  return tasks;
}
