import { describe, expect, it } from 'vitest';
import { describeProjectedEmpty } from './usage-display';

const NOW = new Date('2026-03-03T14:00:00.000Z');
const UTC = 'UTC';

describe('describeProjectedEmpty', () => {
  it('gives the time and how long until then, with the date when it is far off', () => {
    expect(describeProjectedEmpty('2026-03-03T17:10:00.000Z', NOW, UTC)).toEqual({ value: 'About 17:10', detail: 'In 3 h 10 min' });
    expect(describeProjectedEmpty('2026-03-05T02:00:00.000Z', NOW, UTC)).toEqual({ value: 'About 5 Mar 2026, 02:00', detail: 'In 36 h' });
    expect(describeProjectedEmpty('2026-03-03T13:50:00.000Z', NOW, UTC)).toEqual({
      value: 'About 13:50',
      detail: 'Already passed: check the syringe',
    });
    expect(describeProjectedEmpty(null, NOW, UTC)).toEqual({
      value: 'Not projected yet',
      detail: 'Needs an observation of the running syringe',
    });
  });
});
