import type { HandoverRow } from './handover.schema.js';

type RiskInputs = Pick<HandoverRow, 'flags' | 'nextObservation' | 'syringe'>;

/** Urgent flags first, then overdue observations, then syringes that run out within the shift. */
export function riskTier(row: RiskInputs): HandoverRow['riskTier'] {
  if (row.flags.urgent > 0) return 0;
  if (row.nextObservation && row.nextObservation.overdueMinutes > 0) return 1;
  if (row.syringe.emptiesThisShift) return 2;
  return 3;
}

/** Beds compare as people read them: H2 before H10. */
const bedCollator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

export function compareHandoverRows(
  a: Pick<HandoverRow, 'riskTier' | 'bed' | 'nextObservation'>,
  b: Pick<HandoverRow, 'riskTier' | 'bed' | 'nextObservation'>,
): number {
  if (a.riskTier !== b.riskTier) return a.riskTier - b.riskTier;
  if (a.riskTier === 1) {
    const overdue = (b.nextObservation?.overdueMinutes ?? 0) - (a.nextObservation?.overdueMinutes ?? 0);
    if (overdue !== 0) return overdue;
  }
  return bedCollator.compare(a.bed, b.bed);
}
