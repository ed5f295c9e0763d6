import { describe, expect, it } from 'vitest';
import { assignedWardsLabel } from './assigned-wards';

const ward = (id: number, name: string) => ({ id, name });

describe('assignedWardsLabel', () => {
  it('names one or two wards and counts more', () => {
    expect(assignedWardsLabel([])).toBeNull();
    expect(assignedWardsLabel([ward(1, 'Harbour')])).toBe('Harbour');
    expect(assignedWardsLabel([ward(1, 'Harbour'), ward(4, 'Summit')])).toBe('Harbour · Summit');
    expect(assignedWardsLabel([ward(2, 'Cedar'), ward(1, 'Harbour'), ward(4, 'Summit')])).toBe('3 wards');
  });
});
