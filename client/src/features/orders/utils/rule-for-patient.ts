import {
  chooseRule,
  populationContains,
  ruleKey,
  type Finding,
  type LimitRuleResponse,
  type OrderCheckContext,
  type OtherLibrary,
  type PatientFactors,
  ruleChoiceFindings,
} from '@lockstep/shared';
import { localFindings, type ReadOrderForm } from './order-form';

export interface RuleForPatient {
  /** The rule the order is checked against: chosen by the patient, not only the ward; null when none fits. */
  rule: LimitRuleResponse | null;
  /** What the choice itself says: another ward's rule (a caution) or none (blocks). */
  findings: Finding[];
  /** The ward's library has no rule for this patient: the other wards' libraries are needed to decide. */
  needsOtherLibraries: boolean;
}

/**
 * The rule for this patient, for the drug and concentration picked from the ward's library: shared
 * chooseRule, as the server's preview and signing choose it, so a child never gets adult limits.
 * `otherLibraries` is null while not loaded (or not needed).
 */
export function ruleForPatient(
  picked: LimitRuleResponse,
  factors: PatientFactors,
  wardRules: readonly LimitRuleResponse[],
  otherLibraries: readonly OtherLibrary<LimitRuleResponse>[] | null,
): RuleForPatient {
  const own = chooseRule(picked, factors, wardRules);
  const choice = own.kind === 'ward' || otherLibraries === null ? own : chooseRule(picked, factors, wardRules, otherLibraries);
  const order = { concentrationPerMl: picked.concentrationPerMl, doseUnit: picked.doseUnit };
  return {
    rule: choice.kind === 'none' ? null : choice.rule,
    findings: ruleChoiceFindings(choice, { genericName: picked.drugName }, order, factors),
    needsOtherLibraries: own.kind !== 'ward',
  };
}

/**
 * The live check's findings in the server preview's order: with a rule, its findings and then the
 * choice's caution; with none, the blocking "no rule" first and the checks that need no rule.
 */
export function patientRuleFindings(
  read: ReadOrderForm,
  picked: LimitRuleResponse,
  chosen: RuleForPatient,
  factors: PatientFactors,
  context: OrderCheckContext,
): Finding[] {
  if (chosen.rule) return [...localFindings(read, chosen.rule, factors, context), ...chosen.findings];
  const noLimits: LimitRuleResponse = { ...picked, perKg: false, limits: {} };
  return [...chosen.findings, ...localFindings(read, noLimits, factors, context)];
}

/**
 * The ward's rules as the drug picker offers them: one per drug and concentration (a library may
 * hold an adult and paediatric rules for one), the one for this patient where there is one. The
 * check then chooses the rule by the patient whichever is picked.
 */
export function pickableRules(rules: readonly LimitRuleResponse[], factors: PatientFactors): LimitRuleResponse[] {
  const byDrugAndConcentration = new Map<string, LimitRuleResponse>();
  for (const rule of rules) {
    const key = ruleKey({ drugId: rule.drugId, concentrationPerMl: rule.concentrationPerMl });
    const kept = byDrugAndConcentration.get(key);
    if (!kept || (!populationContains(kept, factors) && populationContains(rule, factors))) byDrugAndConcentration.set(key, rule);
  }
  return [...byDrugAndConcentration.values()];
}
