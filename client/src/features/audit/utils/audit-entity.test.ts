import { describe, expect, it } from 'vitest';
import { entityHref, entityLabel, entitySearchHref, shortHash } from './audit-entity';

describe('audit entities', () => {
  it('names the thing an event is about, wards by name when known', () => {
    expect(entityLabel({ entityType: 'order', entityId: '14' })).toBe('Order 14');
    expect(entityLabel({ entityType: 'library-version', entityId: '5' })).toBe('Library version 5');
    expect(entityLabel({ entityType: 'ward', entityId: '1' }, new Map([['1', 'Harbour']]))).toBe('Ward Harbour');
    expect(entityLabel({ entityType: 'ward', entityId: '9' }, new Map([['1', 'Harbour']]))).toBe('Ward 9');
  });

  it('links to the order page for roles that can open it, and the ward policy for the admin', () => {
    expect(entityHref({ entityType: 'order', entityId: '14' }, 'pharmacist')).toBe('/orders/14');
    expect(entityHref({ entityType: 'order', entityId: '14' }, 'admin')).toBeNull();
    expect(entityHref({ entityType: 'ward', entityId: '2' }, 'admin')).toBe('/admin/ward-policies?ward=2');
    expect(entityHref({ entityType: 'user', entityId: '2' }, 'admin')).toBeNull();
    expect(entityHref({ entityType: 'order', entityId: 'x' }, 'pharmacist')).toBeNull();
  });

  it("searches one entity's events", () => {
    expect(entitySearchHref({ entityType: 'library-version', entityId: '5' })).toBe('/admin/audit?entityType=library-version&entityId=5');
  });

  it('shortens a hash to 12 characters', () => {
    expect(shortHash('0123456789abcdef0123')).toBe('0123456789ab');
    expect(shortHash('')).toBe('');
  });
});
