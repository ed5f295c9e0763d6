import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import { DEFAULT_EQUIANALGESIC_FACTORS, NCI_PDQ_EQUIANALGESIC_SOURCE, type EquianalgesicFactor } from '@lockstep/shared';
import { FactorsTable } from './factors-table';

const IDS: Record<string, number> = { morphine: 1, hydromorphone: 2, fentanyl: 3 };
// The shipped table: NCI PDQ Cancer Pain (health professional version), equianalgesic table,
// National Cancer Institute, 2008 and 2014. Hydromorphone changed by a pharmacist to 1.5 mg after
// American Family Physician 2000;61(3):755.
const AFP_2000 = 'American Family Physician 2000;61(3):755, equianalgesic table';
const TABLE: EquianalgesicFactor[] = DEFAULT_EQUIANALGESIC_FACTORS.map((factor) => ({
  ...factor,
  drugId: IDS[factor.genericName],
  changedByName: null,
  changedAt: '2026-11-03T10:00:00.000Z',
})).map((factor) =>
  factor.genericName === 'hydromorphone' ? { ...factor, amount: 1.5, source: AFP_2000, changedByName: 'Lin Park' } : factor,
);

// A formulary drug pharmacy has set no factor for (invented for the test).
const SUFENTANIL = { id: 7, genericName: 'sufentanil', doseUnit: 'mcg' as const };

const render = (canEdit: boolean) =>
  renderToStaticMarkup(
    <MantineProvider>
      <FactorsTable factors={TABLE} missing={[SUFENTANIL]} canEdit={canEdit} onEdit={() => undefined} />
    </MantineProvider>,
  );
/** The text of one row, tags dropped. */
const rowText = (html: string, testId: string) => {
  const start = html.indexOf(`data-testid="${testId}"`);
  const end = html.indexOf('</tr>', start);
  return html
    .slice(start, end)
    .replace(/<[^>]+>/g, ' ')
    .replace(/\s+/g, ' ');
};

describe('FactorsTable (the pharmacy screen’s table)', () => {
  it('lists each factor with its source, and who changed it when', () => {
    const html = render(true);
    const hydromorphone = rowText(html, 'factor-hydromorphone-parenteral');
    expect(hydromorphone).toContain('HYDROmorphone');
    expect(hydromorphone).toContain('1.5 mg');
    // 1 mg ÷ 1.5 mg × 30 mg: the shared conversion, the same the usage page's figure uses.
    expect(hydromorphone).toContain('1 mg ≈ 20 mg oral morphine');
    expect(hydromorphone).toContain(AFP_2000);
    expect(hydromorphone).toContain('Lin Park');
    expect(hydromorphone).toContain('Change');

    const fentanyl = rowText(html, 'factor-fentanyl-parenteral');
    expect(fentanyl).toContain('fentaNYL');
    expect(fentanyl).toContain('100 mcg');
    expect(fentanyl).toContain(NCI_PDQ_EQUIANALGESIC_SOURCE);
    expect(fentanyl).toContain('Shipped default');

    const oral = rowText(html, 'factor-morphine-oral');
    expect(oral).toContain('30 mg');
    expect(oral).toContain('Oral');
  });

  it('offers no change to the reference, parenteral morphine 10 mg', () => {
    const reference = rowText(render(true), 'factor-morphine-parenteral');
    expect(reference).toContain('Reference');
    expect(reference).not.toContain('Change');
  });

  it('lists a drug with no factor, says why it has no figure, and lets a pharmacist set one', () => {
    const missing = rowText(render(true), 'factor-sufentanil-missing');
    expect(missing).toContain('SUFentanil');
    expect(missing).toContain('No conversion factor set by pharmacy');
    expect(missing).toContain('Set');
    expect(rowText(render(false), 'factor-sufentanil-missing')).not.toContain('Set');
  });

  it('is read-only for everyone but a pharmacist', () => {
    const html = render(false);
    expect(html).not.toContain('Change HYDROmorphone');
    expect(rowText(html, 'factor-hydromorphone-parenteral')).toContain(AFP_2000);
  });
});
