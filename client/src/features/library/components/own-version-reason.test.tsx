import { describe, expect, it } from 'vitest';
import type { LibraryVersionDetail } from '@lockstep/shared';
import { ownVersionReason } from './version-actions';

const version = {
  authorId: 5,
  contributors: [
    { userId: 5, userName: 'Lin Park', action: 'imported', at: '2030-01-01T09:00:00.000Z' },
    { userId: 6, userName: 'Tomas Ortiz', action: 'edited', at: '2030-01-01T10:00:00.000Z' },
    { userId: 5, userName: 'Lin Park', action: 'submitted', at: '2030-01-01T11:00:00.000Z' },
  ],
} as LibraryVersionDetail;

describe('ownVersionReason', () => {
  it('names what the signed-in pharmacist did to the version, so they may not approve or send it back', () => {
    expect(ownVersionReason(version, 5)).toBe(
      'You imported and submitted this version; a pharmacist who did not approves it or sends it back',
    );
    expect(ownVersionReason(version, 6)).toBe('You edited this version; a pharmacist who did not approves it or sends it back');
    expect(ownVersionReason(version, 7)).toBeNull();
  });

  it('still names the author of a version recorded before contributions were', () => {
    expect(ownVersionReason({ ...version, contributors: [] }, 5)).toBe(
      'You created this version; a pharmacist who did not approves it or sends it back',
    );
  });
});
