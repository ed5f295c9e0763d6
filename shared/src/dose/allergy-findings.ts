import type { AllergySeverity, Finding, OrderCheckContext, PatientAllergy } from './types.js';

const SEVERITY_WORDS: Readonly<Record<AllergySeverity, string>> = {
  intolerance: 'intolerance',
  allergy: 'allergy',
  anaphylaxis: 'anaphylaxis',
};

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * True when the entry is about the ordered drug: the same formulary drug, or free text naming the
 * drug's generic name as a whole word, in any case ("Morphine sulfate" names morphine;
 * "hydromorphone" does not).
 */
function allergyNamesDrug(allergy: PatientAllergy, drug: { id: number; genericName: string }): boolean {
  if (allergy.drugId !== null && allergy.drugId === drug.id) return true;
  const name = drug.genericName.trim();
  if (name === '') return false;
  return new RegExp(`(^|[^\\p{L}\\p{N}])${escapeRegExp(name)}($|[^\\p{L}\\p{N}])`, 'iu').test(allergy.substance);
}

/**
 * Findings for ordering a drug the patient is recorded as allergic to: anaphylaxis blocks (`hard`),
 * an allergy or intolerance needs a reason (`soft`). Each entry that names the drug gives one
 * finding on `drugId` naming the substance, the reaction and the severity. No drug or no entries:
 * no findings.
 */
export function allergyFindings(drug: OrderCheckContext['drug'], allergies: readonly PatientAllergy[] | undefined): Finding[] {
  if (!drug || !allergies) return [];
  return allergies
    .filter((allergy) => allergyNamesDrug(allergy, drug))
    .map((allergy): Finding => {
      const recorded = `${allergy.substance} (${SEVERITY_WORDS[allergy.severity]}; reaction: ${allergy.reaction})`;
      return allergy.severity === 'anaphylaxis'
        ? {
            field: 'drugId',
            severity: 'hard',
            code: 'allergy.anaphylaxis',
            message: `Recorded anaphylaxis to ${recorded}: this drug cannot be ordered for this patient`,
          }
        : {
            field: 'drugId',
            severity: 'soft',
            code: `allergy.${allergy.severity}`,
            message: `Recorded ${recorded}: give a reason to order this drug`,
          };
    });
}
