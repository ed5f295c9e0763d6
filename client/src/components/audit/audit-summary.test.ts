import { describe, expect, it } from 'vitest';
import { formatSummaryValue, humaniseKey, isChange, summaryFacts } from './audit-summary';

describe('humaniseKey', () => {
  it('reads camelCase, snake_case and kebab-case keys as words', () => {
    expect(humaniseKey('respiratoryRateMin')).toBe('Respiratory rate min');
    expect(humaniseKey('status')).toBe('Status');
    expect(humaniseKey('ward_name')).toBe('Ward name');
    expect(humaniseKey('library-version')).toBe('Library version');
    expect(humaniseKey('demandDoseMg')).toBe('Demand dose mg');
  });

  it('keeps known abbreviations in capitals', () => {
    expect(humaniseKey('wardId')).toBe('Ward ID');
    expect(humaniseKey('patientMrn')).toBe('Patient MRN');
    expect(humaniseKey('PCAMode')).toBe('PCA mode');
    expect(humaniseKey('spo2')).toBe('SpO₂');
    expect(humaniseKey('volumeMl')).toBe('Volume mL');
  });

  it('leaves an empty key alone', () => {
    expect(humaniseKey('')).toBe('');
  });
});

describe('formatSummaryValue', () => {
  it('writes a change as "from → to"', () => {
    expect(formatSummaryValue({ from: 8, to: 10 })).toBe('8 → 10');
    expect(formatSummaryValue({ from: null, to: 'B2403-17' })).toBe('none → B2403-17');
    expect(formatSummaryValue({ from: false, to: true })).toBe('no → yes');
  });

  it('reads order statuses and roles by their labels', () => {
    expect(formatSummaryValue({ from: 'awaiting_verification', to: 'verified' }, 'status')).toBe('Awaiting verification → Verified');
    expect(formatSummaryValue('charge_nurse', 'role')).toBe('Charge nurse');
    expect(formatSummaryValue('charge_nurse', 'other')).toBe('charge nurse');
  });

  it('shows timestamps in local time and lists as comma lists', () => {
    expect(formatSummaryValue('2026-03-03T09:05:00.000Z')).toMatch(/^\d{1,2} Mar 2026, \d{2}:05$/);
    expect(formatSummaryValue([1, 2, 3])).toBe('1, 2, 3');
    expect(formatSummaryValue([])).toBe('none');
  });

  it('copes with anything else', () => {
    expect(formatSummaryValue(null)).toBe('none');
    expect(formatSummaryValue(undefined)).toBe('none');
    expect(formatSummaryValue('')).toBe('none');
    expect(formatSummaryValue(Number.NaN)).toBe('none');
    expect(formatSummaryValue({ a: 1, bigValue: 'x' })).toBe('A: 1; Big value: x');
    expect(formatSummaryValue({})).toBe('none');
    expect(formatSummaryValue('free text, with_underscore')).toBe('free text, with_underscore');
  });
});

describe('isChange', () => {
  it('is a {from, to} pair and nothing more', () => {
    expect(isChange({ from: 1, to: 2 })).toBe(true);
    expect(isChange({ from: 1, to: 2, note: 'x' })).toBe(false);
    expect(isChange({ from: 1 })).toBe(false);
    expect(isChange([1, 2])).toBe(false);
    expect(isChange(null)).toBe(false);
  });
});

describe('summaryFacts', () => {
  it('gives one line per key, changes and key values alike', () => {
    expect(summaryFacts({ status: { from: 'awaiting_verification', to: 'verified' }, reason: 'Checked against the library' })).toEqual([
      { label: 'Status', value: 'Awaiting verification → Verified' },
      { label: 'Reason', value: 'Checked against the library' },
    ]);
  });

  it('flattens one level of nesting and inlines deeper levels', () => {
    expect(summaryFacts({ settings: { demandDose: { from: 1, to: 2 }, limits: { fourHour: 30 } } })).toEqual([
      { label: 'Settings › Demand dose', value: '1 → 2' },
      { label: 'Settings › Limits', value: 'Four hour: 30' },
    ]);
  });

  it('gives each record of a list its own line', () => {
    expect(
      summaryFacts({
        differences: [
          { field: 'demandDose', expected: 1, entered: 10 },
          { field: 'lockoutMinutes', expected: 10, entered: 5 },
        ],
      }),
    ).toEqual([
      { label: 'Differences (1)', value: 'Field: demandDose; Expected: 1; Entered: 10' },
      { label: 'Differences (2)', value: 'Field: lockoutMinutes; Expected: 10; Entered: 5' },
    ]);
    expect(summaryFacts({ flagsRaised: ['resp_rate_low'] })).toEqual([{ label: 'Flags raised', value: 'resp rate low' }]);
  });

  it('is empty for an empty summary', () => {
    expect(summaryFacts({})).toEqual([]);
    expect(summaryFacts({ note: {} })).toEqual([{ label: 'Note', value: 'none' }]);
  });
});
