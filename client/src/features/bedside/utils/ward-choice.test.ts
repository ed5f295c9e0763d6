import { describe, expect, it } from 'vitest';
import {
  ALL_WARDS,
  bedsideListWard,
  bedsideOrdersSummary,
  defaultWardChoice,
  observationsDueSummary,
  onChosenWards,
  parseWardParam,
  resolveWardChoice,
  sameWardChoice,
  wardParamValue,
  wardsPhrase,
} from './ward-choice';

// The demo's wards in the app's order: Harbour 1, Cedar 2, Wren 3, Summit 4. kai.mendes looks after Harbour and Summit.
const WARDS = [
  { id: 1, name: 'Harbour' },
  { id: 2, name: 'Cedar' },
  { id: 3, name: 'Wren' },
  { id: 4, name: 'Summit' },
];
const KNOWN = WARDS.map((ward) => ward.id);
const KAI = [1, 4];

describe('parseWardParam and wardParamValue', () => {
  it('reads every ward, one ward or several, and writes them back the same way', () => {
    expect(parseWardParam('all')).toBe(ALL_WARDS);
    expect(parseWardParam('3')).toEqual([3]);
    expect(parseWardParam('1,4')).toEqual([1, 4]);
    expect(parseWardParam(' 4 , 1 ,4')).toEqual([4, 1]);
    expect(wardParamValue(ALL_WARDS)).toBe('all');
    expect(wardParamValue([1, 4])).toBe('1,4');
    expect(parseWardParam(wardParamValue([2, 3]))).toEqual([2, 3]);
  });

  it('treats an absent, blank or unusable value as nothing asked (never as "every ward")', () => {
    for (const value of [null, '', ' ', ',', '0', '-1', '1.5', 'abc', 'NaN', 'Infinity', '1e400']) {
      expect(parseWardParam(value), String(value)).toBeNull();
    }
    // The usable ids of a partly bad value are kept.
    expect(parseWardParam('2,x,0')).toEqual([2]);
  });
});

describe('defaultWardChoice', () => {
  it("shows the nurse's own wards", () => {
    expect(defaultWardChoice(KAI, KNOWN)).toEqual({ wards: [1, 4], source: 'own' });
    expect(defaultWardChoice([2], KNOWN)).toEqual({ wards: [2], source: 'own' });
  });

  it('trusts the own wards while the ward list loads, and drops own wards that no longer exist once it has', () => {
    expect(defaultWardChoice(KAI, null)).toEqual({ wards: [1, 4], source: 'own' });
    expect(defaultWardChoice([4, 9], KNOWN)).toEqual({ wards: [4], source: 'own' });
  });

  it('shows every ward, saying why, for someone with no ward of their own', () => {
    expect(defaultWardChoice([], KNOWN)).toEqual({ wards: ALL_WARDS, source: 'no-own-wards' });
    expect(defaultWardChoice([], null)).toEqual({ wards: ALL_WARDS, source: 'no-own-wards' });
    expect(defaultWardChoice([9], KNOWN)).toEqual({ wards: ALL_WARDS, source: 'no-own-wards' });
  });
});

describe('resolveWardChoice', () => {
  it("defaults to the nurse's own wards when the address asks for none", () => {
    expect(resolveWardChoice(null, KAI, KNOWN)).toEqual({ wards: [1, 4], source: 'own' });
    expect(resolveWardChoice('', KAI, KNOWN)).toEqual({ wards: [1, 4], source: 'own' });
  });

  it('follows the address: every ward, another ward, or several', () => {
    expect(resolveWardChoice('all', KAI, KNOWN)).toEqual({ wards: ALL_WARDS, source: 'address' });
    expect(resolveWardChoice('2', KAI, KNOWN)).toEqual({ wards: [2], source: 'address' });
    expect(resolveWardChoice('2,3', KAI, KNOWN)).toEqual({ wards: [2, 3], source: 'address' });
    expect(resolveWardChoice('all', [], KNOWN)).toEqual({ wards: ALL_WARDS, source: 'address' });
  });

  it('drops unknown wards from the address once the wards are known, falling back to the default when none is left', () => {
    expect(resolveWardChoice('2,9', KAI, KNOWN)).toEqual({ wards: [2], source: 'address' });
    expect(resolveWardChoice('9', KAI, KNOWN)).toEqual({ wards: [1, 4], source: 'own' });
    expect(resolveWardChoice('9', KAI, null)).toEqual({ wards: [9], source: 'address' });
    expect(resolveWardChoice('9', [], KNOWN)).toEqual({ wards: ALL_WARDS, source: 'no-own-wards' });
  });
});

describe('sameWardChoice', () => {
  it('compares the wards whatever their order', () => {
    expect(sameWardChoice([1, 4], [4, 1])).toBe(true);
    expect(sameWardChoice([1, 4], [1])).toBe(false);
    expect(sameWardChoice([1], [1, 4])).toBe(false);
    expect(sameWardChoice(ALL_WARDS, ALL_WARDS)).toBe(true);
    expect(sameWardChoice(ALL_WARDS, [1, 2, 3, 4])).toBe(false);
  });
});

describe('onChosenWards', () => {
  const orders = [
    { id: 10, wardId: 1 },
    { id: 11, wardId: 2 },
    { id: 12, wardId: 3 },
    { id: 13, wardId: 4 },
  ];

  it("keeps the chosen wards' orders only: no Cedar or Wren patient in a Harbour and Summit round", () => {
    expect(onChosenWards(orders, KAI).map((order) => order.id)).toEqual([10, 13]);
    expect(onChosenWards(orders, [2]).map((order) => order.id)).toEqual([11]);
    expect(onChosenWards(orders, ALL_WARDS)).toEqual(orders);
  });
});

describe('wardsPhrase and the summaries', () => {
  it('names the wards shown in the app’s ward order', () => {
    expect(wardsPhrase([4, 1], WARDS)).toBe('Harbour and Summit');
    expect(wardsPhrase([2], WARDS)).toBe('Cedar');
    expect(wardsPhrase([4, 3, 2], WARDS)).toBe('Cedar, Wren and Summit');
    expect(wardsPhrase(ALL_WARDS, WARDS)).toBe('All wards');
    expect(wardsPhrase([9], WARDS)).toBe('ward 9');
  });

  it('says which wards, how many PCAs and the order', () => {
    expect(observationsDueSummary('Harbour and Summit', 6)).toBe('Harbour and Summit: 6 PCAs, sorted by due time');
    expect(observationsDueSummary('Cedar', 1)).toBe('Cedar: 1 PCA, sorted by due time');
    expect(observationsDueSummary('All wards', 0)).toBe('All wards: no PCA is running');
    expect(bedsideOrdersSummary('Harbour and Summit', 4)).toBe('Harbour and Summit: 4 PCA orders waiting for a bedside check or running');
    expect(bedsideOrdersSummary('Wren', 0)).toBe('Wren: no PCA order waiting for a bedside check or running');
  });
});

describe('bedsideListWard', () => {
  it("leads back to the nurse's usual list (her own wards) from an order on one of them, else to the order's ward", () => {
    expect(bedsideListWard(1, KAI)).toBeUndefined();
    expect(bedsideListWard(4, KAI)).toBeUndefined();
    expect(bedsideListWard(2, KAI)).toBe(2);
    expect(bedsideListWard(2, [])).toBe(2);
    expect(bedsideListWard(undefined, KAI)).toBeUndefined();
  });
});
