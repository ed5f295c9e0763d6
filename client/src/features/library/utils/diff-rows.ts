import {
  changeFactorLabel,
  limitChangeSize,
  REGIMEN_FIELD_LABELS,
  type ChangedRule,
  type LibraryDiff,
  type RuleChange,
} from '@lockstep/shared';
import { DIFF_LIMIT_LABELS, formatLimit, isDoseUnit, ruleTitle, type RuleView } from './rule-rows';

/** How a value moved; shown as icon and word. */
export type ChangeDirection = 'raised' | 'lowered' | 'set' | 'cleared' | 'switched';

export interface ChangeRow {
  key: string;
  /** "morphine 1 mg/mL" */
  rule: string;
  /** "Demand dose, soft max" */
  what: string;
  from: string;
  to: string;
  direction: ChangeDirection;
  /**
   * A limit changed by a factor of 2 or more, or to or from no limit or 0 (shared
   * `limitChangeSize`): what to show beside "Large change", e.g. "×10" or "no limit → 15 mg".
   */
  large: string | null;
}

const NOT_SET = 'Not set';

function sameRule(rule: RuleView, changed: ChangedRule): boolean {
  return (
    rule.drugName.toLowerCase() === changed.drugName.toLowerCase() && Math.abs(rule.concentrationPerMl - changed.concentrationPerMl) < 1e-9
  );
}

function direction(from: number | null, to: number | null): ChangeDirection {
  if (from === null) return 'set';
  if (to === null) return 'cleared';
  return to > from ? 'raised' : 'lowered';
}

/**
 * Every changed limit of a diff as a row "rule · parameter, limit · old → new", each value in
 * safe form with its unit. `rules` are the new version's rules, for whether a rule is per kg.
 */
export function changeRows(diff: Pick<LibraryDiff, 'changed'>, rules: readonly RuleView[]): ChangeRow[] {
  const rows: ChangeRow[] = [];
  for (const changed of diff.changed) {
    const title = ruleTitle(changed);
    const perKgChange = changed.changes.find((change): change is Extract<RuleChange, { field: 'perKg' }> => change.field === 'perKg');
    const newPerKg = perKgChange?.to ?? rules.find((rule) => sameRule(rule, changed))?.perKg ?? false;
    const oldPerKg = perKgChange?.from ?? newPerKg;
    const unitChange = changed.changes.find((change): change is Extract<RuleChange, { field: 'doseUnit' }> => change.field === 'doseUnit');
    const newUnit = isDoseUnit(changed.doseUnit) ? changed.doseUnit : 'mg';
    const oldUnit = unitChange && isDoseUnit(unitChange.from) ? unitChange.from : newUnit;

    changed.changes.forEach((change, index) => {
      const key = `${title}-${index}`;
      if (change.field === 'perKg') {
        const word = (perKg: boolean) => (perKg ? 'Per kg' : 'Not per kg');
        const [from, to] = [word(change.from), word(change.to)];
        rows.push({ key, rule: title, what: 'Weight-based (per kg)', from, to, direction: 'switched', large: null });
      } else if (change.field === 'doseUnit') {
        rows.push({ key, rule: title, what: 'Dose unit', from: change.from, to: change.to, direction: 'switched', large: null });
      } else {
        // A ceiling is in the dose unit itself, whatever the weight.
        const ceiling = change.limit === 'ceiling';
        const from = formatLimit(change.from, change.field, oldUnit, oldPerKg && !ceiling) ?? NOT_SET;
        const to = formatLimit(change.to, change.field, newUnit, newPerKg && !ceiling) ?? NOT_SET;
        const size = limitChangeSize(change.from, change.to);
        const noLimit = (value: number | null, shown: string) => (value === null ? 'no limit' : shown);
        rows.push({
          key,
          rule: title,
          what: `${REGIMEN_FIELD_LABELS[change.field]}, ${DIFF_LIMIT_LABELS[change.limit].toLowerCase()}`,
          from,
          to,
          direction: direction(change.from, change.to),
          large: size?.large ? (changeFactorLabel(size) ?? `${noLimit(change.from, from)} → ${noLimit(change.to, to)}`) : null,
        });
      }
    });
  }
  return rows;
}

/** The large changes first (each group in the diff's order), for the approver to see before the rest. */
export function largeChangesFirst(rows: readonly ChangeRow[]): ChangeRow[] {
  return [...rows.filter((row) => row.large !== null), ...rows.filter((row) => row.large === null)];
}
