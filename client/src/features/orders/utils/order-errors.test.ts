import { describe, expect, it } from 'vitest';
import { emptyOrderForm } from './order-form';
import { orderFormPath, orderRequest, placeOrderErrors, unsignedOrderErrors } from './order-errors';

describe('placing order errors on the form', () => {
  it('maps API paths to the inputs that hold them', () => {
    expect(orderFormPath('lockoutMinutes', [], [])).toBe('lockoutMinutes');
    expect(orderFormPath('demandDose', [], ['demandDose'])).toBe('reasons.demandDose');
    expect(orderFormPath('concentrationPerMl', [], [])).toBe('ruleId');
    expect(orderFormPath('overrides.1.reason', ['demandDose', 'fourHourLimit'], ['demandDose', 'fourHourLimit'])).toBe(
      'reasons.fourHourLimit',
    );
    expect(orderFormPath('overrides.4.reason', ['demandDose'], [])).toBeNull();
    expect(orderFormPath('weightKg', [], [])).toBeNull();
  });

  it("puts a 400's field errors beside their inputs and keeps the rest for an alert", () => {
    const placed = placeOrderErrors(
      [
        { field: 'demandDose', message: 'Reason needed: Demand dose 2.5 mg is above the soft maximum 2 mg' },
        { field: 'lockoutMinutes', message: 'Lockout 4 min is below the hard minimum 5 min' },
        { field: 'patient', message: 'Something about the patient' },
      ],
      [],
      ['demandDose'],
    );
    expect(placed.fieldErrors).toEqual({
      'reasons.demandDose': 'Reason needed: Demand dose 2.5 mg is above the soft maximum 2 mg',
      lockoutMinutes: 'Lockout 4 min is below the hard minimum 5 min',
    });
    expect(placed.otherErrors).toEqual(['Something about the patient']);
  });

  it('checks reasons and the review date with the shared schema before the password is asked for', () => {
    const values = {
      ...emptyOrderForm(new Date(2026, 2, 5)),
      reviewDate: '',
      reasons: { ...emptyOrderForm(new Date()).reasons, demandDose: 'too short' },
    };
    const fields = {
      patientId: 1,
      drugId: 1,
      concentrationPerMl: 1,
      doseUnit: 'mg' as const,
      demandDose: 2.5,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
    };
    const { signature: _signature, ...unsigned } = orderRequest(fields, values, ['demandDose'], '');
    expect(unsigned.overrides).toEqual([{ field: 'demandDose', reason: 'too short' }]);
    expect(unsignedOrderErrors(unsigned, ['demandDose'])).toEqual({
      reviewDate: 'Enter the review date (yyyy-mm-dd)',
      'reasons.demandDose': 'Give a reason of at least 10 characters',
    });
    const fixed = orderRequest(
      fields,
      { ...values, reviewDate: '2026-03-06', reasons: { ...values.reasons, demandDose: 'Tolerated 2.5 mg in recovery' } },
      ['demandDose'],
      'pw',
    );
    expect(unsignedOrderErrors(fixed, ['demandDose'])).toEqual({});
  });

  it('asks a reason for a soft finding that is not about a regimen value (a recorded allergy on drugId) and places its errors there', () => {
    expect(orderFormPath('drugId', [], ['drugId'])).toBe('otherReasons.drugId');
    expect(orderFormPath('drugId', [], [])).toBe('ruleId');
    expect(orderFormPath('overrides.0.reason', ['drugId'], ['drugId'])).toBe('otherReasons.drugId');
    const values = { ...emptyOrderForm(new Date(2026, 2, 5)), otherReasons: { drugId: 'Itch only; antihistamine charted' } };
    const fields = {
      patientId: 1,
      drugId: 1,
      concentrationPerMl: 1,
      doseUnit: 'mg' as const,
      demandDose: 1,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
    };
    const { signature: _signature, ...unsigned } = orderRequest(fields, values, ['drugId'], '');
    expect(unsigned.overrides).toEqual([{ field: 'drugId', reason: 'Itch only; antihistamine charted' }]);
    expect(unsignedOrderErrors(unsigned, ['drugId'])).toEqual({});
    const missing = orderRequest(fields, { ...values, otherReasons: {} }, ['drugId'], '');
    expect(unsignedOrderErrors(missing, ['drugId'])).toEqual({ 'otherReasons.drugId': expect.any(String) });
  });
});
