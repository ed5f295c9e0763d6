import type { Role } from '../auth/roles.js';

/**
 * A ward policy change is clinical: the admin proposes it, signed, and a clinician signs it off before it
 * applies. The second signer is a charge nurse or a pharmacist (the ward's clinical leads), never the proposer:
 * two people, one of them clinical (common practice for independent double checks; see docs/design.md on
 * second signers).
 */
export const WARD_POLICY_APPROVER_ROLES: readonly Role[] = ['charge_nurse', 'pharmacist'];

/** Why `approver` may not sign off a change proposed by user `proposerId`, or null when they may. */
export function wardPolicyApprovalRefusal(proposerId: number, approver: { id: number; role: Role }): string | null {
  if (approver.id === proposerId) return 'A second person must sign off a ward policy change: you proposed this one';
  if (!WARD_POLICY_APPROVER_ROLES.includes(approver.role)) return 'A charge nurse or a pharmacist signs off a ward policy change';
  return null;
}
