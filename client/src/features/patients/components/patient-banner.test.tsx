import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { Patient } from '@lockstep/shared';
import { PatientBanner } from './patient-banner';

const patient: Patient = {
  id: 11,
  mrn: 'KB103102',
  givenName: 'Wei',
  familyName: 'Ng',
  dateOfBirth: '1949-10-09',
  sex: 'male',
  weightKg: 70,
  weightMeasuredOn: '2026-12-02',
  allergies: [
    {
      id: 3,
      drugId: 1,
      substance: 'morphine',
      reaction: 'itch',
      severity: 'intolerance',
      recordedByName: 'Dr Amara Osei',
      recordedAt: null,
    },
    {
      id: 4,
      drugId: null,
      substance: 'Latex',
      reaction: 'throat swelling',
      severity: 'anaphylaxis',
      recordedByName: null,
      recordedAt: null,
    },
  ],
  noKnownAllergies: false,
  opioidTolerant: true,
  toleranceOralMorphineMgPerDay: 90,
  toleranceDays: 30,
  spo2Scale: '1',
  sleepApnoea: false,
  otherSedatives: false,
  wardId: 4,
  wardName: 'Summit',
  bed: 'S01',
};
const render = (p: Patient) =>
  renderToStaticMarkup(
    <MantineProvider>
      <PatientBanner patient={p} />
    </MantineProvider>,
  );

describe('PatientBanner', () => {
  it('shows every allergy entry with its severity as a word, anaphylaxis first', () => {
    const html = render(patient);
    expect(html.indexOf('Anaphylaxis')).toBeLessThan(html.indexOf('Intolerance'));
    expect(html).toContain('throat swelling');
    expect(html).toContain('itch');
  });

  // US FDA definition of opioid tolerance: at least 60 mg oral morphine a day for a week or longer.
  it('shows the tolerance with its basis, and a claim without one as checked naive', () => {
    expect(render(patient)).toContain('Opioid tolerant: 90 mg oral morphine a day for 30 days');
    expect(render({ ...patient, toleranceOralMorphineMgPerDay: null, toleranceDays: null })).toContain('checked as opioid-naive');
  });

  it('shows when the weight was measured, and an empty allergy record as not recorded', () => {
    const html = render({ ...patient, allergies: [], noKnownAllergies: false });
    expect(html).toContain('70 kg');
    expect(html).toMatch(/measured .*2026/);
    expect(html).toContain('Allergies not recorded');
    expect(render({ ...patient, weightMeasuredOn: null })).toContain('date measured not recorded');
  });
});
