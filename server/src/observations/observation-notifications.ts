import { tallMan, type FlagDraft } from '@lockstep/shared';
import type { OutgoingMail } from '../mail/mail.service.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';

// As with order e-mails: bed and MRN, not the patient's name.
const where = (order: PcaOrder) => `${order.patient.ward.name} bed ${order.patient.bed} (MRN ${order.patient.mrn})`;

export function urgentFlagsMail(order: PcaOrder, flags: FlagDraft[], to: string): OutgoingMail {
  return {
    to,
    subject: `URGENT: ${flags.map((flag) => flag.message).join('; ')} — ${order.patient.ward.name} bed ${order.patient.bed}`,
    text: `Urgent flags on the ${tallMan(order.drug.genericName)} PCA for ${where(order)}:\n\n${flags.map((flag) => `- ${flag.message}. ${flag.action}.`).join('\n')}\n\nSee the patient now; acknowledge the flags in Lockstep.`,
  };
}

export function syringeLowMail(order: PcaOrder, flag: FlagDraft): OutgoingMail {
  return {
    to: order.patient.ward.pharmacyEmail,
    subject: `PCA syringe running low: ${order.patient.ward.name} bed ${order.patient.bed}`,
    text: `${flag.message} on the ${tallMan(order.drug.genericName)} PCA for ${where(order)} (order ${order.id}).\n\nPlease prepare and release the next syringe.`,
  };
}
