import { useMutation } from '@tanstack/react-query';
import { auditVerifySchema, type AuditVerifyResult } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';

/** Recomputes every event's hash on the server and says where the chain first breaks, if anywhere. */
export function verifyAuditChain(): Promise<AuditVerifyResult> {
  return apiRequest('/audit/verify', { schema: auditVerifySchema });
}

// A mutation although it is a GET: it runs when asked, and its answer is a result to show, not
// data to cache and share between screens.
export function useVerifyAuditChain() {
  return useMutation({ mutationFn: verifyAuditChain });
}
