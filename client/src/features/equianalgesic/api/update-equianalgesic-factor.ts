import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  equianalgesicFactorSchema,
  type DoseUnit,
  type EquianalgesicFactor,
  type EquianalgesicRoute,
  type UpdateEquianalgesicFactorRequest,
} from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { auditKeys } from '@/api/audit/audit-keys';
import { equianalgesicKeys } from './equianalgesic-keys';

export interface UpdateEquianalgesicFactorVariables {
  drugId: number;
  route: EquianalgesicRoute;
  amount: number;
  unit: DoseUnit;
  source: string;
  password: string;
  /** One per change the pharmacist signs: the same change sent again is not recorded twice. */
  idempotencyKey: string;
}

/**
 * Pharmacist only, signed: 401 for a wrong password (on `signature.password`), 400 naming
 * `amount`, `unit` or `source`, 409 for an oral factor on a drug other than morphine.
 */
export function updateEquianalgesicFactor({
  drugId,
  route,
  password,
  idempotencyKey,
  ...values
}: UpdateEquianalgesicFactorVariables): Promise<EquianalgesicFactor> {
  const body: UpdateEquianalgesicFactorRequest = { ...values, signature: { password } };
  return apiRequest(`/equianalgesic-factors/${drugId}/${route}`, {
    method: 'PUT',
    body,
    schema: equianalgesicFactorSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useUpdateEquianalgesicFactor() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateEquianalgesicFactor,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: equianalgesicKeys.all });
      void queryClient.invalidateQueries({ queryKey: auditKeys.all });
    },
  });
}
