import { useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';
import { useCurrentUser } from '@/lib/auth/use-session';

/** With no ward asked for: the first of the person's own wards, else the first ward there is. */
export function defaultWardId(wards: readonly Pick<Ward, 'id'>[], ownWardIds: readonly number[]): number | null {
  return (wards.find((ward) => ownWardIds.includes(ward.id)) ?? wards[0])?.id ?? null;
}

/**
 * The ward chosen in the address (`?ward=1`, so a reload or a shared link keeps it); the
 * person's own ward when none (or an unknown one) is given. While the wards load, the address is
 * trusted so the board need not wait for the list.
 */
export function useWardParam(wards: readonly Ward[]): number | null {
  const [searchParams] = useSearchParams();
  const user = useCurrentUser();
  const asked = Number(searchParams.get('ward'));
  if (wards.length === 0) return Number.isInteger(asked) && asked > 0 ? asked : null;
  if (wards.some((ward) => ward.id === asked)) return asked;
  return defaultWardId(
    wards,
    user.wards.map((ward) => ward.id),
  );
}
