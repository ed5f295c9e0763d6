import { describe, expect, it } from 'vitest';
import type { HandoverRow } from '@lockstep/shared';
import { drugLine, formatShift, lastFourHours, patientFacts, regimenLines, regimenSummary } from './board-format';

// The demo's hydromorphone order (BRIEF §7, Harbour H07).
const hydromorphone: Pick<HandoverRow, 'drugName' | 'concentrationPerMl' | 'doseUnit' | 'regimen' | 'last4h'> = {
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  regimen: { demandDose: 0.2, lockoutMinutes: 10, basalRatePerHour: 0.1, oneHourLimit: null, fourHourLimit: 6 },
  last4h: { attempts: 6, delivered: 4, dose: 0.8 },
};

describe('regimen formatting', () => {
  it('writes the regimen in one safe line: leading zeros, no trailing zeros', () => {
    expect(regimenSummary(hydromorphone)).toBe('0.2 mg / 10 min, basal 0.1 mg/h, 4-h limit 6 mg');
  });

  it('leaves out what a demand-only order does not have, and shows a 1-hour limit', () => {
    const fentanyl = {
      doseUnit: 'mcg' as const,
      regimen: { demandDose: 10, lockoutMinutes: 6, basalRatePerHour: 0, oneHourLimit: 100, fourHourLimit: null },
    };
    expect(regimenSummary(fentanyl)).toBe('10 mcg / 6 min, 1-h limit 100 mcg');
  });

  it('writes the drug in tall-man letters with its concentration', () => {
    expect(drugLine(hydromorphone)).toBe('HYDROmorphone 0.2 mg/mL');
    expect(drugLine({ drugName: 'fentanyl', concentrationPerMl: 10, doseUnit: 'mcg' })).toBe('fentaNYL 10 mcg/mL');
  });

  it('lists each setting to compare with the pump', () => {
    expect(regimenLines(hydromorphone)).toEqual([
      { label: 'Drug and concentration', value: 'HYDROmorphone 0.2 mg/mL' },
      { label: 'Demand dose', value: '0.2 mg' },
      { label: 'Lockout interval', value: '10 min' },
      { label: 'Basal rate', value: '0.1 mg/h' },
      { label: '1-hour limit', value: 'Not set' },
      { label: '4-hour limit', value: '6 mg' },
    ]);
  });

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
