import { describe, expect, it } from 'vitest';
import { isUnusualVolume, localDateTimeToIso, readReleaseForm, releaseFormValues } from './release-form';

const now = new Date(2026, 2, 5, 9, 0);
const filled = {
  ...releaseFormValues({ concentrationPerMl: 1 }),
  batch: 'B2403-17',
  expiresAt: '2026-03-12T18:00',
  preparedBy: 'Lin Park',
  checkedBy: 'Tomas Ortiz',
};

describe('syringe release form', () => {
  it('starts from the order’s concentration and a 50 mL syringe', () => {
    expect(releaseFormValues({ concentrationPerMl: 0.2 })).toMatchObject({ concentrationPerMl: '0.2', volumeMl: '50' });
  });

  it('treats 20–60 mL as usual, limits included', () => {
    expect(isUnusualVolume(20)).toBe(false);
    expect(isUnusualVolume(60)).toBe(false);
    expect(isUnusualVolume(19.5)).toBe(true);
    expect(isUnusualVolume(100)).toBe(true);
    expect(isUnusualVolume(null)).toBe(false);
  });

  it('sends the expiry as an instant and no reason for a usual volume', () => {
    const { request, errors } = readReleaseForm({ ...filled, overrideReason: 'left over from before' }, now);
    expect(errors).toEqual({});
    expect(request).toEqual({
      concentrationPerMl: 1,
      volumeMl: 50,
      batch: 'B2403-17',
      expiresAt: new Date(2026, 2, 12, 18, 0).toISOString(),
      preparedBy: 'Lin Park',
      checkedBy: 'Tomas Ortiz',
    });
  });

  it('asks for a reason outside 20–60 mL, and for an expiry in the future', () => {
    expect(readReleaseForm({ ...filled, volumeMl: '10' }, now).errors).toEqual({
      overrideReason: 'Outside the usual 20–60 mL: give a reason',
    });
    const withReason = readReleaseForm({ ...filled, volumeMl: '10', overrideReason: 'Short course before theatre' }, now);
    expect(withReason.request?.overrideReason).toBe('Short course before theatre');
    expect(readReleaseForm({ ...filled, expiresAt: '2026-03-01T08:00' }, now).errors).toEqual({
      expiresAt: 'The expiry must be later than now',
    });
  });

  it('asks for the reason for a second syringe while the order has one ready or running, naming it', () => {
    const open = [
      { releaseCode: 'ACD-EFG', status: 'in_use' as const },
      { releaseCode: 'HJK-MNP', status: 'finished' as const },
    ];
    expect(readReleaseForm(filled, now, open)).toEqual({
      request: null,
      errors: { secondSyringeReason: 'This order already has syringe ACD-EFG (in use): give a reason to release a second' },
    });
    expect(readReleaseForm({ ...filled, secondSyringeReason: 'spare' }, now, open).errors).toEqual({
      secondSyringeReason: 'Give a reason of at least 10 characters',
    });
    const given = readReleaseForm({ ...filled, secondSyringeReason: ' Running syringe nearly empty ' }, now, open);
    expect(given.request?.secondSyringeReason).toBe('Running syringe nearly empty');
    // Finished syringes only: no reason asked, none sent.
    const after = readReleaseForm({ ...filled, secondSyringeReason: 'left over from before' }, now, [open[1]]);
    expect(after.errors).toEqual({});
    expect(after.request).not.toHaveProperty('secondSyringeReason');
  });

  it('shows the server’s refusal beside the reason when it knew of a syringe this screen did not', () => {
    const refusal = 'This order already has syringe ACD-EFG (ready): give a reason to release a second';
    expect(readReleaseForm(filled, now, [], refusal).errors).toEqual({ secondSyringeReason: refusal });
    expect(readReleaseForm({ ...filled, secondSyringeReason: 'Spare for theatre' }, now, [], refusal).request?.secondSyringeReason).toBe(
      'Spare for theatre',
    );
  });

  it('names every missing field', () => {
    const { request, errors } = readReleaseForm({ ...releaseFormValues({ concentrationPerMl: 1 }), volumeMl: 'fifty' }, now);
    expect(request).toBeNull();
    expect(errors).toEqual({
      volumeMl: 'Enter a number more than 0',
      batch: 'Enter the batch',
      expiresAt: 'Enter the expiry as a date and time',
      preparedBy: 'Enter who prepared the syringe',
      checkedBy: 'Enter who checked the syringe',
    });
    expect(localDateTimeToIso('5/3/2026')).toBe('');
  });
});
