import { describe, expect, it, vi } from 'vitest';
import { ApiRequestError } from './api-error';
import { applyServerErrors, splitFieldErrors } from './form-errors';

describe('splitFieldErrors', () => {
  it('puts each message on its field, nested paths on their first segment', () => {
    const result = splitFieldErrors(
      [
        { field: 'username', message: 'Username must be at least 3 characters' },
        { field: 'wardIds.1', message: 'Ward 99 does not exist' },
        { field: 'username', message: 'a second message is not shown' },
        { field: 'createdAt', message: 'should not be sent' },
      ],
      ['username', 'displayName', 'wardIds'],
    );
    expect(result.fieldErrors).toEqual({ username: 'Username must be at least 3 characters', wardIds: 'Ward 99 does not exist' });
    expect(result.otherErrors).toEqual(['createdAt: should not be sent']);
  });
});

describe('applyServerErrors', () => {
  const makeForm = () => ({ setErrors: vi.fn(), getValues: () => ({ username: '', password: '' }) });

  it('sets the field errors of a 400 on the form', () => {
    const form = makeForm();
    const left = applyServerErrors(form, new ApiRequestError(400, 'Bad input', [{ field: 'password', message: 'Too short' }]));
    expect(form.setErrors).toHaveBeenCalledWith({ password: 'Too short' });
    expect(left).toEqual([]);
  });

  it('returns the message of an error without field errors', () => {
    const form = makeForm();
    expect(applyServerErrors(form, new ApiRequestError(403, 'Your role may not do this.'))).toEqual(['Your role may not do this.']);
    expect(applyServerErrors(form, new Error('boom'))).toEqual(['Something went wrong. Try again.']);
    expect(form.setErrors).not.toHaveBeenCalled();
  });
});
