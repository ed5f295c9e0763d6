import { isEmail } from 'class-validator';
import fc from 'fast-check';
import type { BodySpec, FieldSpec } from './bad-values.js';

// Values that a DTO field's rules accept, generated from the same specs as the bad ones
// (bad-input-specs.ts), to check that the shared schemas take every body the server takes.

/** One character as class-validator's length rules count it: plain, accented, CJK, an emoji (two UTF-16 units) or a heart with its variation selector. */
const solidChar = fc.oneof(
  { weight: 12, arbitrary: fc.constantFrom(...'abcxyzABCXYZ0189<>\'"%;$-_/\\|&*()éßΩ漢字') },
  { weight: 1, arbitrary: fc.constantFrom('😀', '🦔', '❤️', '☺︎') },
);
const space = fc.constantFrom(' ', '\t', '\n', '\u00a0');
const USERNAME_CHARS = 'abcdefghijklmnopqrstuvwxyz0123456789._-';

type TextSpec = Extract<FieldSpec, { type: 'string' }>;

function text(spec: TextSpec): fc.Arbitrary<string> {
  // A pattern is only used for usernames: lower-case letters, digits, dots, dashes and underscores.
  const unit = spec.pattern ? fc.constantFrom(...USERNAME_CHARS) : spec.trimmed ? solidChar : fc.oneof(solidChar, space);
  const core = fc
    .integer({ min: spec.min ?? 0, max: spec.max })
    .chain((length) => fc.array(unit, { minLength: length, maxLength: length }))
    .map((units) => units.join(''));
  if (!spec.trimmed) return core;
  // Trimmed before its length is checked: surrounding whitespace never counts.
  const padding = fc.string({ unit: space, maxLength: 3 });
  return fc.tuple(padding, core, padding).map(([before, middle, after]) => before + middle + after);
}

type NumberSpec = Extract<FieldSpec, { type: 'number' }>;

function number(spec: NumberSpec): fc.Arbitrary<number> {
  if (spec.int) {
    const min = spec.positive ? Math.max(spec.min ?? 1, 1) : (spec.min ?? -(2 ** 31));
    const whole = fc.integer({ min, max: spec.max ?? 2 ** 31 });
    // @IsInt takes whole numbers beyond 2^53 too; zod's .int() would not.
    return spec.max === undefined
      ? fc.oneof({ weight: 9, arbitrary: whole }, { weight: 1, arbitrary: fc.constantFrom(2 ** 53, 1e20) })
      : whole;
  }
  const min = spec.positive ? 0 : (spec.min ?? -Number.MAX_VALUE);
  return fc.double({ min, max: spec.max ?? Number.MAX_VALUE, minExcluded: spec.positive, noNaN: true, noDefaultInfinity: true });
}

const pad = (n: number, width = 2) => String(n).padStart(width, '0');
/** Any real day from year 1000 to 9999, as yyyy-mm-dd (validator.js misreads earlier years and refuses them). */
const day = fc
  .date({ min: new Date('1000-01-01T00:00:00Z'), max: new Date('9999-12-31T23:59:59Z'), noInvalidDate: true })
  .map((date) => date.toISOString().slice(0, 10));
/** RFC 3339 with seconds and an offset: `T` or a space, a fraction or none, Z, z or ±hh:mm. */
const moment = fc
  .tuple(
    day,
    fc.constantFrom('T', ' '),
    fc.tuple(fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 59 }), fc.integer({ min: 0, max: 59 })),
    fc.option(fc.stringMatching(/^\d{1,9}$/), { nil: '' }),
    fc.oneof(
      fc.constantFrom('Z', 'z'),
      fc
        .tuple(fc.constantFrom('+', '-'), fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 59 }))
        .map(([sign, h, m]) => `${sign}${pad(h)}:${pad(m)}`),
    ),
  )
  .map(
    ([date, separator, [h, m, s], fraction, zone]) =>
      `${date}${separator}${pad(h)}:${pad(m)}:${pad(s)}${fraction && `.${fraction}`}${zone}`,
  );
const email = fc.oneof(
  fc
    .tuple(
      fc.stringMatching(/^[a-z0-9!#$%&'*+=?^_`{|}~-]{1,20}(\.[a-z0-9]{1,8}){0,2}$/),
      fc.stringMatching(/^([a-z0-9]([a-z0-9-]{0,8}[a-z0-9])?\.){1,3}[a-z]{2,6}$/),
    )
    .map(([local, domain]) => `${local}@${domain}`),
  fc.emailAddress().filter((address) => isEmail(address)),
);

/** A value the field's rules accept, when the field is present and not null. */
export function validValue(spec: FieldSpec): fc.Arbitrary<unknown> {
  switch (spec.type) {
    case 'string':
      return text(spec);
    case 'number':
      return number(spec);
    case 'enum':
      return fc.constantFrom(...spec.values);
    case 'boolean':
      return fc.boolean();
    case 'date':
      return day;
    case 'datetime':
      return moment;
    case 'email':
      return spec.emptyAllowed ? fc.oneof(fc.constant(''), email) : email;
    case 'object':
      return validBodies(spec.fields);
    case 'array': {
      const item = validValue(spec.items);
      const few = fc.array(item, { maxLength: Math.min(spec.maxItems, 4) });
      const full = fc.array(item, { minLength: spec.maxItems, maxLength: spec.maxItems });
      return fc.oneof({ weight: 9, arbitrary: few }, { weight: 1, arbitrary: full });
    }
  }
}

const ABSENT = Symbol('absent');

/** The field as a body carries it: missing and null only where the field's presence lets them through. */
function presentOrNot(spec: FieldSpec): fc.Arbitrary<unknown> {
  const value = validValue(spec);
  switch (spec.presence ?? 'required') {
    case 'required':
      return value;
    case 'nullable':
      return fc.oneof(value, fc.constant(null));
    case 'optional':
      return fc.oneof(value, fc.constant(ABSENT), fc.constant(null));
    case 'partial':
      return fc.oneof(value, fc.constant(ABSENT));
  }
}

/** Bodies that every rule of `spec` accepts: numbers within their bounds, text of an allowed length, real dates, lists up to their size. */
export function validBodies(spec: BodySpec): fc.Arbitrary<Record<string, unknown>> {
  const fields = Object.entries(spec).map(([name, field]) => presentOrNot(field).map((value) => [name, value] as const));
  return fc.tuple(...fields).map((entries) => Object.fromEntries(entries.filter(([, value]) => value !== ABSENT)));
}
