import { useState } from 'react';
import { useInterval } from '@mantine/hooks';

/** The current time, updated every `everyMs`, so "due in 25 min" or "waiting 42 min" keeps counting on screen. */
export function useNow(everyMs: number): Date {
  const [now, setNow] = useState(() => new Date());
  useInterval(() => setNow(new Date()), everyMs, { autoInvoke: true });
  return now;
}
