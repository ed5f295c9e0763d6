// ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: write mcg, not µg;
// mL, not cc; "units", not U or IU. Keys are lower case; a unit is matched part by part.
const SAFE_UNIT_PARTS: Readonly<Record<string, string>> = {
  mcg: 'mcg',
  ug: 'mcg',
  µg: 'mcg', // U+00B5 micro sign
  μg: 'mcg', // U+03BC Greek small mu
  mg: 'mg',
  g: 'g',
  kg: 'kg',
  ml: 'mL',
  cc: 'mL',
  l: 'L',
  h: 'h',
  hr: 'h',
  min: 'min',
  u: 'units',
  iu: 'units',
  unit: 'units',
  units: 'units',
};

/** The safe display spelling of a unit: 'ug/kg/h' → 'mcg/kg/h', 'cc' → 'mL'. Unknown parts stay. */
export function normaliseUnit(unit: string): string {
  return unit
    .trim()
    .split('/')
    .map((part) => SAFE_UNIT_PARTS[part.trim().toLowerCase()] ?? part.trim())
    .join('/');
}
