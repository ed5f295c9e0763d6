import { describe, expect, it } from 'vitest';
import { IMPLAUSIBLE_WEIGHT_Z, lmsValueAt, lmsZScore, weightForAgeLms, weightPlausibility } from './growth-reference.js';

// Values from the CDC 2000 growth charts' data file wtage.csv (National Center for Health
// Statistics, CDC; Kuczmarski RJ et al., Vital Health Stat 11(246), 2002): columns Agemos, L, M,
// S and the smoothed percentiles P3, P50, P97 in kg.
const P3_Z = -1.880794; // the standard normal quantile of 0.03
const P97_Z = 1.880794;

describe('weightForAgeLms', () => {
  it('gives the published median (P50) at the table ages', () => {
    // wtage.csv Sex=1 Agemos=84.5: M = P50 = 23.16741888 kg; Sex=2 Agemos=84.5: 22.86804258 kg.
    expect(weightForAgeLms('male', 84.5)?.m).toBeCloseTo(23.16741888, 6);
    expect(weightForAgeLms('female', 84.5)?.m).toBeCloseTo(22.86804258, 6);
    // Sex=1 Agemos=24: 12.6707633 kg; Sex=2 Agemos=240: 58.21897289 kg.
    expect(weightForAgeLms('male', 24)?.m).toBeCloseTo(12.6707633, 6);
    expect(weightForAgeLms('female', 240)?.m).toBeCloseTo(58.21897289, 6);
  });

  it('interpolates between yearly rows close to the half-monthly rows it leaves out', () => {
    // wtage.csv Sex=1 Agemos=90.5: M = 24.42648043 kg (not embedded; between 84.5 and 96.5).
    expect(weightForAgeLms('male', 90.5)?.m).toBeCloseTo(24.42648043, 1);
    // Sex=2 Agemos=150.5: M = 43.9661169 kg.
    expect(weightForAgeLms('female', 150.5)?.m).toBeCloseTo(43.9661169, 0);
  });

  it('gives the WHO standard under 24 months (WHO Child Growth Standards, weight-for-age, 2006)', () => {
    // WHO weight-for-age tables, boys month 12: L 0.0644, M 9.6479, S 0.10925; girls month 6: M 7.297.
    expect(weightForAgeLms('male', 12)).toEqual({ ageMonths: 12, l: 0.0644, m: 9.6479, s: 0.10925 });
    expect(weightForAgeLms('female', 6)?.m).toBeCloseTo(7.297, 6);
    // Between embedded rows, close to the month left out: girls month 10, M 8.48 kg.
    expect(weightForAgeLms('female', 10)?.m).toBeCloseTo(8.48, 1);
  });

  it('has no values outside birth to 240 months', () => {
    expect(weightForAgeLms('male', -1)).toBeNull();
    expect(weightForAgeLms('female', 240.5)).toBeNull();
    expect(weightForAgeLms('female', Number.NaN)).toBeNull();
  });
});

describe('lmsZScore and lmsValueAt (Cole TJ, Eur J Clin Nutr 1990;44:45-60)', () => {
  it('reproduce the published P3 and P97 from L, M and S', () => {
    const boy7 = weightForAgeLms('male', 84.5)!;
    // wtage.csv Sex=1 Agemos=84.5: P3 = 18.25535252 kg, P97 = 32.52599493 kg.
    expect(lmsValueAt(P3_Z, boy7)).toBeCloseTo(18.25535252, 2);
    expect(lmsValueAt(P97_Z, boy7)).toBeCloseTo(32.52599493, 2);
    expect(lmsZScore(32.52599493, boy7)).toBeCloseTo(P97_Z, 3);
    const girl12 = weightForAgeLms('female', 144.5)!;
    // Sex=2 Agemos=144.5: P3 = 30.01760377 kg, P97 = 65.90102746 kg.
    expect(lmsValueAt(P3_Z, girl12)).toBeCloseTo(30.01760377, 2);
    expect(lmsValueAt(P97_Z, girl12)).toBeCloseTo(65.90102746, 2);
  });

  it('reproduce the WHO percentiles at −2 and +2 z from L, M and S', () => {
    // WHO weight-for-age percentiles, boys month 12: 2nd (2.3rd) 7.742219 kg, 98th (97.7th) 11.98574 kg;
    // girls month 6: 5.729383 kg and 9.33549062 kg.
    expect(lmsValueAt(-2, weightForAgeLms('male', 12)!)).toBeCloseTo(7.742219, 3);
    expect(lmsValueAt(2, weightForAgeLms('male', 12)!)).toBeCloseTo(11.98574, 3);
    expect(lmsValueAt(-2, weightForAgeLms('female', 6)!)).toBeCloseTo(5.729383, 3);
    expect(lmsValueAt(2, weightForAgeLms('female', 6)!)).toBeCloseTo(9.33549062, 3);
  });

  it('is ln(X/M)/S when L is 0', () => {
    expect(lmsZScore(20 * Math.E ** 0.1, { ageMonths: 0, l: 0, m: 20, s: 0.1 })).toBeCloseTo(1, 9);
  });
});

describe('weightPlausibility', () => {
  // A 7-year-old (84 whole months) boy: median 23.2 kg (CDC 2000 wtage.csv, Agemos 84.5).
  it('accepts a weight near the median and up to the P97 for the age', () => {
    expect(weightPlausibility(23, 84, 'male').kind).toBe('plausible');
    expect(weightPlausibility(32.5, 84, 'male').kind).toBe('plausible');
    expect(weightPlausibility(18.3, 84, 'female').kind).toBe('plausible');
  });

  it(`catches a 7-year-old's kg typed as lb and a decimal slip (beyond ±${IMPLAUSIBLE_WEIGHT_Z} z, common practice)`, () => {
    const asPounds = weightPlausibility(23 * 2.2046, 84, 'male');
    expect(asPounds.kind).toBe('implausible');
    expect(weightPlausibility(2.3, 84, 'male').kind).toBe('implausible');
    expect(weightPlausibility(230, 84, 'male').kind).toBe('implausible');
    if (asPounds.kind !== 'implausible') throw new Error('expected implausible');
    expect(asPounds.zScore).toBeGreaterThan(3);
    expect(asPounds.low).toBeGreaterThan(14);
    expect(asPounds.high).toBeLessThan(50.7);
  });

  it('checks against both sexes when the sex is other or unknown, plausible if either fits', () => {
    expect(weightPlausibility(23, 84, 'unknown').kind).toBe('plausible');
    expect(weightPlausibility(2.3, 84, 'other').kind).toBe('implausible');
  });

  it('checks babies and toddlers against the WHO standard', () => {
    // WHO weight-for-age, girls month 18: median 10.2315 kg; 10 kg typed as 22 "kg" (pounds).
    expect(weightPlausibility(10, 18, 'female').kind).toBe('plausible');
    expect(weightPlausibility(22, 18, 'female')).toMatchObject({
      kind: 'implausible',
      reference: 'WHO Child Growth Standards weight-for-age',
    });
    expect(weightPlausibility(230, 84, 'male')).toMatchObject({ reference: 'CDC 2000 weight-for-age' });
  });

  it('never calls a weight plausible for an age the references do not cover', () => {
    expect(weightPlausibility(10, -1, 'female')).toMatchObject({ kind: 'not-checked' });
    expect(weightPlausibility(70, 240, 'male')).toMatchObject({ kind: 'not-checked' });
    expect(weightPlausibility(10, Number.NaN, 'male')).toMatchObject({ kind: 'not-checked' });
  });

  it('calls a zero or negative weight implausible rather than plausible', () => {
    expect(weightPlausibility(0, 84, 'male').kind).toBe('implausible');
  });
});
