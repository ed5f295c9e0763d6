import { formatDose, type FlagDraft, type ReconciliationResponse } from '@lockstep/shared';
import type { OutgoingMail } from '../mail/mail.service.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';

type Reconciled = Pick<ReconciliationResponse, 'dispensedMl' | 'infusedMl' | 'wastedMl' | 'discrepancyMl'>;

/** The flag a syringe that does not reconcile raises, open until pharmacy has reviewed it. */
export function discrepancyFlag(result: Reconciled, releaseCode: string): FlagDraft {
  return {
    severity: 'review',
    code: 'reconciliation.discrepancy',
    message: `Syringe ${releaseCode}: ${formatDose(result.discrepancyMl, 'mL')} unaccounted for (dispensed ${formatDose(result.dispensedMl, 'mL')}, infused ${formatDose(result.infusedMl, 'mL')}, wasted ${formatDose(result.wastedMl, 'mL')})`,
    action: 'Pharmacy to review the controlled-drug record with the ward and report per local policy',
  };
}

/** The notice to the ward's pharmacy; expects the order's patient (with ward) loaded. */
export function discrepancyMail(order: PcaOrder, result: Reconciled): OutgoingMail {
  const { ward, bed, mrn } = order.patient;
  return {
    to: ward.pharmacyEmail,
    subject: `Reconciliation discrepancy: PCA order ${order.id}, ${ward.name} bed ${bed}`,
    text: `A PCA syringe for ${ward.name} bed ${bed} (MRN ${mrn}) does not reconcile.\n\nDispensed ${formatDose(result.dispensedMl, 'mL')}, infused ${formatDose(result.infusedMl, 'mL')}, wasted ${formatDose(result.wastedMl, 'mL')}: ${formatDose(result.discrepancyMl, 'mL')} unaccounted for.\n\nReview the controlled-drug record with the ward.`,
  };
}

/** What the audit event of a syringe change or discontinuation records of its reconciliation. */
export function reconciliationAuditSummary(
  result: Reconciled & Pick<ReconciliationResponse, 'mustReport'> & { releaseCode?: string },
): Record<string, unknown> {
  const { releaseCode, dispensedMl, infusedMl, wastedMl, discrepancyMl, mustReport } = result;
  return { releaseCode, dispensedMl, infusedMl, wastedMl, discrepancyMl, mustReport };
}
