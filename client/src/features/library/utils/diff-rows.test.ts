import { describe, expect, it } from 'vitest';
import type { LibraryDiff, NamedRule } from '@lockstep/shared';
import { changeRows, largeChangesFirst } from './diff-rows';

const morphine: NamedRule = { drugId: 1, drugName: 'morphine', concentrationPerMl: 1, doseUnit: 'mg', perKg: false, limits: {} };

describe('changeRows', () => {
  it('writes each changed limit as old → new in safe form, with its direction', () => {
    const diff: Pick<LibraryDiff, 'changed'> = {
      changed: [
        {
          drugName: 'morphine',
          concentrationPerMl: 1,
          doseUnit: 'mg',
          changes: [
            { field: 'demandDose', limit: 'softMax', from: 2, to: 1.8 },
            { field: 'fourHourLimit', limit: 'hardMax', from: 40, to: 45 },
            { field: 'loadingDose', limit: 'hardMin', from: null, to: 0.5 },
            { field: 'lockoutMinutes', limit: 'softMin', from: 6, to: null },
          ],
        },
      ],
    };
    expect(changeRows(diff, [morphine])).toEqual([
      {
        key: 'morphine 1 mg/mL-0',
        rule: 'morphine 1 mg/mL',
        what: 'Demand dose, soft max',
        from: '2 mg',
        to: '1.8 mg',
        direction: 'lowered',
        large: null,
      },
      {
        key: 'morphine 1 mg/mL-1',
        rule: 'morphine 1 mg/mL',
        what: '4-hour limit, hard max',
        from: '40 mg',
        to: '45 mg',
        direction: 'raised',
        large: null,
      },
      {
        key: 'morphine 1 mg/mL-2',
        rule: 'morphine 1 mg/mL',
        what: 'Loading dose, hard min',
        from: 'Not set',
        to: '0.5 mg',
        direction: 'set',
        large: 'no limit → 0.5 mg',
      },
      {
        key: 'morphine 1 mg/mL-3',
        rule: 'morphine 1 mg/mL',
        what: 'Lockout, soft min',
        from: '6 min',
        to: 'Not set',
        direction: 'cleared',
        large: '6 min → no limit',
      },
    ]);
  });

  it('uses the new rule for per kg, and the old setting for old values when per kg changed', () => {
    const hydromorphone = { drugName: 'hydromorphone', concentrationPerMl: 0.2, doseUnit: 'mg' };
    const perKgRule: NamedRule = { ...morphine, drugId: 2, ...hydromorphone, doseUnit: 'mg', perKg: true };
    expect(
      changeRows({ changed: [{ ...hydromorphone, changes: [{ field: 'demandDose', limit: 'softMax', from: 0.004, to: 0.003 }] }] }, [
        perKgRule,
      ])[0],
    ).toMatchObject({
      rule: 'HYDROmorphone 0.2 mg/mL',
      from: '0.004 mg/kg',
      to: '0.003 mg/kg',
    });
    const switched = changeRows(
      {
        changed: [
          {
            ...hydromorphone,
            changes: [
              { field: 'perKg', from: false, to: true },
              { field: 'demandDose', limit: 'softMax', from: 0.4, to: 0.004 },
            ],
          },
        ],
      },
      [],
    );
    expect(switched.map(({ what, from, to, direction }) => ({ what, from, to, direction }))).toEqual([
      { what: 'Weight-based (per kg)', from: 'Not per kg', to: 'Per kg', direction: 'switched' },
      { what: 'Demand dose, soft max', from: '0.4 mg', to: '0.004 mg/kg', direction: 'lowered' },
    ]);
  });

  // A factor of 2 or more is "large" (shared LARGE_CHANGE_FACTOR, a review threshold of this
  // product, not a published value); the limits are invented.
  it('marks a limit changed tenfold as a large change with its factor, and lists large changes first', () => {
    const rows = changeRows(
      {
        changed: [
          {
            drugName: 'morphine',
            concentrationPerMl: 1,
            doseUnit: 'mg',
            changes: [
              { field: 'demandDose', limit: 'softMax', from: 2, to: 1.8 },
              { field: 'oneHourLimit', limit: 'hardMax', from: 15, to: 150 },
              { field: 'fourHourLimit', limit: 'hardMax', from: 40, to: 20 },
            ],
          },
        ],
      },
      [morphine],
    );
    expect(rows.map((row) => row.large)).toEqual([null, '×10', '÷2']);
    expect(largeChangesFirst(rows).map((row) => row.what)).toEqual([
      '1-hour limit, hard max',
      '4-hour limit, hard max',
      'Demand dose, soft max',
    ]);
  });
});
