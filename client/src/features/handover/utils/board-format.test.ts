import { describe, expect, it } from 'vitest';
import type { HandoverRow } from '@lockstep/shared';
import { formatShift, lastFourHours, patientFacts } from './board-format';

// The demo's hydromorphone order (Harbour H07, invented). The regimen line itself is shared's formatRegimen.
const hydromorphone: Pick<HandoverRow, 'drugName' | 'concentrationPerMl' | 'doseUnit' | 'regimen' | 'last4h'> = {
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  regimen: { demandDose: 0.2, lockoutMinutes: 10, basalRatePerHour: 0.1, oneHourLimit: null, fourHourLimit: 6 },
  last4h: { attempts: 6, delivered: 4, dose: 0.8 },
};

describe('board formatting', () => {
  it('writes the last 4 hours and the patient facts', () => {
    expect(lastFourHours(hydromorphone)).toBe('6 / 4 · 0.8 mg');
    expect(patientFacts({ id: 3, name: 'FALEOLO, Tavita', mrn: 'KB100672', ageYears: 47, weightKg: 118 })).toBe('47 y · 118 kg');
    expect(patientFacts({ id: 3, name: 'X', mrn: 'Y', ageYears: 47, weightKg: null })).toBe('47 y · weight not recorded');
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
