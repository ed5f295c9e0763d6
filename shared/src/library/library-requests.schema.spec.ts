import { describe, expect, it } from 'vitest';
import { requestFieldErrors } from '../api/request-errors.js';
import { importLibraryFieldsSchema, replaceRulesSchema, sendBackVersionSchema } from './library-requests.schema.js';

describe('importLibraryFieldsSchema', () => {
  it('reads the multipart text as the server does: a number for wardId, true and false for dryRun', () => {
    expect(importLibraryFieldsSchema.parse({ wardId: '2', note: 'From pharmacy', dryRun: 'true' })).toEqual({
      wardId: 2,
      note: 'From pharmacy',
      dryRun: true,
    });
    expect(importLibraryFieldsSchema.parse({ wardId: '2', dryRun: 'false' }).dryRun).toBe(false);
  });

  it('refuses a repeated wardId, a ward that is not a whole number from 1 and any other dryRun', () => {
    const errors = (fields: Record<string, unknown>) => {
      const result = importLibraryFieldsSchema.safeParse(fields);
      return result.success ? [] : requestFieldErrors(result.error);
    };
    expect(errors({ wardId: ['2', '3'] })).toEqual([{ field: 'wardId', message: 'wardId must be a whole number' }]);
    expect(errors({ wardId: '0' })).toEqual([{ field: 'wardId', message: 'wardId must be positive' }]);
    expect(errors({ wardId: '1.5' })).toEqual([{ field: 'wardId', message: 'wardId must be a whole number' }]);
    expect(errors({})).toEqual([{ field: 'wardId', message: 'wardId is required' }]);
    expect(errors({ wardId: '2', dryRun: 'yes' })).toEqual([{ field: 'dryRun', message: 'dryRun must be true or false' }]);
  });
});

describe('replaceRulesSchema', () => {
  const rule = { drugId: 1, concentrationPerMl: 1, doseUnit: 'mg', perKg: false, limits: { demandDose: { softMax: 2, hardMax: null } } };

  it('takes limits per regimen field, a limit null or left out for none', () => {
    expect(replaceRulesSchema.safeParse({ rules: [rule] }).success).toBe(true);
  });

  it('refuses a field whose limits are null, and an unknown field or limit, by its own path', () => {
    const result = replaceRulesSchema.safeParse({ rules: [{ ...rule, limits: { demandDose: null, weight: {} } }] });
    expect(result.success ? [] : requestFieldErrors(result.error)).toEqual([
      { field: 'rules.0.limits.demandDose', message: 'demandDose must be an object' },
      { field: 'rules.0.limits.weight', message: 'property weight should not exist' },
    ]);
  });
});

describe('sendBackVersionSchema', () => {
  const errors = (body: unknown) => {
    const result = sendBackVersionSchema.safeParse(body);
    return result.success ? [] : requestFieldErrors(result.error);
  };

  it('takes a signature and a comment saying what to change, trimmed', () => {
    expect(sendBackVersionSchema.parse({ signature: { password: 'pw' }, comment: '  Lockout limits look too short  ' }).comment).toBe(
      'Lockout limits look too short',
    );
  });

  it('refuses a missing, blank or short comment, by its field', () => {
    const signature = { password: 'pw' };
    expect(errors({ signature })).toEqual([{ field: 'comment', message: 'Say what needs changing' }]);
    expect(errors({ signature, comment: '        ' })).toEqual([{ field: 'comment', message: 'Give a reason of at least 10 characters' }]);
    expect(errors({ signature, comment: 42 })).toEqual([{ field: 'comment', message: 'comment must be text' }]);
  });
});
