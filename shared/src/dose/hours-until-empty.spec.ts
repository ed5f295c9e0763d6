import { describe, expect, it } from 'vitest';
import { hoursUntilEmpty } from './hours-until-empty.js';

// remaining ÷ total flow is the definition; the volumes are the usual 20 to 60 mL PCA syringes
// and a 10-minute lockout [practice].
describe('hoursUntilEmpty', () => {
  it('divides the remaining volume by basal plus recent demand use', () => {
    expect(hoursUntilEmpty(30, 1, 2)).toBe(10);
    expect(hoursUntilEmpty(60, 0, 6)).toBe(10); // 1 mL every 10 minutes
    expect(hoursUntilEmpty(20, 0.5, 0)).toBe(40);
    expect(hoursUntilEmpty(0.3, 0.1, 0)).toBe(3); // without float noise
  });

  it('is Infinity when nothing flows and 0 when nothing remains', () => {
    expect(hoursUntilEmpty(30, 0, 0)).toBe(Infinity);
    expect(hoursUntilEmpty(0, 1, 1)).toBe(0);
    expect(hoursUntilEmpty(-1, 1, 1)).toBe(0);
    expect(hoursUntilEmpty(0, 0, 0)).toBe(0);
  });

  it('is NaN for a broken reading rather than a reassuring number', () => {
    expect(hoursUntilEmpty(Number.NaN, 1, 1)).toBeNaN();
    expect(hoursUntilEmpty(30, -1, 0)).toBeNaN();
    expect(hoursUntilEmpty(30, 1, Infinity)).toBeNaN();
  });
});
