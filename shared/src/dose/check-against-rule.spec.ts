import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkAgainstRule } from './check-against-rule.js';

// Typical ranges, common practice (docs/clinical-sources.md, "Typical ranges"; no single published table): morphine demand 0.5–2 mg.
// Used here as the soft limits; the hard limits 0.2 and 4 mg are illustrative, not published.
const morphineDemand = { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 4 };

describe('checkAgainstRule', () => {
  it('places values against hard and soft limits', () => {
    // "A hard limit blocks, a soft limit asks for confirmation and a reason" [practice];
    // Cummings & McGowan, Nursing 2011;41(3):58-59: hard limits cannot be overridden, soft can.
    expect(checkAgainstRule(1, morphineDemand)).toBe('ok');
    expect(checkAgainstRule(0.3, morphineDemand)).toBe('soft-low');
    expect(checkAgainstRule(3, morphineDemand)).toBe('soft-high');
    expect(checkAgainstRule(0.1, morphineDemand)).toBe('hard-low');
    expect(checkAgainstRule(10, morphineDemand)).toBe('hard-high'); // a missed decimal point
  });

  it('counts a value equal to a limit as inside it (definition)', () => {
    expect(checkAgainstRule(0.5, morphineDemand)).toBe('ok');
    expect(checkAgainstRule(2, morphineDemand)).toBe('ok');
    expect(checkAgainstRule(0.2, morphineDemand)).toBe('soft-low');
    expect(checkAgainstRule(4, morphineDemand)).toBe('soft-high');
  });

  it('does not check absent or null limits', () => {
    expect(checkAgainstRule(100, {})).toBe('ok');
    expect(checkAgainstRule(100, { hardMax: null, softMax: undefined })).toBe('ok');
    expect(checkAgainstRule(0, { softMin: null, hardMax: 1 })).toBe('ok');
  });

  it('lets a hard limit win over a soft one', () => {
    expect(checkAgainstRule(5, { softMax: 2, hardMax: 4 })).toBe('hard-high');
    // Inconsistent limits still report the hard finding.
    expect(checkAgainstRule(3, { softMax: 5, hardMax: 2 })).toBe('hard-high');
  });

  it('never calls NaN inside a set limit', () => {
    expect(checkAgainstRule(Number.NaN, morphineDemand)).toBe('hard-low');
    expect(checkAgainstRule(Number.NaN, { softMax: 2 })).toBe('soft-high');
    expect(checkAgainstRule(Infinity, morphineDemand)).toBe('hard-high');
  });

  it('property: never ok, nor merely soft, for a value outside a hard limit', () => {
    const limit = fc.option(fc.double({ noNaN: true }), { nil: null });
    fc.assert(
      fc.property(fc.double({ noNaN: true }), limit, limit, limit, limit, (value, hardMin, softMin, softMax, hardMax) => {
        const result = checkAgainstRule(value, { hardMin, softMin, softMax, hardMax });
        if (hardMin !== null && value < hardMin) expect(result).toBe('hard-low');
        else if (hardMax !== null && value > hardMax) expect(result).toBe('hard-high');
        else if (result.startsWith('hard')) throw new Error(`hard finding inside hard limits: ${value}`);
      }),
    );
  });
});
