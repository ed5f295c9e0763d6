import { describe, expect, it } from 'vitest';
import { requestFieldErrors } from '../api/request-errors.js';
import {
  CLINICAL_SETTING_NEEDS_SIGN_OFF,
  proposeWardPolicyChangeSchema,
  updateWardContactsSchema,
  WARD_POLICY_SETTING_FIELDS,
} from './ward-policy-change.schema.js';

const errorsOf = (result: { success: boolean; error?: unknown }) =>
  result.success ? [] : requestFieldErrors(result.error as Parameters<typeof requestFieldErrors>[0]);
const proposal = (changes: unknown) => ({ changes, reason: 'Closer monitoring on this ward', signature: { password: 'x' } });

describe('ward policy change requests', () => {
  it('lists every clinical setting and never an e-mail address', () => {
    expect(WARD_POLICY_SETTING_FIELDS).toContain('spo2Threshold');
    expect(WARD_POLICY_SETTING_FIELDS).toContain('respiratoryRateThreshold');
    expect(WARD_POLICY_SETTING_FIELDS).not.toContain('pharmacyEmail');
    expect(WARD_POLICY_SETTING_FIELDS).not.toContain('nurseInChargeEmail');
  });

  // Floors: NEWS2 (Royal College of Physicians, 2017) scores SpO2 <= 91 % on scale 1 as 3, so urgent below 92 % at least.
  it('holds each proposed setting to its floor, naming it under changes', () => {
    expect(proposeWardPolicyChangeSchema.safeParse(proposal({ spo2Threshold: 93 })).success).toBe(true);
    expect(errorsOf(proposeWardPolicyChangeSchema.safeParse(proposal({ spo2Threshold: 91 })))).toEqual([
      {
        field: 'changes.spo2Threshold',
        message: 'At least 92 %: SpO2 of 91 % or below is always urgent (NEWS2 scale 1, Royal College of Physicians 2017)',
      },
    ]);
  });

  it('asks for at least one setting, and refuses an e-mail address as one', () => {
    for (const changes of [{}, { pharmacyEmail: 'pharmacy@hospital.example' }, { notASetting: 1 }]) {
      expect(errorsOf(proposeWardPolicyChangeSchema.safeParse(proposal(changes)))).toEqual([
        { field: 'changes', message: 'Change at least one setting' },
      ]);
    }
    expect(errorsOf(proposeWardPolicyChangeSchema.safeParse(proposal(undefined)))).toEqual([
      { field: 'changes', message: 'Choose the settings to change' },
    ]);
  });

  it('lets PATCH change the e-mail addresses and refuses a clinical setting there, saying how to change it', () => {
    expect(updateWardContactsSchema.safeParse({ pharmacyEmail: '', nurseInChargeEmail: 'nic@hospital.example' }).success).toBe(true);
    expect(errorsOf(updateWardContactsSchema.safeParse({ spo2Threshold: 93 }))).toEqual([
      { field: 'spo2Threshold', message: CLINICAL_SETTING_NEEDS_SIGN_OFF },
    ]);
  });
});
