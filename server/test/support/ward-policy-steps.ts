import request from 'supertest';
import type { App } from 'supertest/types.js';
import type { WardPolicyChange } from '@lockstep/shared';
import { DEMO_PASSWORD } from './demo-accounts.js';

/** Who changes a ward's clinical settings: an admin proposes, a charge nurse or a pharmacist signs off. */
type WardPolicyTokens = { admin: string; approver: string };

const signed = { signature: { password: DEMO_PASSWORD } };

/** Changes a ward's clinical settings as the ward does it: the admin's signed proposal, then a second sign-off. */
export async function changeWardPolicy(
  http: App,
  tokens: WardPolicyTokens,
  wardId: number,
  changes: Record<string, number>,
): Promise<WardPolicyChange> {
  const proposed = await request(http)
    .post(`/api/wards/${wardId}/policy-changes`)
    .set({ Authorization: `Bearer ${tokens.admin}` })
    .send({ ...signed, changes, reason: 'Ward policy changed for this test' });
  if (proposed.status !== 201) throw new Error(`Proposing ${JSON.stringify(changes)}: ${proposed.status} ${JSON.stringify(proposed.body)}`);
  const applied = await request(http)
    .post(`/api/wards/policy-changes/${proposed.body.id}/sign-off`)
    .set({ Authorization: `Bearer ${tokens.approver}` })
    .send(signed);
  if (applied.status !== 200) throw new Error(`Signing off change #${proposed.body.id}: ${applied.status} ${JSON.stringify(applied.body)}`);
  return applied.body as WardPolicyChange;
}
