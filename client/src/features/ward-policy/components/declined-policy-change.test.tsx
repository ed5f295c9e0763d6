import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { WardPolicyChange } from '@lockstep/shared';
import { DeclinedPolicyChange } from './declined-policy-change';

const declined: WardPolicyChange = {
  id: 4,
  wardId: 1,
  wardName: 'Harbour',
  status: 'declined',
  settings: [{ field: 'spo2Threshold', from: 92, to: 94 }],
  reason: 'Fewer missed desaturations on the night shift',
  proposedBy: { id: 9, name: 'Sam Rivera' },
  proposedAt: '2026-12-03T09:00:00.000Z',
  decidedBy: { id: 3, name: 'Mei Tan' },
  decidedAt: '2026-12-03T10:00:00.000Z',
  declineReason: 'Too many alarms for our surgical patients: discuss at the ward meeting first',
};

describe('DeclinedPolicyChange', () => {
  it('tells the admin who declined the last proposal, why, and what it proposed', () => {
    const html = renderToStaticMarkup(
      <MantineProvider>
        <DeclinedPolicyChange change={declined} />
      </MantineProvider>,
    );
    expect(html).toContain('Last proposal declined');
    expect(html).toContain('declined by Mei Tan');
    expect(html).toContain('Too many alarms for our surgical patients');
    expect(html).toContain('92 %');
    expect(html).toContain('94 %');
  });
});
