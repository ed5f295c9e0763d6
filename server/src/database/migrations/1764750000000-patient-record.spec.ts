import { describe, expect, it } from 'vitest';
import { allergyEntriesFromText } from './1764750000000-patient-record.js';

describe('the old allergy text as entries', () => {
  it('reads "none known" phrasings as no known allergies, and empty text as nothing recorded', () => {
    for (const none of ['None', 'NKDA.', 'No known drug allergies', ' nil ']) expect(allergyEntriesFromText(none), none).toBeNull();
    expect(allergyEntriesFromText('')).toEqual([]);
    expect(allergyEntriesFromText('  ')).toEqual([]);
  });

  it('keeps text in parentheses as the reaction, commas inside them included', () => {
    expect(allergyEntriesFromText('Morphine (itch, not anaphylaxis)')).toEqual([
      { substance: 'Morphine', reaction: 'itch, not anaphylaxis' },
    ]);
  });

  it('splits on commas and semicolons outside parentheses, "not recorded" where no reaction is given', () => {
    expect(allergyEntriesFromText('Penicillin (rash); Latex, codeine (vomiting)')).toEqual([
      { substance: 'Penicillin', reaction: 'rash' },
      { substance: 'Latex', reaction: 'not recorded' },
      { substance: 'codeine', reaction: 'vomiting' },
    ]);
  });
});
