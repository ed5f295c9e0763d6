import { formatDose } from '../dose/format-dose.js';
import { tallMan } from '../dose/tall-man.js';
import type { Finding } from '../dose/types.js';
import type { DoseUnit } from '../drugs/drug.schema.js';
import { ORDER_STATUS_LABELS, type OrderStatus } from './order-status.js';

/**
 * One open PCA per patient (docs/design.md, "Duplicate therapy"): two PCA pumps of opioid on one
 * patient double the dose that the limits were written for. An order awaiting verification,
 * verified or running counts; a returned order does not, because it is revised (which
 * supersedes it) or cancelled before anything is given.
 */
export const ONE_PCA_STATUSES: readonly OrderStatus[] = ['awaiting_verification', 'verified', 'active'];

/** Statuses in which another order is worth a pharmacist's second look: anything not finished. */
const OTHER_OPIOID_STATUSES: readonly OrderStatus[] = [...ONE_PCA_STATUSES, 'returned'];

/** The facts about another order of the same patient that the check and its message need. */
export type OtherPcaOrder = {
  id: number;
  status: OrderStatus;
  drugName: string;
  doseUnit: DoseUnit;
  concentrationPerMl: number;
};

const WHAT_TO_DO: Readonly<Partial<Record<OrderStatus, string>>> = {
  awaiting_verification: 'cancel it, or revise it once pharmacy returns it, before ordering another',
  verified: 'cancel it before ordering another',
  active: 'discontinue it at the bedside before ordering another',
};

/** The patient's open PCA that a new order would duplicate, or null. `revising` is the order a revision replaces. */
export function openPcaFor<T extends OtherPcaOrder>(orders: readonly T[], revising?: number): T | null {
  return orders.find((order) => order.id !== revising && ONE_PCA_STATUSES.includes(order.status)) ?? null;
}

/** Other unfinished orders of the same patient, for the pharmacist's queue. */
export function otherOpioidOrders<T extends OtherPcaOrder>(orders: readonly T[], self: number): T[] {
  return orders.filter((order) => order.id !== self && OTHER_OPIOID_STATUSES.includes(order.status));
}

/** One line naming the order: "order 12, morphine 1 mg/mL, active". */
export function describeOtherOrder(order: OtherPcaOrder): string {
  const concentration = formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`);
  return `order ${order.id}, ${tallMan(order.drugName)} ${concentration}, ${ORDER_STATUS_LABELS[order.status].toLowerCase()}`;
}

/** What the API's 409 and the form's finding both say. */
export function duplicatePcaMessage(open: OtherPcaOrder): string {
  return `This patient already has an open PCA (${describeOtherOrder(open)}): ${WHAT_TO_DO[open.status] ?? 'finish it before ordering another'}`;
}

/** The same refusal as a finding, so the order form shows it before signing and keeps the sign button blocked. */
export function duplicatePcaFinding(open: OtherPcaOrder): Finding {
  return { field: 'patientId', severity: 'hard', code: 'duplicate.open-pca', message: duplicatePcaMessage(open) };
}
