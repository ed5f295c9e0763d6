import { describe, expect, it } from 'vitest';
import { parseScaleOptions } from './scale-options.js';

describe('parseScaleOptions', () => {
  it('takes the issue’s figures by default and refuses impossible ones', () => {
    expect(parseScaleOptions([])).toMatchObject({ wards: 30, beds: 1000, active: 300, days: 30 });
    expect(parseScaleOptions(['--wards', '3', '--beds', '100', '--active', '30'])).toMatchObject({ wards: 3, beds: 100, active: 30 });
    expect(() => parseScaleOptions(['--wards', 'x'])).toThrow('--wards must be a whole number');
    expect(() => parseScaleOptions(['--wards', '1', '--beds', '10', '--active', '9'])).toThrow('at most 80 %');
    expect(() => parseScaleOptions(['--unknown', '1'])).toThrow();
  });
});
