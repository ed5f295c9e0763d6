import { describe, expect, it } from 'vitest';
import { doseToVolumeMl } from './dose-to-volume.js';

describe('doseToVolumeMl', () => {
  it('gives the volume of the common starting demand doses at the standard concentrations', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg, hydromorphone 0.2 mg,
    // fentanyl 10 mcg demand; standard concentrations [practice; ASHP Standardize 4 Safety]
    // morphine 1 mg/mL, hydromorphone 0.2 mg/mL, fentanyl 10 mcg/mL.
    expect(doseToVolumeMl(1, 1)).toBe(1);
    expect(doseToVolumeMl(0.2, 0.2)).toBe(1);
    expect(doseToVolumeMl(10, 10)).toBe(1);
  });

  it('divides dose by concentration without float noise (definition)', () => {
    expect(doseToVolumeMl(0.3, 0.1)).toBe(3); // raw division gives 2.9999999999999996
    expect(doseToVolumeMl(2.5, 1)).toBe(2.5);
    expect(doseToVolumeMl(0, 1)).toBe(0);
    // Typical ranges, common practice (docs/clinical-sources.md, "Typical ranges"; no single published table): a 4-hour limit of 30 mg
    // morphine at 1 mg/mL is 30 mL, within the usual 20 to 60 mL syringe [practice].
    expect(doseToVolumeMl(30, 1)).toBe(30);
  });

  it('refuses doses and concentrations that cannot be right', () => {
    expect(doseToVolumeMl(1, 0)).toBeNaN();
    expect(doseToVolumeMl(1, -1)).toBeNaN();
    expect(doseToVolumeMl(-1, 1)).toBeNaN();
    expect(doseToVolumeMl(Number.NaN, 1)).toBeNaN();
    expect(doseToVolumeMl(1, Infinity)).toBeNaN();
  });
});
