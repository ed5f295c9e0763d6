import { queryOptions, useQuery } from '@tanstack/react-query';
import { equianalgesicFactorSchema, type EquianalgesicFactor } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { equianalgesicKeys } from './equianalgesic-keys';

/** Every row of pharmacy's equianalgesic table, with its source and who changed it when. */
export function getEquianalgesicFactors(signal?: AbortSignal): Promise<EquianalgesicFactor[]> {
  return apiRequest('/equianalgesic-factors', { schema: equianalgesicFactorSchema.array(), signal });
}

export function equianalgesicFactorsQueryOptions() {
  return queryOptions({ queryKey: equianalgesicKeys.list(), queryFn: ({ signal }) => getEquianalgesicFactors(signal) });
}

export function useEquianalgesicFactors() {
  return useQuery(equianalgesicFactorsQueryOptions());
}
