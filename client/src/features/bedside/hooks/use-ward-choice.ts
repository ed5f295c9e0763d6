import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';
import { useCurrentUser } from '@/lib/auth/use-session';
import { ALL_WARDS, type ResolvedWardChoice, resolveWardChoice, type WardChoice, wardParamValue } from '../utils/ward-choice';

export interface WardChoiceState extends ResolvedWardChoice {
  /** The person's own wards (by id), for the "My wards" shortcut. */
  ownWardIds: readonly number[];
  /** Writes the choice into the address (`?ward=1,4` or `?ward=all`), dropping any other narrowing. */
  choose: (choice: WardChoice) => void;
}

/**
 * The wards a nurse's list shows, kept in the address so a reload, "back" or a shared link keeps
 * them; with none asked for, the signed-in person's own wards (every ward when they have none).
 * `wards` is the app's ward list, empty while it loads (the address is trusted meanwhile).
 * `defaultAll` shows every ward when no ward is asked for (a link to one patient's orders).
 */
export function useWardChoice(wards: readonly Ward[], options: { defaultAll?: boolean } = {}): WardChoiceState {
  const [searchParams, setSearchParams] = useSearchParams();
  const user = useCurrentUser();
  const param = searchParams.get('ward');
  const ownKey = user.wards.map((ward) => ward.id).join(',');
  const knownKey = wards.map((ward) => ward.id).join(',');
  const { defaultAll = false } = options;

  const resolved = useMemo(() => {
    const ownWardIds = ownKey ? ownKey.split(',').map(Number) : [];
    const knownWardIds = knownKey ? knownKey.split(',').map(Number) : null;
    const choice =
      param === null && defaultAll
        ? ({ wards: ALL_WARDS, source: 'address' } as const)
        : resolveWardChoice(param, ownWardIds, knownWardIds);
    return { ...choice, ownWardIds };
  }, [param, ownKey, knownKey, defaultAll]);

  const choose = useCallback(
    (choice: WardChoice) => setSearchParams({ ward: wardParamValue(choice) }, { replace: true }),
    [setSearchParams],
  );

  return { ...resolved, choose };
}
