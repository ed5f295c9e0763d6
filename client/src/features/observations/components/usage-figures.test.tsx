import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { CROSS_TOLERANCE_CAUTION, NCI_PDQ_EQUIANALGESIC_SOURCE, NO_CONVERSION_FACTOR, type UsageResponse } from '@lockstep/shared';
import { UsageFigures } from './usage-figures';

// 0.4 mg hydromorphone in 24 hours. NCI PDQ Cancer Pain (health professional version),
// equianalgesic table, 2008 and 2014: parenteral hydromorphone 2 mg ≈ parenteral morphine 10 mg ≈
// oral morphine 30 mg, so 0.4 mg ≈ 6 mg oral morphine.
const USAGE: UsageResponse = {
  hours: 4,
  buckets: [],
  totals: { attempts: 3, delivered: 2, dose: 0.4, bolusDose: 0 },
  rolling24hDose: 0.4,
  averageDosePerHour: 0.1,
  oralMorphineEquivalent24hMg: 6,
  oralMorphineFactors: {
    parenteralAmount: 2,
    parenteralUnit: 'mg',
    parenteralSource: NCI_PDQ_EQUIANALGESIC_SOURCE,
    oralMorphineMg: 30,
    oralSource: NCI_PDQ_EQUIANALGESIC_SOURCE,
  },
  doseUnit: 'mg',
  projectedEmptyAt: null,
  nextObservation: null,
};

const text = (usage: UsageResponse) =>
  renderToStaticMarkup(
    <MantineProvider>
      <MemoryRouter>
        <UsageFigures usage={usage} now={new Date('2026-12-03T12:00:00Z')} />
      </MemoryRouter>
    </MantineProvider>,
  )
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;/g, "'")
    .replace(/\s+/g, ' ');

describe('UsageFigures: the oral-morphine figure', () => {
  it('shows the figure with the factors and sources it used, and the cross-tolerance caution', () => {
    const shown = text(USAGE);
    expect(shown).toContain('6 mg');
    expect(shown).toContain('Using 2 mg parenteral ≈ 10 mg parenteral morphine');
    expect(shown).toContain('10 mg parenteral morphine ≈ 30 mg oral morphine');
    expect(shown).toContain(NCI_PDQ_EQUIANALGESIC_SOURCE);
    expect(shown).toContain(CROSS_TOLERANCE_CAUTION);
  });

  it('says why there is no figure when pharmacy has set no factor, never 0', () => {
    const shown = text({ ...USAGE, oralMorphineEquivalent24hMg: null, oralMorphineFactors: null });
    expect(shown).toContain(NO_CONVERSION_FACTOR);
    expect(shown).not.toContain('Using ');
    expect(shown).toContain(CROSS_TOLERANCE_CAUTION);
  });
});
