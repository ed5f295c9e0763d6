import { describe, expect, it } from 'vitest';
import { planWards } from './scale-plan.js';

describe('planWards', () => {
  it('spreads every bed and PCA, with a busy first ward the same size in a hospital ten times smaller', () => {
    const full = planWards({ wards: 30, beds: 1000, active: 300 });
    const small = planWards({ wards: 3, beds: 100, active: 30 });
    for (const plan of [full, small]) {
      expect(plan.every((ward) => ward.active <= ward.beds)).toBe(true);
      expect(new Set(plan.map((ward) => ward.code)).size).toBe(plan.length);
    }
    expect(full.reduce((sum, ward) => sum + ward.beds, 0)).toBe(1000);
    expect(full.reduce((sum, ward) => sum + ward.active, 0)).toBe(300);
    expect(small[0]).toEqual(full[0]);
    expect(full[0]).toMatchObject({ name: 'Harbour', beds: 50, active: 25 });
    expect(Math.max(...full.slice(1).map((ward) => ward.active))).toBeLessThan(full[0].active);
  });

  it('names wards past the invented list with a number', () => {
    const plan = planWards({ wards: 40, beds: 2000, active: 400 });
    expect(new Set(plan.map((ward) => ward.code)).size).toBe(40);
    expect(plan.at(-1)!.name).toMatch(/ 2$/);
  });
});
