import { describe, expect, it } from 'vitest';
import {
  blockingFindings,
  hasBlockingFinding,
  isBlockingFinding,
  reasonsToKeep,
  softFindingFields,
  unexplainedSoftFindings,
} from './signing-findings.js';
import type { Finding } from './types.js';

// Invented findings: the rule is about severities, not values.
const finding = (field: string, severity: Finding['severity']): Finding => ({
  field,
  severity,
  code: `${severity}.${field}`,
  message: field,
});
const findings = [
  finding('oneHourLimit', 'error'),
  finding('lockoutMinutes', 'hard'),
  finding('fourHourLimit', 'soft'),
  finding('demandDose', 'soft'),
  finding('patient', 'caution'),
];

describe('signing findings', () => {
  it('errors and hard limits block; soft limits and cautions do not', () => {
    expect(findings.map(isBlockingFinding)).toEqual([true, true, false, false, false]);
    expect(blockingFindings(findings).map((f) => f.field)).toEqual(['oneHourLimit', 'lockoutMinutes']);
    expect(hasBlockingFinding(findings)).toBe(true);
    expect(hasBlockingFinding(findings.slice(2))).toBe(false);
  });

  it('a soft finding needs a reason for its field; reasons for other fields are not kept', () => {
    expect(softFindingFields(findings)).toEqual(['demandDose', 'fourHourLimit']);
    expect(unexplainedSoftFindings(findings, [{ field: 'demandDose' }]).map((f) => f.field)).toEqual(['fourHourLimit']);
    expect(
      reasonsToKeep(findings, [
        { field: 'demandDose', reason: '  Tolerated in recovery  ' },
        { field: 'lockoutMinutes', reason: 'Not a soft finding' },
      ]),
    ).toEqual([{ field: 'demandDose', reason: 'Tolerated in recovery' }]);
  });
});
