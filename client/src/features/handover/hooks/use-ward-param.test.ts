import { describe, expect, it } from 'vitest';
import { defaultWardId } from './use-ward-param';

// The demo's wards in the app's order: Harbour 1, Cedar 2, Wren 3, Summit 4.
const WARDS = [{ id: 1 }, { id: 2 }, { id: 3 }, { id: 4 }];

describe('defaultWardId', () => {
  it("opens the person's own ward, the first of theirs in the app's ward order", () => {
    expect(defaultWardId(WARDS, [2])).toBe(2);
    expect(defaultWardId(WARDS, [4, 2])).toBe(2);
  });

  it('opens the first ward for someone with no ward of their own, and nothing with no wards', () => {
    expect(defaultWardId(WARDS, [])).toBe(1);
    expect(defaultWardId(WARDS, [9])).toBe(1);
    expect(defaultWardId([], [2])).toBeNull();
  });
});
