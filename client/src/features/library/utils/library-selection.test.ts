import { describe, expect, it } from 'vitest';
import type { Ward } from '@lockstep/shared';
import { chooseWardId, parseId } from './library-selection';

const ward = (id: number, name: string): Ward => ({
  id,
  code: name.slice(0, 3).toUpperCase(),
  name,
  specialty: 'x',
  weightBasedDosing: false,
  population: 'adult',
});
const wards = [ward(1, 'Harbour'), ward(2, 'Cedar')];

describe('library selection', () => {
  it('reads only positive whole numbers from the address', () => {
    expect(parseId('12')).toBe(12);
    expect(parseId(null)).toBeNull();
    expect(parseId('0')).toBeNull();
    expect(parseId('2abc')).toBeNull();
    expect(parseId('-3')).toBeNull();
  });

  it('keeps a known ward and otherwise takes the first', () => {
    expect(chooseWardId(2, wards)).toBe(2);
    expect(chooseWardId(9, wards)).toBe(1);
    expect(chooseWardId(null, wards)).toBe(1);
    expect(chooseWardId(2, [])).toBeNull();
  });
});
