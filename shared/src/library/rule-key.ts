import { formatDose } from '../dose/format-dose.js';
import { type RulePopulation, populationKey } from './rule-population.js';

/** Identifies a rule within a version: one drug at one concentration for one population (adult rules keep the plain key). */
export function ruleKey(rule: { drugId: number; concentrationPerMl: number } & Partial<RulePopulation>): string {
  const key = `${rule.drugId}@${Number(rule.concentrationPerMl.toPrecision(12))}`;
  const population = populationKey(rule);
  return population === 'adult' ? key : `${key}#${population}`;
}

/** e.g. "morphine 1 mg/mL", with the name already tall-man lettered by the caller if wanted. */
export function ruleLabel(drugName: string, concentrationPerMl: number, doseUnit: string): string {
  return `${drugName} ${formatDose(concentrationPerMl, `${doseUnit}/mL`)}`;
}
