import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import { ObservationFindings } from './observation-findings';

const render = (findings: Parameters<typeof ObservationFindings>[0]['findings']) =>
  renderToStaticMarkup(
    <MantineProvider>
      <ObservationFindings findings={findings} />
    </MantineProvider>,
  );

describe('ObservationFindings', () => {
  it('says urgent and review findings apart, each with its word, message and action', () => {
    const html = render([
      { severity: 'urgent', code: 'spo2.low', message: 'SpO2 91 %, at or below 91 %', action: 'Stay with the patient' },
      { severity: 'review', code: 'respiratory-rate.review', message: 'Respiratory rate 10/min', action: 'Check again within 15 minutes' },
    ]);
    expect(html).toContain('data-findings="urgent"');
    expect(html).toContain('Urgent: saving raises 1 urgent flag. Act now');
    expect(html).toContain('data-findings="review"');
    expect(html).toContain('Review: saving raises 1 review flag');
    expect(html.indexOf('SpO2 91 %')).toBeLessThan(html.indexOf('Respiratory rate 10/min'));
    expect(html).toContain('Check again within 15 minutes.');
  });

  it('shows nothing when saving raises nothing', () => {
    expect(render([])).not.toContain('data-findings');
  });
});
