import { describe, expect, it } from 'vitest';
import { changedFields } from './order-diff';

const returned = {
  drugId: 1,
  concentrationPerMl: 1,
  loadingDose: null,
  demandDose: 2.5,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
  clinicianBolusDose: null,
  indication: 'Pain after laparotomy',
  reviewDate: '2026-03-06',
};

describe('changedFields', () => {
  it('finds nothing between identical versions', () => {
    expect([...changedFields(returned, { ...returned })]).toEqual([]);
  });

  it('names each changed field, in the order the screens show them', () => {
    const revised = { ...returned, demandDose: 1, oneHourLimit: 8, indication: 'Pain after laparotomy ', reviewDate: '2026-03-07' };
    expect([...changedFields(returned, revised)]).toEqual(['demandDose', 'oneHourLimit', 'reviewDate']);
  });

  it('ignores the last-bit noise of decimals but not a cleared value', () => {
    expect(changedFields(returned, { ...returned, demandDose: 2.5000000000001 }).has('demandDose')).toBe(false);
    expect(changedFields(returned, { ...returned, fourHourLimit: null }).has('fourHourLimit')).toBe(true);
    expect(changedFields(returned, { ...returned, drugId: 2, concentrationPerMl: 0.2 })).toEqual(new Set(['drug', 'concentrationPerMl']));
  });
});
