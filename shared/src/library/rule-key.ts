import { formatDose } from '../dose/format-dose.js';

/** Identifies a rule within a version: one drug at one concentration. */
export function ruleKey(rule: { drugId: number; concentrationPerMl: number }): string {
  return `${rule.drugId}@${Number(rule.concentrationPerMl.toPrecision(12))}`;
}

/** e.g. "morphine 1 mg/mL", with the name already tall-man lettered by the caller if wanted. */
export function ruleLabel(drugName: string, concentrationPerMl: number, doseUnit: string): string {
  return `${drugName} ${formatDose(concentrationPerMl, `${doseUnit}/mL`)}`;
}
