// Binary floating point turns 0.1 + 0.2 into 0.30000000000000004. Twelve significant figures is
// far finer than any pump or syringe can measure, and coarse enough to remove that noise.
const SIGNIFICANT_FIGURES = 12;

/** `value` to 12 significant figures, so 0.1 + 0.2 gives 0.3. Non-finite values pass through. */
export function withoutFloatNoise(value: number): number {
  if (!Number.isFinite(value)) return value;
  // Whole numbers of up to 12 digits already are what toPrecision would give; skipping the string
  // round trip for them (counts, minutes, most doses) makes the handover board noticeably cheaper.
  if (Number.isInteger(value) && Math.abs(value) < 1e12) return value + 0; // + 0 turns -0 into 0
  return Number(value.toPrecision(SIGNIFICANT_FIGURES)) + 0;
}

/**
 * `value` rounded half away from zero to `decimals` places, as a person would round the decimal
 * they typed: 1.2345 → 1.235, although the stored double is 1.23449999…. Never returns -0.
 */
export function roundTo(value: number, decimals: number): number {
  if (!Number.isFinite(value)) return value;
  // Shift the decimal point in the string, not by multiplying, so no binary noise creeps in.
  const [mantissa, exponent] = withoutFloatNoise(Math.abs(value)).toExponential().split('e');
  const shifted = Math.round(Number(`${mantissa}e${Number(exponent) + decimals}`));
  const rounded = shifted / 10 ** decimals;
  return value < 0 && rounded !== 0 ? -rounded : rounded;
}
