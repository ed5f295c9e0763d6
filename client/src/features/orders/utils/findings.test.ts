import { describe, expect, it } from 'vitest';
import type { Finding } from '@lockstep/shared';
import { blockingFindings, countBySeverity, findingsByField, findingsFor, generalFindings, sameFindings, softFields } from './findings';

const finding = (field: string, severity: Finding['severity'], code = `${severity}.${field}`): Finding => ({
  field,
  severity,
  code,
  message: `${field} ${severity}`,
});

const findings: Finding[] = [
  finding('oneHourLimit', 'error'),
  finding('lockoutMinutes', 'hard'),
  finding('fourHourLimit', 'soft'),
  finding('demandDose', 'soft'),
  finding('basalRatePerHour', 'caution'),
  finding('patient', 'caution', 'caution.sleep-apnoea'),
  finding('patient', 'caution', 'caution.age-70-or-over'),
];

describe('findings by field', () => {
  it('groups findings by the field they name, keeping their order', () => {
    const grouped = findingsByField(findings);
    expect([...grouped.keys()]).toEqual(['oneHourLimit', 'lockoutMinutes', 'fourHourLimit', 'demandDose', 'basalRatePerHour', 'patient']);
    expect(grouped.get('patient')?.map((f) => f.code)).toEqual(['caution.sleep-apnoea', 'caution.age-70-or-over']);
    expect(findingsFor(findings, 'demandDose')).toHaveLength(1);
    expect(findingsFor(findings, 'loadingDose')).toEqual([]);
  });

  it('errors and hard limits block; soft fields need reasons, in the form order', () => {
    expect(blockingFindings(findings).map((f) => f.field)).toEqual(['oneHourLimit', 'lockoutMinutes']);
    expect(softFields(findings)).toEqual(['demandDose', 'fourHourLimit']);
    expect(countBySeverity(findings)).toEqual({ error: 1, hard: 1, soft: 2, caution: 3 });
  });

  it('keeps findings with no input of their own for the panel', () => {
    expect(generalFindings([...findings, finding('weightKg', 'error'), finding('concentrationPerMl', 'hard')]).map((f) => f.field)).toEqual(
      ['patient', 'patient', 'weightKg'],
    );
  });

  it('compares two checks by what they found, not by wording or order', () => {
    const reworded = [...findings].reverse().map((f) => ({ ...f, message: 'other words' }));
    expect(sameFindings(findings, reworded)).toBe(true);
    expect(sameFindings(findings, findings.slice(1))).toBe(false);
    expect(sameFindings([finding('demandDose', 'soft')], [finding('demandDose', 'hard', 'soft.demandDose')])).toBe(false);
  });
});
