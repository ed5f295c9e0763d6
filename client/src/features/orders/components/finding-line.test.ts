import { describe, expect, it } from 'vitest';
import type { Finding } from '@lockstep/shared';
import { findingLook } from './finding-line';

const finding = (severity: Finding['severity'], code: string): Finding => ({ field: 'demandDose', severity, code, message: '' });

describe('findingLook', () => {
  it('calls limit findings hard or soft limits', () => {
    expect(findingLook(finding('hard', 'limit.hard-high'))).toMatchObject({ word: 'Hard limit', effect: 'blocks signing' });
    expect(findingLook(finding('soft', 'possible.one-hour.soft-high'))).toMatchObject({ word: 'Soft limit', effect: 'needs a reason' });
  });

  it('does not call an allergy, a second PCA or a risk a limit', () => {
    expect(findingLook(finding('hard', 'allergy.anaphylaxis'))).toMatchObject({ word: 'Blocked', effect: 'cannot be signed' });
    expect(findingLook(finding('hard', 'duplicate.open-pca'))).toMatchObject({ word: 'Blocked' });
    expect(findingLook(finding('soft', 'allergy.intolerance'))).toMatchObject({ word: 'Check', effect: 'needs a reason' });
    expect(findingLook(finding('error', 'lockout.too-short'))).toMatchObject({ word: 'Error' });
    expect(findingLook(finding('caution', 'weight.old'))).toMatchObject({ word: 'Caution' });
  });
});
