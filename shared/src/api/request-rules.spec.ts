import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { requestFieldErrors } from './request-errors.js';
import { isPlainObject, isWhole, listOf, must, textLength } from './request-rules.js';

const errorsOf = (schema: z.ZodType, value: unknown) => {
  const result = schema.safeParse(value);
  return result.success ? [] : requestFieldErrors(result.error);
};

describe('textLength', () => {
  it('counts an emoji, or a character and its variation selector, as one (as @MaxLength does)', () => {
    expect(textLength('ab')).toBe(2);
    expect(textLength('😀')).toBe(1);
    expect(textLength('❤️')).toBe(1);
    expect(textLength('')).toBe(0);
  });
});

describe('must', () => {
  const name = z.strictObject({ name: z.string(must('Enter the name', 'name must be text')) });

  it('says the field is missing for undefined and null, and the wrong type for anything else', () => {
    expect(errorsOf(name, {})).toEqual([{ field: 'name', message: 'Enter the name' }]);
    expect(errorsOf(name, { name: null })).toEqual([{ field: 'name', message: 'Enter the name' }]);
    expect(errorsOf(name, { name: 3 })).toEqual([{ field: 'name', message: 'name must be text' }]);
  });

  it('leaves unknown keys to requestFieldErrors, which names each by its own path', () => {
    expect(errorsOf(name, { name: 'Jo', role: 'admin', id: 1 })).toEqual([
      { field: 'role', message: 'property role should not exist' },
      { field: 'id', message: 'property id should not exist' },
    ]);
  });
});

describe('listOf', () => {
  const ids = listOf(z.number(), { required: 'ids is required', type: 'ids must be a list', max: [3, 'At most 3 ids'] }, [
    [(id) => typeof id === 'number' && isWhole(id), 'each id must be a whole number'],
    [(id) => typeof id === 'number' && id > 0, 'each id must be positive'],
  ]);

  it('names the list for a rule its items break, each rule checked over the whole list before the next', () => {
    expect(errorsOf(ids, [-1, 1.5])).toEqual([{ field: '', message: 'each id must be a whole number' }]);
    expect(errorsOf(ids, [2, -1])).toEqual([{ field: '', message: 'each id must be positive' }]);
  });

  it('checks the size before the items, and the presence and type before that', () => {
    expect(errorsOf(ids, [1, 2, 3, 'x'])).toEqual([{ field: '', message: 'At most 3 ids' }]);
    expect(errorsOf(ids, null)).toEqual([{ field: '', message: 'ids is required' }]);
    expect(errorsOf(ids, { 0: 1 })).toEqual([{ field: '', message: 'ids must be a list' }]);
    expect(ids.parse([1, 2])).toEqual([1, 2]);
  });

  it('looks into the items only once every item is an object', () => {
    const rules = listOf(
      z.strictObject({ drugId: z.number('drugId must be a number') }),
      { required: 'rules is required', type: 'rules must be a list', max: [5, 'Too many'] },
      [[isPlainObject, 'Each rule must be an object']],
    );
    expect(errorsOf(z.strictObject({ rules }), { rules: [{ drugId: 'x' }, 1] })).toEqual([
      { field: 'rules', message: 'Each rule must be an object' },
    ]);
    expect(errorsOf(z.strictObject({ rules }), { rules: [{ drugId: 'x' }] })).toEqual([
      { field: 'rules.0.drugId', message: 'drugId must be a number' },
    ]);
  });
});
