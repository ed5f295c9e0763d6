import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { PatientAllergyEntry } from '@lockstep/shared';
import { AllergyList } from './allergy-list';

const entry = (overrides: Partial<PatientAllergyEntry>): PatientAllergyEntry => ({
  id: 1,
  drugId: null,
  substance: 'Penicillin',
  reaction: 'rash',
  severity: 'allergy',
  recordedByName: 'Dr Amara Osei',
  recordedAt: '2026-12-01T09:00:00.000Z',
  ...overrides,
});
const render = (patient: { allergies: PatientAllergyEntry[]; noKnownAllergies: boolean }) =>
  renderToStaticMarkup(
    <MantineProvider>
      <AllergyList patient={patient} />
    </MantineProvider>,
  );

describe('AllergyList', () => {
  it('says who recorded each entry and when, where asked, and which came from the old free text', () => {
    const html = renderToStaticMarkup(
      <MantineProvider>
        <AllergyList
          patient={{
            allergies: [entry({}), entry({ id: 2, substance: 'Latex', recordedByName: null, recordedAt: null })],
            noKnownAllergies: false,
          }}
          withRecorder
        />
      </MantineProvider>,
    );
    expect(html).toContain('recorded by Dr Amara Osei');
    expect(html).toContain('moved from the earlier free-text record');
  });

  it('says "No known allergies" only when recorded so, and "Allergies not recorded" for an empty record', () => {
    expect(render({ allergies: [], noKnownAllergies: true })).toContain('No known allergies');
    const unknown = render({ allergies: [], noKnownAllergies: false });
    expect(unknown).toContain('Allergies not recorded');
    expect(unknown).not.toContain('No known allergies');
    expect(unknown).toContain('<svg');
  });

  it('lists entries most severe first with the severity as a word and an icon, and the reaction', () => {
    const html = render({
      allergies: [entry({ id: 1 }), entry({ id: 2, substance: 'Latex', reaction: 'throat swelling', severity: 'anaphylaxis' })],
      noKnownAllergies: false,
    });
    expect(html.indexOf('Anaphylaxis')).toBeLessThan(html.indexOf('Allergy'));
    expect(html).toContain('throat swelling');
    expect(html).toContain('rash');
    expect(html.match(/<svg/g)?.length).toBe(2);
    expect(html).toContain('data-severity="anaphylaxis"');
  });
});
