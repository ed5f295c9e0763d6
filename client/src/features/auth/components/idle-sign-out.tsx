import { useCallback, useMemo } from 'react';
import { IDLE_SIGN_OUT_MINUTES } from '@/config/env';
import { signOutFor } from '@/lib/auth/use-session';
import { useIdleTimer } from '../hooks/use-idle-timer';
import { formatIdleDuration, idleTiming } from '../utils/idle-timer';
import { IdleWarningModal } from './idle-warning-modal';

/** Signs a forgotten tab out after `VITE_IDLE_SIGN_OUT_MINUTES` without activity, with a warning first. */
export function IdleSignOut() {
  const timing = useMemo(() => idleTiming(IDLE_SIGN_OUT_MINUTES), []);
  const signOutIdle = useCallback(() => signOutFor('idle'), []);
  const idle = useIdleTimer(timing, signOutIdle);
  return (
    <IdleWarningModal
      opened={idle.phase === 'warning'}
      msLeft={idle.msLeft}
      idleFor={formatIdleDuration(timing.timeoutMs - timing.warningMs)}
      onStay={idle.stay}
      onSignOut={() => signOutFor('signed-out')}
    />
  );
}
