import { useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';

/**
 * The ward chosen in the address (`?ward=1`, so a reload or a shared link keeps it); the first
 * ward when none (or an unknown one) is given. While the wards load, the address is trusted so
 * the board need not wait for the list.
 */
export function useWardParam(wards: readonly Ward[]): number | null {
  const [searchParams] = useSearchParams();
  const asked = Number(searchParams.get('ward'));
  if (wards.length === 0) return Number.isInteger(asked) && asked > 0 ? asked : null;
  if (wards.some((ward) => ward.id === asked)) return asked;
  return wards[0]?.id ?? null;
}
