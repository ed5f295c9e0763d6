import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { LibraryAffectedOrder } from '@lockstep/shared';
import { changeRows } from '../utils/diff-rows';
import { ApproveReview } from './approve-review';

// Invented demo limits. "Large" is a change by a factor of 2 or more, or to or from no limit
// (shared LARGE_CHANGE_FACTOR: this product's review threshold, not a published value).
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
          { field: 'fourHourLimit', limit: 'hardMax', from: 40, to: null },
        ],
      },
    ],
  },
  [{ drugId: 1, drugName: 'morphine', concentrationPerMl: 1, doseUnit: 'mg', perKg: false, limits: {} }],
);

const running: LibraryAffectedOrder = {
  orderId: 7,
  status: 'active',
  patientId: 3,
  patientName: 'RIVERA, Ana',
  bed: 'C03',
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  findings: [
    { field: 'demandDose', severity: 'hard', code: 'limit.hard-max', message: 'Demand dose 1 mg is above the hard maximum of 0.5 mg' },
  ],
};

const render = (affected: Parameters<typeof ApproveReview>[0]['affected']) =>
  renderToStaticMarkup(
    <MantineProvider>
      <ApproveReview rows={rows} addedRules={0} removedRules={1} affected={affected} />
    </MantineProvider>,
  );

describe('ApproveReview', () => {
  it('lists the large changes first, each marked with an icon and words and its factor', () => {
    const html = render({ checked: 4, orders: [] });
    expect(html).toContain('Large changes (2)');
    expect(html).toContain('Large change ×10');
    expect(html).toContain('Large change 40 mg → no limit');
    const order = ['1-hour limit, hard max', '4-hour limit, hard max', 'Other changes (1)', 'Demand dose, soft max'].map((text) =>
      html.indexOf(text),
    );
    expect(order.every((position) => position >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    // Every large change carries an icon beside its words, not colour alone.
    expect(html.match(/data-large-change/g)?.length).toBe(2);
    expect(html).toContain('None: the 4 verified or running orders are within the new limits.');
  });

  it('lists the running orders the new limits would put outside, with their findings as icon and word', () => {
    const html = render({ checked: 4, orders: [running] });
    expect(html).toContain('1 of 4 open orders');
    expect(html).toContain('Bed C03, RIVERA, Ana: morphine 1 mg/mL (order 7, running)');
    expect(html).toContain('Hard limit:');
    expect(html).toContain('Demand dose 1 mg is above the hard maximum of 0.5 mg');
  });

  it('says when the running orders could not be checked', () => {
    expect(render(undefined)).toContain('Running orders could not be checked');
  });
});
