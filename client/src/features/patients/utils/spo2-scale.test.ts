import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY } from '@lockstep/shared';
import { otherSpo2Scale, spo2Bands, spo2BandsText, spo2ScaleChangeConsequence } from './spo2-scale';

// NEWS2 SpO2 bands: Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017. Scale 1
// scores 91 % or below 3 and 92–93 % 2; scale 2 (confirmed hypercapnic respiratory failure only)
// scores 83 % or below 3 and 84–85 % 2, 86–87 % 1. Read here from the shared breathing flags.
describe('SpO2 scale bands', () => {
  it('scale 1: 91 % or below urgent, 92–93 % review (RCP, NEWS2, 2017)', () => {
    expect(spo2Bands('1')).toEqual({ urgentAtOrBelow: 91, reviewFrom: 92, reviewTo: 93 });
  });

  it('scale 2: 83 % or below urgent, 84–87 % review (RCP, NEWS2, 2017)', () => {
    expect(spo2Bands('2')).toEqual({ urgentAtOrBelow: 83, reviewFrom: 84, reviewTo: 87 });
    expect(spo2BandsText('2')).toBe('SpO2 83 % or below raises an urgent flag, 84–87 % a review flag');
  });

  it('scale 1 follows a ward that flags earlier; scale 2 does not', () => {
    const stricter = { ...DEFAULT_WARD_POLICY, spo2Threshold: 93 };
    expect(spo2Bands('1', stricter)).toEqual({ urgentAtOrBelow: 92, reviewFrom: 93, reviewTo: 93 });
    expect(spo2Bands('2', stricter)).toEqual({ urgentAtOrBelow: 83, reviewFrom: 84, reviewTo: 87 });
  });

  it('names the consequence of a change before it is confirmed', () => {
    expect(otherSpo2Scale('1')).toBe('2');
    expect(otherSpo2Scale('2')).toBe('1');
    const toTwo = spo2ScaleChangeConsequence('2');
    expect(toTwo).toContain('Scale 2 lowers the SpO2 bands');
    expect(toTwo).toContain('83 % or below urgent and 84–87 % review, instead of 91 % or below and 92–93 %');
    expect(toTwo).toContain('confirmed hypercapnic respiratory failure');
    expect(spo2ScaleChangeConsequence('1')).toContain('Scale 1 raises the SpO2 bands');
  });
});
