import type { DoseUnit } from '../drugs/drug.schema.js';
import { formatDose } from '../dose/format-dose.js';
import { tallMan } from '../dose/tall-man.js';

/** What a regimen line needs of an order (or of a handover row's regimen with its drug). */
export type RegimenDisplay = {
  drugName: string;
  concentrationPerMl: number;
  doseUnit: DoseUnit;
  loadingDose?: number | null;
  demandDose: number;
  lockoutMinutes: number;
  basalRatePerHour: number;
  oneHourLimit: number | null;
  fourHourLimit: number | null;
};

/** "HYDROmorphone 0.2 mg/mL": the tall-man name and the safe concentration. */
export function drugAndConcentration(order: Pick<RegimenDisplay, 'drugName' | 'concentrationPerMl' | 'doseUnit'>): string {
  return `${tallMan(order.drugName)} ${formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}`;
}

/**
 * The regimen part by part, each value in the safe dose format: loading dose (when ordered),
 * demand dose, lockout, basal rate ("None" without one), and the 1-hour and 4-hour limits when
 * set, or always ("Not set") with `showUnset`, for comparing with a pump field by field.
 */
export function regimenParts(
  order: Omit<RegimenDisplay, 'drugName' | 'concentrationPerMl'>,
  options: { showUnset?: boolean } = {},
): { label: string; value: string }[] {
  const unit = order.doseUnit;
  const parts: { label: string; value: string }[] = [];
  const limit = (label: string, value: number | null) => {
    if (value !== null) parts.push({ label, value: formatDose(value, unit) });
    else if (options.showUnset) parts.push({ label, value: 'Not set' });
  };
  if (order.loadingDose !== null && order.loadingDose !== undefined)
    parts.push({ label: 'Loading dose', value: formatDose(order.loadingDose, unit) });
  parts.push(
    { label: 'Demand dose', value: formatDose(order.demandDose, unit) },
    { label: 'Lockout', value: formatDose(order.lockoutMinutes, 'min') },
    { label: 'Basal rate', value: order.basalRatePerHour > 0 ? formatDose(order.basalRatePerHour, `${unit}/h`) : 'None' },
  );
  limit('1-hour limit', order.oneHourLimit);
  limit('4-hour limit', order.fourHourLimit);
  return parts;
}

const SHORT_LABELS: Record<string, string> = {
  'Loading dose': 'loading',
  'Demand dose': 'demand',
  Lockout: 'lockout',
  'Basal rate': 'basal',
};

/**
 * The regimen as short phrases, in order: "demand 1 mg", "lockout 10 min", "basal 0.5 mg/h",
 * "4-hour limit 30 mg" (no basal rate is left out rather than written "None"); the drug first
 * unless `withDrug: false`.
 */
export function regimenPhrases(order: RegimenDisplay, options: { withDrug?: boolean } = {}): string[] {
  const parts = regimenParts(order)
    .filter((part) => !(part.label === 'Basal rate' && part.value === 'None'))
    .map((part) => `${SHORT_LABELS[part.label] ?? part.label} ${part.value}`);
  return options.withDrug === false ? parts : [drugAndConcentration(order), ...parts];
}

/** The regimen on one line, as lists, dialogs, the board and e-mails write it: "morphine 1 mg/mL · demand 1 mg · lockout 10 min · 4-hour limit 30 mg". */
export function formatRegimen(order: RegimenDisplay, options: { withDrug?: boolean } = {}): string {
  return regimenPhrases(order, options).join(' · ');
}
