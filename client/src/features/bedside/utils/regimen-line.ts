import { formatDose, tallMan, type OrderSummary } from '@lockstep/shared';

type RegimenLine = Pick<
  OrderSummary,
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

/** "HYDROmorphone 0.2 mg/mL": tall-man name and safe concentration. */
export function drugAndConcentration(order: Pick<OrderSummary, 'drugName' | 'concentrationPerMl' | 'doseUnit'>): string {
  return `${tallMan(order.drugName)} ${formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}`;
}

/** The regimen's parts for a list: "demand 0.2 mg", "lockout 10 min", "basal 0.1 mg/h", … */
export function regimenParts(order: RegimenLine): string[] {
  const unit = order.doseUnit;
  const parts: string[] = [];
  if (order.loadingDose !== null) parts.push(`loading ${formatDose(order.loadingDose, unit)}`);
  parts.push(`demand ${formatDose(order.demandDose, unit)}`, `lockout ${formatDose(order.lockoutMinutes, 'min')}`);
  if (order.basalRatePerHour > 0) parts.push(`basal ${formatDose(order.basalRatePerHour, `${unit}/h`)}`);
  if (order.oneHourLimit !== null) parts.push(`1-hour limit ${formatDose(order.oneHourLimit, unit)}`);
  if (order.fourHourLimit !== null) parts.push(`4-hour limit ${formatDose(order.fourHourLimit, unit)}`);
  return parts;
}
