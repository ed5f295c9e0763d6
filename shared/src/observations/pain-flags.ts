import type { FlagDraft, ObservationValues, PreviousReading } from './observation-flags.js';
import type { WardPolicy } from './ward-policy.js';

// Pain this bad with no presses at all suggests the patient cannot use the handset (too drowsy,
// out of reach, not understood) rather than a regimen that is too weak. 9/10 is Lockstep's own
// threshold (common practice), not a published value.
export const PAIN_NO_PRESSES_SCORE = 9;

// Sedation 3 on the Pasero Opioid-induced Sedation Scale: reduce the opioid or notify, never
// increase it (Pasero C, 1994; Pasero C & McCaffery M, Pain Assessment and Pharmacologic
// Management, Mosby 2011) [from memory for the wording]; docs/clinical-sources.md.
export const DO_NOT_INCREASE_ACTION =
  'Do not increase the opioid: sedation or breathing is a concern (see the urgent flag). Call the prescriber or pain team for a plan without more opioid';

/**
 * Pain flags from one reading and the one before it (or the syringe's start). `doNotIncrease`
 * is true while sedation ≥ 3 or an urgent breathing flag is open or raised by this reading: the
 * pain flag then says not to increase the opioid instead of inviting a regimen review.
 */
export function painFlags(
  current: Pick<ObservationValues, 'painScore' | 'attempts' | 'delivered'>,
  previous: PreviousReading,
  policy: Pick<WardPolicy, 'painNotControlledScore' | 'painNotControlledRatio'>,
  doNotIncrease: boolean,
): FlagDraft[] {
  const flags: FlagDraft[] = [];
  const attempts = current.attempts - previous.attempts;
  const delivered = current.delivered - previous.delivered;
  if (current.painScore >= PAIN_NO_PRESSES_SCORE && attempts === 0) {
    flags.push({
      severity: 'review',
      code: 'pain.no-presses',
      message: `Pain ${current.painScore}/10 with no presses since the last observation`,
      action: doNotIncrease
        ? DO_NOT_INCREASE_ACTION
        : 'Check the patient can use the handset: awake enough, within reach and understood; check the line and the pump',
    });
    return flags;
  }
  const ratio = delivered > 0 ? attempts / delivered : attempts > 0 ? Infinity : 0;
  if (current.painScore >= policy.painNotControlledScore && ratio >= policy.painNotControlledRatio) {
    flags.push({
      severity: 'review',
      code: 'pain.not-controlled',
      message: `Pain ${current.painScore}/10 with ${attempts} attempts for ${delivered} doses since the last observation`,
      action: doNotIncrease ? DO_NOT_INCREASE_ACTION : 'Review the regimen with the prescriber or pain team; check the line and the pump',
    });
  }
  return flags;
}
