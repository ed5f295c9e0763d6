/**
 * Pasero Opioid-induced Sedation Scale (POSS): Pasero 1994; Pasero & McCaffery, Pain Assessment
 * and Pharmacologic Management, 2011. S, 1 and 2 are acceptable; 3 and 4 are not.
 */
export const SEDATION_LEVELS = ['S', '1', '2', '3', '4'] as const;
export type SedationLevel = (typeof SEDATION_LEVELS)[number];

export const SEDATION_DESCRIPTIONS: Record<SedationLevel, string> = {
  S: 'Asleep, easy to arouse',
  '1': 'Awake and alert',
  '2': 'Slightly drowsy, easily aroused',
  '3': 'Frequently drowsy, arousable, drifts off to sleep during conversation',
  '4': 'Somnolent, minimal or no response to verbal and physical stimulation',
};

export function isAcceptableSedation(level: SedationLevel): boolean {
  return level === 'S' || level === '1' || level === '2';
}

/** The scale's published actions for the unacceptable levels. */
export const SEDATION_ACTIONS: Record<'3' | '4', string> = {
  '3': 'Unacceptable sedation: reduce the opioid dose by 25–50 % or notify the prescriber; monitor sedation and breathing until below 3',
  '4': 'Unacceptable sedation: stop the opioid (pause the PCA), stay with the patient, call for help and consider naloxone per protocol',
};
