import { describe, expect, it } from 'vitest';
import { hasAllergies, patientDisplayName, patientRiskFactors } from './patient-display.js';

describe('patient display', () => {
  it('writes the family name in capitals first', () => {
    expect(patientDisplayName({ familyName: 'Okonkwo-Brandt', givenName: 'Felix' })).toBe('OKONKWO-BRANDT, Felix');
  });

  it('reads "none known" phrasings as no allergy', () => {
    for (const none of ['', 'None', 'NKDA.', 'No known drug allergies', ' nil ']) expect(hasAllergies(none), none).toBe(false);
    expect(hasAllergies('Morphine (itch, not anaphylaxis)')).toBe(true);
  });

  it('lists the risk factors recorded, in screen order', () => {
    const none = { allergies: 'No known drug allergies', opioidTolerant: false, sleepApnoea: false, otherSedatives: false };
    expect(patientRiskFactors(none)).toEqual([]);
    expect(patientRiskFactors({ allergies: 'Latex', opioidTolerant: true, sleepApnoea: true, otherSedatives: true })).toEqual([
      'allergies',
      'opioid-tolerant',
      'sleep-apnoea',
      'other-sedatives',
    ]);
  });
});
