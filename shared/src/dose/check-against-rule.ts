import type { Limits } from './types.js';

export type LimitCheck = 'ok' | 'soft-low' | 'soft-high' | 'hard-low' | 'hard-high';

function isSet(limit: number | null | undefined): limit is number {
  return limit !== null && limit !== undefined;
}

/**
 * Where `value` falls against one parameter's limits. A value equal to a limit is inside it;
 * absent or null limits are not checked; a hard limit wins over a soft one. The comparisons are
 * written as "not inside", so a NaN value (or limit) is never reported as inside a set limit.
 */
export function checkAgainstRule(value: number, l: Limits): LimitCheck {
  if (isSet(l.hardMin) && !(value >= l.hardMin)) return 'hard-low';
  if (isSet(l.hardMax) && !(value <= l.hardMax)) return 'hard-high';
  if (isSet(l.softMin) && !(value >= l.softMin)) return 'soft-low';
  if (isSet(l.softMax) && !(value <= l.softMax)) return 'soft-high';
  return 'ok';
}
