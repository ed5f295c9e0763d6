import { describe, expect, it } from 'vitest';
import { factorFormErrors, factorFormValues, type FactorFormValues } from './factor-form';

// American Family Physician 2000;61(3):755, equianalgesic table: parenteral hydromorphone 1.5 mg ≈ morphine 10 mg.
const VALID: FactorFormValues = { amount: 1.5, unit: 'mg', source: 'American Family Physician 2000;61(3):755', password: 'secret' };

describe('factorFormErrors', () => {
  it('accepts a signed amount, unit and source', () => {
    expect(factorFormErrors(VALID)).toEqual({});
  });

  it('starts a factor for a drug that has none with no amount or source, in the drug’s unit', () => {
    const values = factorFormValues({ drugId: 7, genericName: 'sufentanil', route: 'parenteral', unit: 'mcg' });
    expect(values).toEqual({ amount: '', unit: 'mcg', source: '', password: '' });
    expect(factorFormErrors(values)).toEqual({
      amount: 'Enter the amount',
      source: 'Name the source of this factor',
      password: 'Enter your password to sign',
    });
  });

  it('puts the server’s words beside each field before anything is sent', () => {
    expect(factorFormErrors({ ...VALID, amount: '' })).toEqual({ amount: 'Enter the amount' });
    expect(factorFormErrors({ ...VALID, amount: 0 })).toEqual({ amount: 'Amount must be more than 0' });
    expect(factorFormErrors({ ...VALID, amount: '1e3' })).toEqual({ amount: 'Amount must be a number' });
    expect(factorFormErrors({ ...VALID, amount: 0.5, unit: 'mcg' })).toEqual({ amount: 'At least 1 mcg: check the amount' });
    expect(factorFormErrors({ ...VALID, amount: 2000 })).toEqual({ amount: 'At most 1,000 mg: check the amount' });
    expect(factorFormErrors({ ...VALID, source: '  ' })).toEqual({ source: 'Name the source of this factor' });
    expect(factorFormErrors({ ...VALID, password: '' })).toEqual({ password: 'Enter your password to sign' });
  });
});
