import { formatDose } from '../dose/format-dose.js';
import { tallMan } from '../dose/tall-man.js';
import type { Finding } from '../dose/types.js';
import { isChild } from '../patients/adult-age.js';
import {
  type PatientForRule,
  type RulePopulation,
  exactAgeYears,
  populationContains,
  populationLabel,
  rulePopulationOf,
} from './rule-population.js';

/** What chooseRule reads of a rule; the rest of the caller's rule type is passed through. */
export type ChoosableRule = Partial<RulePopulation> & { drugId: number; concentrationPerMl: number };

/** Another ward's active library, searched when the patient's own ward has no rule for them. */
export type OtherLibrary<R> = { wardName: string; rules: readonly R[] };

export type RuleChoice<R> =
  /** From the patient's own ward's library. */
  | { kind: 'ward'; rule: R }
  /** The ward's library has no rule for this patient; this one is from another ward's active library. */
  | { kind: 'other-ward'; rule: R; wardName: string }
  /** No active library has a rule for this drug, concentration and patient. */
  | { kind: 'none'; child: boolean | null; wardHasDrugAndConcentration: boolean };

function forOrder<R extends ChoosableRule>(rules: readonly R[], drugId: number, concentrationPerMl: number): R[] {
  // Concentrations are decimals typed by people; compare with a tolerance, not bit for bit.
  return rules.filter((rule) => rule.drugId === drugId && Math.abs(rule.concentrationPerMl - concentrationPerMl) < 1e-9);
}

/** The narrowest band first, so a rule written for this child wins over a wider one (overlaps are refused on save). */
function bandWidth(rule: ChoosableRule): number {
  const p = rulePopulationOf(rule);
  const span = (min: number | null, max: number | null, open: number) => (max ?? open) - (min ?? 0);
  return span(p.minAgeYears, p.maxAgeYears, 100) * 1000 + span(p.minWeightKg, p.maxWeightKg, 1000);
}

function matching<R extends ChoosableRule>(rules: readonly R[], patient: PatientForRule): R | null {
  const found = rules.filter((rule) => populationContains(rule, patient));
  if (found.length === 0) return null;
  return [...found].sort((a, b) => bandWidth(a) - bandWidth(b))[0];
}

/**
 * The limit rule for a patient, chosen by the patient and not only by the ward: a child (under
 * 18, patients/adult-age.ts) gets a paediatric rule whose age and weight bands contain them, an
 * adult the adult rule, for the ordered drug and concentration. The patient's ward's library is
 * searched first; if it has no rule for this patient, the other active libraries in the order
 * given (a child on an adult ward gets a children's ward's paediatric rule, said in a finding),
 * and if none has one, `none`: never another population's limits.
 */
export function chooseRule<R extends ChoosableRule>(
  order: { drugId: number; concentrationPerMl: number },
  patient: PatientForRule,
  wardRules: readonly R[],
  otherLibraries: readonly OtherLibrary<R>[] = [],
): RuleChoice<R> {
  const own = forOrder(wardRules, order.drugId, order.concentrationPerMl);
  const child = isChild(exactAgeYears(patient));
  const fromWard = matching(own, patient);
  if (fromWard) return { kind: 'ward', rule: fromWard };
  for (const library of otherLibraries) {
    const rule = matching(forOrder(library.rules, order.drugId, order.concentrationPerMl), patient);
    if (rule) return { kind: 'other-ward', rule, wardName: library.wardName };
  }
  return { kind: 'none', child, wardHasDrugAndConcentration: own.length > 0 };
}

function patientWords(patient: PatientForRule): string {
  const age = exactAgeYears(patient);
  const parts = [
    age === null
      ? 'age not known'
      : age < 2 && typeof patient.ageMonths === 'number'
        ? `${patient.ageMonths} months`
        : `${Math.floor(age)} years`,
  ];
  if (typeof patient.weightKg === 'number' && patient.weightKg > 0) parts.push(formatDose(patient.weightKg, 'kg'));
  return parts.join(', ');
}

/**
 * The findings a rule choice gives, the same words on screen and server: a rule from another
 * ward's library is a caution naming the ward and population; no rule for the patient blocks
 * (`hard`, code `library.no-rule`).
 */
export function ruleChoiceFindings<R extends ChoosableRule>(
  choice: RuleChoice<R>,
  drug: { genericName: string },
  order: { concentrationPerMl: number; doseUnit: string },
  patient: PatientForRule,
): Finding[] {
  const ordered = `${tallMan(drug.genericName)} ${formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}`;
  if (choice.kind === 'ward') return [];
  if (choice.kind === 'other-ward') {
    return [
      {
        field: 'concentrationPerMl',
        severity: 'caution',
        code: 'library.other-ward',
        message: `This ward's dose-limit library has no rule for ${ordered} for this patient (${patientWords(patient)}): the limits are ${choice.wardName}'s (${populationLabel(choice.rule)})`,
      },
    ];
  }
  const who =
    choice.child === null
      ? 'this patient, whose age is not known'
      : choice.child
        ? `a child (${patientWords(patient)})`
        : `an adult (${patientWords(patient)})`;
  const message = choice.wardHasDrugAndConcentration
    ? `No active dose-limit library has a rule for ${ordered} for ${who}: ask pharmacy for one; limits for another age group are never used`
    : `The ward's dose-limit library has no rule for ${ordered} for ${who}, nor does any other active library: choose a listed concentration`;
  return [{ field: 'concentrationPerMl', severity: 'hard', code: 'library.no-rule', message }];
}
