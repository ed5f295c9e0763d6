import { describe, expect, it } from 'vitest';
import type { HandoverRow } from '@lockstep/shared';
import { allergyLines, formatShift, lastFourHours, patientFacts } from './board-format';

// The demo's hydromorphone order (Harbour H07, invented). The regimen line itself is shared's formatRegimen.
const hydromorphone: Pick<HandoverRow, 'drugName' | 'concentrationPerMl' | 'doseUnit' | 'regimen' | 'last4h'> = {
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  regimen: { demandDose: 0.2, lockoutMinutes: 10, basalRatePerHour: 0.1, oneHourLimit: null, fourHourLimit: 6 },
  last4h: { attempts: 6, delivered: 4, dose: 0.8 },
};

const faleolo = { id: 3, name: 'FALEOLO, Tavita', mrn: 'KB100672', ageYears: 47, weightKg: 118, allergies: [], noKnownAllergies: true };

describe('allergyLines', () => {
  it('writes each allergy with its severity as a word, and says whether none are known or none recorded', () => {
    expect(
      allergyLines({
        ...faleolo,
        noKnownAllergies: false,
        allergies: [
          { substance: 'Latex', reaction: 'throat swelling', severity: 'anaphylaxis' },
          { substance: 'morphine', reaction: 'itch', severity: 'intolerance' },
        ],
      }).map((line) => line.text),
    ).toEqual(['Anaphylaxis: Latex (throat swelling)', 'Intolerance: morphine (itch)']);
    expect(allergyLines(faleolo)).toEqual([{ text: 'No known allergies', severity: null }]);
    expect(allergyLines({ ...faleolo, noKnownAllergies: false })).toEqual([{ text: 'Allergies not recorded', severity: null }]);
  });
});

describe('board formatting', () => {
  it('writes the last 4 hours and the patient facts', () => {
    expect(lastFourHours(hydromorphone)).toBe('6 / 4 · 0.8 mg');
    expect(patientFacts({ ...faleolo, weightKg: 118 })).toBe('47 y · 118 kg');
    expect(patientFacts({ ...faleolo, weightKg: null })).toBe('47 y · weight not recorded');
  });
});

describe('shift formatting', () => {
  it('names the shift with its date and hours', () => {
    const night = {
      shift: 'night' as const,
      shiftDate: '2026-12-01',
      startsAt: '2026-12-01T19:00:00.000Z',
      endsAt: '2026-12-02T07:00:00.000Z',
    };
    expect(formatShift(night, 'UTC')).toBe('Night shift, 1 Dec 2026, 19:00–07:00');
    expect(formatShift({ ...night, shift: 'day', startsAt: '2026-12-01T07:00:00.000Z', endsAt: '2026-12-01T19:00:00.000Z' }, 'UTC')).toBe(
      'Day shift, 1 Dec 2026, 07:00–19:00',
    );
  });
});
