import { describe, expect, it } from 'vitest';
import { stepWithErrors, validateStepFields } from './step-form';

describe('validateStepFields', () => {
  it('checks every field of the step, not only up to the first problem', () => {
    const checked: string[] = [];
    const form = { validateField: (path: string) => (checked.push(path), { hasError: path !== 'reason' }) };
    expect(validateStepFields(form, ['amount', 'reason', 'overrideReason'])).toBe(false);
    expect(checked).toEqual(['amount', 'reason', 'overrideReason']);
    expect(validateStepFields(form, ['reason'])).toBe(true);
  });
});

describe('stepWithErrors', () => {
  const steps = [
    ['volumeInfusedMl', 'wastedMl'],
    ['newReleaseCode', 'witness.username', 'witness.password'],
  ];

  it('finds the step that shows the refused field', () => {
    expect(stepWithErrors(['witness.password'], steps)).toBe(1);
    expect(stepWithErrors(['wastedMl', 'newReleaseCode'], steps)).toBe(0);
    expect(stepWithErrors(['other'], steps)).toBeUndefined();
  });
});
