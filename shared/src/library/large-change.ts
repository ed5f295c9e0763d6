import type { ChangedRule, LibraryDiff, RuleChange } from './diff-library.js';

/**
 * A limit changed by this factor or more (either way) is a large change that the approver sees
 * first. A review threshold chosen for Lockstep (a tenfold slip is the classic dose error, a
 * doubling already changes what a pump may give); it is a product setting, not a published value.
 */
export const LARGE_CHANGE_FACTOR = 2;

export type LimitChangeSize =
  /** Both values set and not zero: `factor` is new ÷ old (10 raised tenfold, 0.1 lowered tenfold). */
  | { kind: 'factor'; factor: number; large: boolean }
  /** From "no limit" to a value. */
  | { kind: 'set'; large: true }
  /** From a value to "no limit". */
  | { kind: 'cleared'; large: true }
  /** From or to 0: no factor can say it. */
  | { kind: 'from-zero' | 'to-zero'; large: true };

/** How big a change of one limit is; null when the value did not change. */
export function limitChangeSize(from: number | null, to: number | null): LimitChangeSize | null {
  if (from === to) return null;
  if (from === null) return { kind: 'set', large: true };
  if (to === null) return { kind: 'cleared', large: true };
  if (from === 0) return { kind: 'from-zero', large: true };
  if (to === 0) return { kind: 'to-zero', large: true };
  const factor = to / from;
  // A hair of float noise (3 / 1.5000000001) does not make a doubling small.
  const large = Math.max(factor, 1 / factor) >= LARGE_CHANGE_FACTOR * (1 - 1e-9);
  return { kind: 'factor', factor, large };
}

/**
 * The factor as the approver reads it: "×10" raised tenfold, "÷10" lowered tenfold, to at most
 * 3 significant figures; null for a change without a factor (to or from no limit or 0).
 */
export function changeFactorLabel(size: LimitChangeSize): string | null {
  if (size.kind !== 'factor') return null;
  const shown = (ratio: number) => String(Number(ratio.toPrecision(3)));
  return size.factor >= 1 ? `×${shown(size.factor)}` : `÷${shown(1 / size.factor)}`;
}

export type LimitChange = Extract<RuleChange, { limit: unknown }>;
export type LargeLimitChange = { rule: Omit<ChangedRule, 'changes'>; change: LimitChange; size: LimitChangeSize };

/** Every large limit change of a diff, in the diff's order (rule by rule). */
export function largeLimitChanges(diff: Pick<LibraryDiff, 'changed'>): LargeLimitChange[] {
  const large: LargeLimitChange[] = [];
  for (const { changes, ...rule } of diff.changed) {
    for (const change of changes) {
      if (!('limit' in change)) continue;
      const size = limitChangeSize(change.from, change.to);
      if (size?.large) large.push({ rule, change, size });
    }
  }
  return large;
}
