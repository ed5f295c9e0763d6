import { describe, expect, it } from 'vitest';
import { toOperationOutcome } from './operation-outcome.js';

// Source: HL7 FHIR R4 (4.0.1), OperationOutcome and the issue-type code system.
describe('toOperationOutcome', () => {
  it('answers a missing order as not-found with the message as diagnostics', () => {
    expect(toOperationOutcome(404, 'No order with id 99')).toEqual({
      resourceType: 'OperationOutcome',
      issue: [{ severity: 'error', code: 'not-found', diagnostics: 'No order with id 99' }],
    });
  });

  it('gives each status the nearest issue type', () => {
    const code = (status: number) => toOperationOutcome(status, 'x').issue[0].code;
    expect([400, 401, 403, 409, 429].map(code)).toEqual(['invalid', 'login', 'forbidden', 'conflict', 'throttled']);
    expect(code(413)).toBe('processing');
    expect(code(500)).toBe('exception');
  });
});
