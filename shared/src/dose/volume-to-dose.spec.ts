import { describe, expect, it } from 'vitest';
import { doseToVolumeMl } from './dose-to-volume.js';
import { volumeToDose } from './volume-to-dose.js';

describe('volumeToDose', () => {
  it('multiplies volume by concentration (definition)', () => {
    // Standard concentration hydromorphone 0.2 mg/mL [practice; ASHP Standardize 4 Safety].
    expect(volumeToDose(6, 0.2)).toBe(1.2); // raw product is 1.2000000000000002
    expect(volumeToDose(0, 1)).toBe(0);
  });
  it('undoes doseToVolumeMl', () => {
    expect(volumeToDose(doseToVolumeMl(0.3, 0.1), 0.1)).toBe(0.3);
  });
  it('refuses inputs that cannot be right', () => {
    expect(volumeToDose(-1, 1)).toBeNaN();
    expect(volumeToDose(1, 0)).toBeNaN();
    expect(volumeToDose(Number.NaN, 1)).toBeNaN();
  });
});
