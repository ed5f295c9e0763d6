import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { FlagResponse, ObservationResponse } from '@lockstep/shared';
import { BolusSafetyPanel } from './bolus-safety-panel';

// Sedation: Pasero Opioid-induced Sedation Scale (Pasero C, 1994; Pasero & McCaffery, Pain Assessment
// and Pharmacologic Management, 2011): 2 acceptable, 3 not.
const observation = (sedationLevel: ObservationResponse['sedationLevel']) =>
  ({ at: '2026-12-02T09:00:00Z', sedationLevel, respiratoryRate: 14, spo2: 97 }) as ObservationResponse;
const flag = (code: string, acknowledgedAt: string | null = null) => ({ severity: 'urgent', code, acknowledgedAt }) as FlagResponse;

const render = (latest: ObservationResponse | null, flags: FlagResponse[] = []) =>
  renderToStaticMarkup(
    <MantineProvider>
      <BolusSafetyPanel observation={latest} flags={flags} />
    </MantineProvider>,
  );

describe('BolusSafetyPanel', () => {
  it('shows the last sedation and breathing and no caution at sedation 2', () => {
    const html = render(observation('2'));
    expect(html).toContain('sedation 2');
    expect(html).toContain('respiratory rate 14/min, SpO2 97 %');
    expect(html).not.toContain('Do not give a bolus now');
  });

  it('cautions at sedation 3 with the words the server refuses with (POSS, Pasero 1994; Pasero & McCaffery 2011)', () => {
    const html = render(observation('3'));
    expect(html).toContain('Do not give a bolus now');
    expect(html).toContain('Contact the prescriber');
  });

  it('cautions while an urgent breathing flag is open, not once it is acknowledged', () => {
    expect(render(observation('1'), [flag('respiratory-rate.low')])).toContain('respiratory-rate.low');
    expect(render(observation('1'), [flag('respiratory-rate.low', '2026-12-02T09:05:00Z')])).not.toContain('Do not give a bolus now');
  });

  it('says when there is no observation yet, and never says so when they could not be read', () => {
    expect(render(null)).toContain('No observation recorded yet');
    const html = renderToStaticMarkup(
      <MantineProvider>
        <BolusSafetyPanel observation={null} flags={[]} unreadable />
      </MantineProvider>,
    );
    expect(html).toContain('Last observation not available');
    expect(html).not.toContain('No observation recorded yet');
  });
});
