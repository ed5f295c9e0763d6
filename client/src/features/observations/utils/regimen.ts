import { formatDose, tallMan } from '@lockstep/shared';
import type { PcaOrderSummary } from '../api/pca-schemas';

type Regimen = Pick<
  PcaOrderSummary,
  | 'drugName'
  | 'concentrationPerMl'
  | 'doseUnit'
  | 'loadingDose'
  | 'demandDose'
  | 'lockoutMinutes'
  | 'basalRatePerHour'
  | 'oneHourLimit'
  | 'fourHourLimit'
>;

/** "HYDROmorphone 0.2 mg/mL": the tall-man name and the safe concentration. */
export function drugAndConcentration(order: Pick<Regimen, 'drugName' | 'concentrationPerMl' | 'doseUnit'>): string {
  return `${tallMan(order.drugName)} ${formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}`;
}

/** The regimen in safe format, part by part: "Demand 0.2 mg", "Lockout 10 min", … */
export function regimenParts(order: Regimen): { label: string; value: string }[] {
  const unit = order.doseUnit;
  const parts: { label: string; value: string }[] = [];
  if (order.loadingDose !== null) parts.push({ label: 'Loading dose', value: formatDose(order.loadingDose, unit) });
  parts.push(
    { label: 'Demand dose', value: formatDose(order.demandDose, unit) },
    { label: 'Lockout', value: formatDose(order.lockoutMinutes, 'min') },
  );
  parts.push({ label: 'Basal rate', value: order.basalRatePerHour > 0 ? formatDose(order.basalRatePerHour, `${unit}/h`) : 'None' });
  if (order.oneHourLimit !== null) parts.push({ label: '1-hour limit', value: formatDose(order.oneHourLimit, unit) });
  if (order.fourHourLimit !== null) parts.push({ label: '4-hour limit', value: formatDose(order.fourHourLimit, unit) });
  return parts;
}
