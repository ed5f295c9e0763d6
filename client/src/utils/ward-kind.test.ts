import { describe, expect, it } from 'vitest';
import { wardKindLabel } from './ward-kind';

describe('wardKindLabel', () => {
  it('says Children’s ward for a paediatric ward and nothing for an adult one or none', () => {
    expect(wardKindLabel({ population: 'paediatric' })).toBe('Children’s ward');
    expect(wardKindLabel({ population: 'adult' })).toBeNull();
    expect(wardKindLabel(null)).toBeNull();
    expect(wardKindLabel(undefined)).toBeNull();
  });
});
