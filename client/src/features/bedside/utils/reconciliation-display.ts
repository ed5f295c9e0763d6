import { formatDose, reconcile, type FlagResponse, type ReconciliationResponse } from '@lockstep/shared';

export interface ReconciliationRow {
  label: string;
  value: string;
}

/** What the discrepancy means, in words: "5 mL unaccounted for". */
export function discrepancyText(discrepancyMl: number): string {
  if (!Number.isFinite(discrepancyMl)) return 'Cannot be worked out: check the volumes';
  if (discrepancyMl === 0) return 'None: every mL is accounted for';
  if (discrepancyMl > 0) return `${formatDose(discrepancyMl, 'mL')} unaccounted for`;
  return `${formatDose(-discrepancyMl, 'mL')} more accounted for than was dispensed`;
}

/** Dispensed, infused, wasted and the discrepancy, each in safe format. */
export function reconciliationRows(
  reconciliation: Pick<ReconciliationResponse, 'dispensedMl' | 'infusedMl' | 'wastedMl' | 'discrepancyMl'>,
): ReconciliationRow[] {
  return [
    { label: 'Dispensed', value: formatDose(reconciliation.dispensedMl, 'mL') },
    { label: 'Infused', value: formatDose(reconciliation.infusedMl, 'mL') },
    { label: 'Wasted (witnessed)', value: formatDose(reconciliation.wastedMl, 'mL') },
    { label: 'Discrepancy', value: discrepancyText(reconciliation.discrepancyMl) },
  ];
}

/**
 * The discrepancy the nurses are about to sign for, before they sign. Whether it must be reported
 * depends on the ward's tolerance, which the server applies; undefined until both volumes are in.
 */
export function previewDiscrepancy(
  dispensedMl: number,
  infusedMl: number | null | undefined,
  wastedMl: number | null | undefined,
): number | undefined {
  if (infusedMl === null || infusedMl === undefined || wastedMl === null || wastedMl === undefined) return undefined;
  return reconcile(dispensedMl, infusedMl, wastedMl, 0).discrepancyMl;
}

export const RECONCILIATION_FLAG_CODE = 'reconciliation.discrepancy';

/**
 * The review flag the server raised for this syringe's discrepancy: the open reconciliation flag
 * that names the syringe's release code, or else the newest open one.
 */
export function reconciliationFlag<T extends Pick<FlagResponse, 'code' | 'message' | 'acknowledgedAt'>>(
  flags: readonly T[],
  releaseCode: string,
): T | undefined {
  const open = flags.filter((flag) => flag.code === RECONCILIATION_FLAG_CODE && flag.acknowledgedAt === null);
  return open.find((flag) => flag.message.includes(releaseCode)) ?? open[0];
}
