import { formatDose, formatRegimen } from '@lockstep/shared';
import type { OutgoingMail } from '../mail/mail.service.js';
import type { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import type { PcaOrder } from './entities/pca-order.entity.js';

// E-mails name the bed and MRN, not the patient: the least identifying detail that lets the
// reader find the order in Lockstep.

/** Expects patient (with ward), drug and prescriber loaded. */
function regimenLine(order: PcaOrder): string {
  return formatRegimen({ ...order, drugName: order.drug.genericName });
}

function where(order: PcaOrder): string {
  return `${order.patient.ward.name} bed ${order.patient.bed} (MRN ${order.patient.mrn})`;
}

export function orderAwaitingVerificationMail(order: PcaOrder): OutgoingMail {
  return {
    to: order.patient.ward.pharmacyEmail,
    subject: `PCA order ${order.id} awaiting verification: ${order.patient.ward.name} bed ${order.patient.bed}`,
    text: `A PCA order (version ${order.version}) by ${order.prescriber.displayName} is waiting for pharmacy verification.\n\n${where(order)}\n${regimenLine(order)}\n\nOpen the verification queue in Lockstep.`,
  };
}

export function orderReturnedMail(order: PcaOrder, reason: string, pharmacistName: string): OutgoingMail {
  return {
    to: order.prescriber.email,
    subject: `PCA order ${order.id} returned with a query`,
    text: `${pharmacistName} returned your PCA order for ${where(order)} with a query:\n\n"${reason}"\n\n${regimenLine(order)}\n\nRevise and sign it again in Lockstep (My orders).`,
  };
}

export function orderRejectedMail(order: PcaOrder, reason: string, pharmacistName: string): OutgoingMail {
  return {
    to: order.prescriber.email,
    subject: `PCA order ${order.id} rejected`,
    text: `${pharmacistName} rejected your PCA order for ${where(order)}:\n\n"${reason}"\n\n${regimenLine(order)}`,
  };
}

export function syringeReleasedMail(order: PcaOrder, release: SyringeRelease): OutgoingMail {
  return {
    to: order.patient.ward.nurseInChargeEmail,
    subject: `PCA syringe released for ${order.patient.ward.name} bed ${order.patient.bed}`,
    text: `Pharmacy released a PCA syringe for ${where(order)}.\n\n${regimenLine(order)}\nSyringe: ${formatDose(release.volumeMl, 'mL')}, batch ${release.batch}, release code ${release.releaseCode}.\n\nA two-nurse bedside check starts it.`,
  };
}
