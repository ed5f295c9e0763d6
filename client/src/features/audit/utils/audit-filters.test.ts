import { describe, expect, it } from 'vitest';
import {
  actionOptions,
  EMPTY_FILTERS,
  entityTypesFor,
  filterErrors,
  filtersFromSearch,
  localDateTimeToIso,
  pageCount,
  searchFromFilters,
  toAuditQuery,
} from './audit-filters';

describe('entity types and actions per role', () => {
  it('offers pharmacists orders, library versions, equianalgesic factors and patients only', () => {
    expect(entityTypesFor('admin')).toEqual(['order', 'library-version', 'user', 'ward', 'sign-in', 'equianalgesic-factor', 'patient']);
    expect(entityTypesFor('pharmacist')).toEqual(['order', 'library-version', 'equianalgesic-factor', 'patient']);
  });

  it('groups actions by what they are about, narrowed to the chosen type', () => {
    const pharmacy = actionOptions(entityTypesFor('pharmacist'), null);
    expect(pharmacy.map((group) => group.group)).toEqual(['Order', 'Library version', 'Equianalgesic factor', 'Patient']);
    expect(
      pharmacy
        .flatMap((group) => group.items.map((item) => item.value))
        .every((value) => /^(order|library-version|equianalgesic-factor|patient)\./.test(value)),
    ).toBe(true);

    const ward = actionOptions(entityTypesFor('admin'), 'ward');
    expect(ward.map((group) => group.group)).toEqual(['Ward']);
    expect(ward[0].items).toContainEqual({ value: 'ward.policy-update', label: 'Ward policy changed' });
    expect(ward[0].items.every((item) => item.value.startsWith('ward.'))).toBe(true);
  });
});

describe('filters in the address', () => {
  it('reads what the role may ask for and drops the rest', () => {
    const search = new URLSearchParams(
      'entityType=ward&entityId=%202%20&userId=7&action=ward.policy-update&from=2026-03-03T09:00&to=nonsense&page=3',
    );
    expect(filtersFromSearch(search, 'admin')).toEqual({
      filters: { entityType: 'ward', entityId: '2', userId: 7, action: 'ward.policy-update', from: '2026-03-03T09:00', to: '' },
      page: 3,
    });
    expect(filtersFromSearch(search, 'pharmacist')).toEqual({
      filters: { entityType: null, entityId: '2', userId: null, action: null, from: '2026-03-03T09:00', to: '' },
      page: 3,
    });
  });

  it('starts at page 1 for a missing or silly page, and ignores unknown actions', () => {
    expect(filtersFromSearch(new URLSearchParams('page=0&action=order.explode'), 'admin')).toEqual({ filters: EMPTY_FILTERS, page: 1 });
    expect(filtersFromSearch(new URLSearchParams('page=-2&userId=abc'), 'admin').page).toBe(1);
  });

  it('writes only what is set, and the page from 2 on', () => {
    expect(searchFromFilters(EMPTY_FILTERS)).toEqual({
      entityType: undefined,
      entityId: undefined,
      userId: undefined,
      action: undefined,
      from: undefined,
      to: undefined,
      page: undefined,
    });
    expect(searchFromFilters({ ...EMPTY_FILTERS, entityType: 'order', entityId: ' 14 ' }, 2)).toMatchObject({
      entityType: 'order',
      entityId: '14',
      page: 2,
    });
  });
});

describe('the query sent to the server', () => {
  it('pages by limit and offset and sends only the filters set', () => {
    expect(toAuditQuery(EMPTY_FILTERS, 1)).toEqual({ limit: 50, offset: 0 });
    expect(toAuditQuery({ ...EMPTY_FILTERS, entityType: 'order', entityId: '14', userId: 3, action: 'order.verify' }, 3, 20)).toEqual({
      limit: 20,
      offset: 40,
      entityType: 'order',
      entityId: '14',
      userId: 3,
      action: 'order.verify',
    });
  });

  it('sends local times as ISO instants, "to" to the end of its minute', () => {
    const query = toAuditQuery({ ...EMPTY_FILTERS, from: '2026-03-03T09:00', to: '2026-03-03T09:05' }, 1);
    expect(query.from).toBe(new Date(2026, 2, 3, 9, 0, 0, 0).toISOString());
    expect(query.to).toBe(new Date(2026, 2, 3, 9, 5, 59, 999).toISOString());
    expect(localDateTimeToIso('3/3/2026')).toBeUndefined();
    expect(localDateTimeToIso('')).toBeUndefined();
  });

  it('refuses an end before the start', () => {
    expect(filterErrors({ ...EMPTY_FILTERS, from: '2026-03-03T10:00', to: '2026-03-03T09:00' })).toEqual({
      to: 'The end is before the start',
    });
    expect(filterErrors({ ...EMPTY_FILTERS, from: '2026-03-03T09:05', to: '2026-03-03T09:05' })).toEqual({});
    expect(filterErrors({ ...EMPTY_FILTERS, to: '2026-03-03T09:00' })).toEqual({});
  });

  it('counts pages, at least one', () => {
    expect(pageCount(0)).toBe(1);
    expect(pageCount(50)).toBe(1);
    expect(pageCount(51)).toBe(2);
  });
});
