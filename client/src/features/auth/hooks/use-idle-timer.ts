import { useCallback, useEffect, useRef, useState } from 'react';
import { idleState, type IdleState, type IdleTiming } from '../utils/idle-timer';

// What counts as someone at the computer. Scroll is caught in the capture phase, so scrolling
// inside a table or a drawer counts too.
const ACTIVITY_EVENTS = ['mousemove', 'mousedown', 'keydown', 'touchstart', 'wheel', 'scroll'] as const;
const TICK_MS = 1000;

export interface IdleTimer extends IdleState {
  /** "Stay signed in": the only thing that ends the warning once it shows. */
  stay: () => void;
}

/**
 * Watches this tab for activity and calls `onExpire` once after `timing.timeoutMs` without any.
 * Mantine's `useIdle` gives only idle or not; this also gives the warning phase and the time
 * left, and while the warning shows a stray mouse movement does not dismiss it unread.
 */
export function useIdleTimer(timing: IdleTiming, onExpire: () => void): IdleTimer {
  const lastActivityAt = useRef(0);
  const [state, setState] = useState<IdleState>({ phase: 'active', msLeft: timing.timeoutMs });
  const phase = useRef<IdleState['phase']>('active');
  const expire = useRef(onExpire);
  useEffect(() => {
    expire.current = onExpire;
  }, [onExpire]);

  const check = useCallback(() => {
    const next = idleState(lastActivityAt.current, Date.now(), timing);
    const previous = phase.current;
    phase.current = next.phase;
    // Re-render each second only while a countdown is on screen.
    if (next.phase !== previous || next.phase === 'warning') setState(next);
    if (next.phase === 'expired' && previous !== 'expired') expire.current();
  }, [timing]);

  useEffect(() => {
    lastActivityAt.current = Date.now();
    phase.current = 'active';
    const onActivity = () => {
      if (phase.current === 'active') lastActivityAt.current = Date.now();
    };
    for (const type of ACTIVITY_EVENTS) window.addEventListener(type, onActivity, { capture: true, passive: true });
    const interval = window.setInterval(check, TICK_MS);
    return () => {
      for (const type of ACTIVITY_EVENTS) window.removeEventListener(type, onActivity, { capture: true });
      window.clearInterval(interval);
    };
  }, [check]);

  const stay = useCallback(() => {
    lastActivityAt.current = Date.now();
    check();
  }, [check]);

  return { ...state, stay };
}
