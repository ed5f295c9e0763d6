import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY, type WardPolicySettings } from '@lockstep/shared';
import {
  changeRows,
  formatSettingValue,
  proposalErrors,
  proposalRows,
  proposeBlock,
  signOffBlock,
  splitPolicyChanges,
} from './policy-change';

const SAVED: WardPolicySettings = { ...DEFAULT_WARD_POLICY, pharmacyEmail: 'pharmacy.harbour@kestrelbay.example', nurseInChargeEmail: '' };
const ADMIN = { id: 7, name: 'Sam Rivera' };

describe('formatSettingValue', () => {
  it('shows each setting with its unit, in safe number format', () => {
    expect(formatSettingValue('spo2Threshold', 93)).toBe('93 %');
    expect(formatSettingValue('respiratoryRateThreshold', 10)).toBe('10/min');
    expect(formatSettingValue('observationIntervalMinutes', 90)).toBe('90 min');
    // ISMP List of Error-Prone Abbreviations: a leading zero, no trailing zero.
    expect(formatSettingValue('reconciliationToleranceMl', 0.5)).toBe('0.5 mL');
    expect(formatSettingValue('syringeLowThresholdHours', 3.0)).toBe('3 h');
  });

  it('shows a setting it does not know as a plain number', () => {
    expect(formatSettingValue('somethingNew', 12)).toBe('12');
  });
});

describe('changeRows and proposalRows', () => {
  it('lists each setting from → to beside the shipped default', () => {
    // Shipped SpO2 threshold 92 %: urgent at 91 % or below, NEWS2 scale 1 (Royal College of Physicians 2017).
    expect(changeRows([{ field: 'spo2Threshold', from: 92, to: 93 }])).toEqual([
      { field: 'spo2Threshold', label: 'SpO2 below', from: '92 %', to: '93 %', shippedDefault: '92 %' },
    ]);
    expect(changeRows([{ field: 'somethingNew', from: 1, to: 2 }])).toEqual([
      { field: 'somethingNew', label: 'somethingNew', from: '1', to: '2', shippedDefault: null },
    ]);
  });

  it('takes "from" from the saved policy when proposing', () => {
    expect(proposalRows({ spo2Threshold: 94, respiratoryRateThreshold: 10 }, { ...SAVED, spo2Threshold: 93 })).toEqual([
      { field: 'spo2Threshold', label: 'SpO2 below', from: '93 %', to: '94 %', shippedDefault: '92 %' },
      { field: 'respiratoryRateThreshold', label: 'Respiratory rate below', from: '9/min', to: '10/min', shippedDefault: '9/min' },
    ]);
  });
});

describe('splitPolicyChanges', () => {
  it('proposes the clinical settings and saves the e-mail addresses directly', () => {
    expect(splitPolicyChanges({ spo2Threshold: 94, nurseInChargeEmail: 'nic@kestrelbay.example' })).toEqual({
      settings: { spo2Threshold: 94 },
      emails: { nurseInChargeEmail: 'nic@kestrelbay.example' },
    });
    expect(splitPolicyChanges({ pharmacyEmail: '' })).toEqual({ settings: {}, emails: { pharmacyEmail: '' } });
    expect(splitPolicyChanges({})).toEqual({ settings: {}, emails: {} });
  });
});

describe('proposalErrors', () => {
  it('puts each message where it belongs', () => {
    expect(
      proposalErrors([
        { field: 'changes.spo2Threshold', message: 'At least 92 %' },
        { field: 'reason', message: 'Give the reason for the change' },
        { field: 'signature.password', message: 'The password you signed with is not correct' },
        { field: 'changes', message: 'Change at least one setting' },
      ]),
    ).toEqual({
      settings: { spo2Threshold: 'At least 92 %' },
      reason: 'Give the reason for the change',
      password: 'The password you signed with is not correct',
      other: ['Change at least one setting'],
    });
  });
});

describe('who may act', () => {
  it('refuses another proposal while one waits on the ward, saying whose', () => {
    expect(proposeBlock(null)).toBeNull();
    expect(proposeBlock({ proposedBy: ADMIN })).toMatch(/^A change proposed by Sam Rivera is awaiting sign-off/);
  });

  it('lets a charge nurse or pharmacist sign off, never the proposer', () => {
    expect(signOffBlock({ proposedBy: ADMIN }, { id: 3, role: 'charge_nurse' })).toBeNull();
    expect(signOffBlock({ proposedBy: ADMIN }, { id: 2, role: 'pharmacist' })).toBeNull();
    expect(signOffBlock({ proposedBy: { id: 2, name: 'Lin Park' } }, { id: 2, role: 'pharmacist' })).toMatch(/you proposed this one/);
    expect(signOffBlock({ proposedBy: ADMIN }, { id: 4, role: 'nurse' })).toMatch(/charge nurse or a pharmacist/);
  });
});
