import { describe, expect, it } from 'vitest';
import { WARD_POLICY_APPROVER_ROLES, wardPolicyApprovalRefusal } from './ward-policy-sign-off.js';

describe('ward policy sign-off', () => {
  it('is for a charge nurse or a pharmacist', () => {
    expect(WARD_POLICY_APPROVER_ROLES).toEqual(['charge_nurse', 'pharmacist']);
    expect(wardPolicyApprovalRefusal(1, { id: 2, role: 'charge_nurse' })).toBeNull();
    expect(wardPolicyApprovalRefusal(1, { id: 3, role: 'pharmacist' })).toBeNull();
    for (const role of ['nurse', 'prescriber', 'admin'] as const) {
      expect(wardPolicyApprovalRefusal(1, { id: 4, role })).toBe('A charge nurse or a pharmacist signs off a ward policy change');
    }
  });

  it('never by the person who proposed the change', () => {
    expect(wardPolicyApprovalRefusal(7, { id: 7, role: 'pharmacist' })).toBe(
      'A second person must sign off a ward policy change: you proposed this one',
    );
  });
});
