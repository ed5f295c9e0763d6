import { describe, expect, it } from 'vitest';
import { openReleases, pendingCheckRefusal, secondReleaseRefusal } from './release-guards.js';

describe('secondReleaseRefusal', () => {
  it('lets the first syringe of an order be released', () => {
    expect(secondReleaseRefusal([], undefined)).toBeNull();
  });

  it('lets a syringe be released when the others are finished', () => {
    expect(secondReleaseRefusal([{ releaseCode: 'AB12CD', status: 'finished' }], null)).toBeNull();
  });

  it('refuses a second syringe while one is ready, naming it', () => {
    expect(secondReleaseRefusal([{ releaseCode: 'AB12CD', status: 'ready' }], undefined)).toBe(
      'This order already has syringe AB12CD (ready): give a reason to release a second',
    );
  });

  it('refuses a second syringe while one is running, and treats a blank reason as none', () => {
    expect(secondReleaseRefusal([{ releaseCode: 'EF34GH', status: 'in_use' }], '   ')).toContain('EF34GH (in use)');
  });

  it('allows a second syringe with a reason', () => {
    expect(secondReleaseRefusal([{ releaseCode: 'AB12CD', status: 'in_use' }], 'Running syringe nearly empty')).toBeNull();
  });

  it('lists only the ready and running syringes', () => {
    const releases = [
      { releaseCode: 'A', status: 'finished' as const },
      { releaseCode: 'B', status: 'ready' as const },
      { releaseCode: 'C', status: 'in_use' as const },
    ];
    expect(openReleases(releases).map((release) => release.releaseCode)).toEqual(['B', 'C']);
  });
});

describe('pendingCheckRefusal', () => {
  it('lets a first check start when none is pending for this syringe', () => {
    expect(
      pendingCheckRefusal(
        [
          { id: 1, releaseId: 7, status: 'matched' },
          { id: 2, releaseId: 7, status: 'mismatch' },
          { id: 3, releaseId: 8, status: 'awaiting_second' },
        ],
        7,
      ),
    ).toBeNull();
  });

  it('refuses a second first check of the same syringe, naming the pending one', () => {
    expect(pendingCheckRefusal([{ id: 4, releaseId: 7, status: 'awaiting_second' }], 7)).toBe(
      'A check of this syringe is already under way (check 4, waiting for the second nurse): finish it before starting another',
    );
  });
});
