import { describe, expect, it } from 'vitest';
import { ApiRequestError } from '@/lib/api-error';
import { placeServerErrors, stepOfFirstCheckError } from './server-errors';

describe('placeServerErrors', () => {
  it('puts settings errors on the pump fields and colleague errors on the sign-in fields', () => {
    const error = new ApiRequestError(400, 'Check the highlighted fields', [
      { field: 'settings.lockoutMinutes', message: 'Lockout cannot be negative' },
      { field: 'username', message: 'You cannot be both people: a different colleague signs here' },
    ]);
    expect(placeServerErrors(error, ['username', 'password', 'lockoutMinutes'], { 'settings.': '' })).toEqual({
      fieldErrors: {
        lockoutMinutes: 'Lockout cannot be negative',
        username: 'You cannot be both people: a different colleague signs here',
      },
      alert: null,
    });
  });

  it('puts a witness’s wrong password on the nested field', () => {
    const error = new ApiRequestError(401, 'The second person’s username or password is incorrect', [
      { field: 'witness.password', message: 'Username or password is incorrect' },
    ]);
    expect(placeServerErrors(error, ['amount', 'witness.username', 'witness.password']).fieldErrors).toEqual({
      'witness.password': 'Username or password is incorrect',
    });
  });

  it('turns an error without fields into the alert', () => {
    expect(placeServerErrors(new ApiRequestError(409, 'This check is already complete: start a new bedside check'), ['username'])).toEqual({
      fieldErrors: {},
      alert: 'This check is already complete: start a new bedside check',
    });
  });
});

describe('stepOfFirstCheckError', () => {
  it('sends each problem back to the step that shows its field', () => {
    expect(stepOfFirstCheckError(new ApiRequestError(400, 'x', [{ field: 'patientMrn', message: 'x' }]))).toBe('identify');
    expect(stepOfFirstCheckError(new ApiRequestError(400, 'x', [{ field: 'releaseCode', message: 'x' }]))).toBe('syringe');
    expect(stepOfFirstCheckError(new ApiRequestError(409, 'A syringe is still running'))).toBe('syringe');
    expect(stepOfFirstCheckError(new ApiRequestError(400, 'x', [{ field: 'settings.demandDose', message: 'x' }]))).toBe('first');
    expect(stepOfFirstCheckError(new Error('boom'))).toBe('first');
  });
});
