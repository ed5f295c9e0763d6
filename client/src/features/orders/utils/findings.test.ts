import { describe, expect, it } from 'vitest';
import type { Finding } from '@lockstep/shared';
import { countBySeverity, findingsFor, sameFindings } from './findings';

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
  finding('patient', 'caution', 'caution.age-65-or-over'),
];

describe('findings by field', () => {
  it('finds the findings on one field', () => {
    expect(findingsFor(findings, 'demandDose')).toHaveLength(1);
    expect(findingsFor(findings, 'loadingDose')).toEqual([]);
  });

  it('counts findings by severity', () => {
    expect(countBySeverity(findings)).toEqual({ error: 1, hard: 1, soft: 2, caution: 3 });
  });

  it('compares two checks by what they found, not by wording or order', () => {
    const reworded = [...findings].reverse().map((f) => ({ ...f, message: 'other words' }));
    expect(sameFindings(findings, reworded)).toBe(true);
    expect(sameFindings(findings, findings.slice(1))).toBe(false);
    expect(sameFindings([finding('demandDose', 'soft')], [finding('demandDose', 'hard', 'soft.demandDose')])).toBe(false);
  });
});
