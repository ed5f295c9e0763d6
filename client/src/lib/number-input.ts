/** A NumberInput's value: a number, or text while empty ('') or half-typed. */
export type NumberFieldValue = number | string;

// Only plain decimals: "1e2", "0x10" or "1,5" are not what anyone reads off a pump or a chart.
// No sign either: every number input refuses a minus (allowNegative={false}).
const PLAIN_DECIMAL = /^(\d+\.?\d*|\.\d+)$/;

/** The one reader of a typed number: '' is "not entered" (null); a plain decimal is its number; anything else undefined. */
export function readNumber(value: NumberFieldValue): number | null | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? value : undefined;
  const text = value.trim();
  if (text === '') return null;
  return PLAIN_DECIMAL.test(text) ? Number(text) : undefined;
}
