import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { HandoverRow } from '@lockstep/shared';
import { PcaCell } from './board-cells';

const NOW = new Date('2026-12-02T07:00:00.000Z');

const row = (paused: boolean) =>
  ({
    status: 'active',
    drugName: 'morphine',
    doseUnit: 'mg',
    concentrationPerMl: 1,
    regimen: { demandDose: 1, lockoutMinutes: 5, basalRatePerHour: 0, oneHourLimit: null, fourHourLimit: 30 },
    startedAt: '2026-12-02T05:00:00.000Z',
    minutesSinceStart: 120,
    paused,
  }) as HandoverRow;

const render = (paused: boolean) =>
  renderToStaticMarkup(
    <MantineProvider>
      <PcaCell row={row(paused)} now={NOW} />
    </MantineProvider>,
  );

describe('PcaCell', () => {
  it('says Paused, as icon and word, on a paused PCA, and no longer that it is running', () => {
    const html = render(true);
    expect(html).toContain('Paused');
    expect(html).toContain('<svg');
    expect(html).toContain('Started 2 h ago');
    expect(html).not.toContain('Running');
  });

  it('says nothing of a pause on a running PCA', () => {
    const html = render(false);
    expect(html).not.toContain('Paused');
    expect(html).toContain('Running 2 h');
  });
});
