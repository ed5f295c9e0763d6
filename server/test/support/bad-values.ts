import { isEmail, isISO8601, isRFC3339 } from 'class-validator';
import fc from 'fast-check';

// Values that a DTO field's rules refuse, generated from the field's spec (see bad-input-specs.ts).

/** How a DTO treats a field that is missing or null. */
export type Presence =
  /** `@IsDefined`: missing and null are both refused. */
  | 'required'
  /** `@ValidateIf(value !== null)` + `@IsDefined`: null means "none", missing is refused. */
  | 'nullable'
  /** `@IsOptional`: missing and null are both let through. */
  | 'optional'
  /** `ValidateIf(value !== undefined)` (PartialType without skipping nulls): missing is let through, null refused. */
  | 'partial';

/** The rules a DTO field enforces, written out from the DTO so that bad values can be generated. */
export type FieldSpec = { presence?: Presence } & (
  | {
      type: 'string';
      min?: number;
      max: number;
      /** Whitespace is trimmed before the length is checked. */ trimmed?: boolean;
      pattern?: RegExp;
    }
  | { type: 'number'; int?: boolean; min?: number; positive?: boolean; max?: number }
  | { type: 'enum'; values: readonly string[] }
  | { type: 'boolean' }
  /** yyyy-mm-dd, a real day. */
  | { type: 'date' }
  /** RFC 3339 date and time with seconds and an offset, a real moment. */
  | { type: 'datetime' }
  | { type: 'email'; emptyAllowed?: boolean }
  | { type: 'object'; fields: BodySpec }
  | { type: 'array'; items: FieldSpec; maxItems: number; /** A valid item, to build over-long lists. */ sample: unknown }
);
export type BodySpec = Record<string, FieldSpec>;

export const INJECTION_STRINGS = [
  "' OR '1'='1",
  "'; DROP TABLE users; --",
  '1; DELETE FROM pca_orders',
  '" OR ""="',
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '{{7*7}}',
  '${7*7}',
  '../../etc/passwd',
  '$where',
  '{"$gt": ""}',
  "admin'--",
  '\u0000',
  '%00',
  '\\',
  'NaN',
  'Infinity',
  '-1',
  '1e309',
  'null',
  'undefined',
  'true',
  '[]',
  '{}',
];
export const injection = fc.constantFrom(...INJECTION_STRINGS);
export const anyText = fc.oneof(fc.string({ maxLength: 40 }), fc.string({ unit: 'binary', maxLength: 40 }), injection);
const someObject = fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), anyText, { maxKeys: 3 });
const finiteDouble = fc.double({ noNaN: true, noDefaultInfinity: true });
/** No whitespace (trimming cannot shorten it), no surrogate pairs or variation selectors (which class-validator does not count). */
const solidChar = fc.constantFrom(...'abcxyzABCXYZ0189<>\'"%;$-_/\\|&*()éßΩ漢字');

const notAString = fc.oneof(
  fc.integer(),
  finiteDouble,
  fc.boolean(),
  fc.constant([]),
  fc.array(anyText, { minLength: 1, maxLength: 3 }),
  someObject,
);
const notANumber = fc.oneof(anyText, fc.boolean(), fc.constant([]), fc.array(fc.integer(), { minLength: 1, maxLength: 3 }), someObject);
const notAnObject = fc.oneof(
  anyText,
  fc.integer(),
  finiteDouble,
  fc.boolean(),
  fc.constant([]),
  fc.constant([{}]),
  fc.array(fc.integer(), { minLength: 1, maxLength: 3 }),
);
const notAnArray = fc.oneof(anyText, fc.integer(), fc.boolean(), fc.constant({}), someObject);
const notABoolean = fc.oneof(
  fc.constantFrom('true', 'false', 'yes', 'no', '1', '0', ''),
  fc.constantFrom(0, 1, -1),
  fc.constant([]),
  fc.constant({}),
  anyText,
);
/** Strings and other values that are not ISO 8601 at all; `accepted` says which strings the field takes. */
const dateLike = (accepted: (text: string) => boolean) =>
  fc
    .oneof(
      anyText,
      fc.constantFrom(
        '2030-02-30',
        '2030-13-01',
        '2030-1-2',
        '02/01/2030',
        '2030-01-02T25:00:00Z',
        '2030-01-02T12:60:00Z',
        'yesterday',
        'now',
        '2030-01-02 12:00 UTC',
      ),
      // ISO 8601 forms that are not the one the field takes: week and ordinal dates, a year, compact forms, no seconds or zone.
      fc.constantFrom(
        '2030-W01-1',
        '2030-W01',
        '2030-001',
        '2030',
        '2030-01',
        '20300102',
        '20300102T120000Z',
        '2030-01-02T12:00Z',
        '2030-01-02T12:00:00',
        '2030-01-02',
        '2030-01-02T12:00:00Z',
      ),
      fc.integer(),
      fc.boolean(),
      fc.constant([]),
      someObject,
    )
    .filter((value) => typeof value !== 'string' || !accepted(value));
const notACalendarDay = dateLike((text) => /^\d{4}-\d{2}-\d{2}$/.test(text) && isISO8601(text, { strict: true }));
const notAMoment = dateLike((text) => isRFC3339(text) && isISO8601(text, { strict: true }));

type Labelled = fc.Arbitrary<{ kind: string; value: unknown }>;
const as = (kind: string, values: fc.Arbitrary<unknown>): Labelled => values.map((value) => ({ kind, value }));

/** Values the field's rules refuse, each labelled with the kind of badness. */
export function badValues(spec: FieldSpec, nullIsBad: boolean): Labelled[] {
  const bad: Labelled[] = nullIsBad ? [as('null', fc.constant(null))] : [];
  switch (spec.type) {
    case 'string': {
      bad.push(as('wrong type', notAString));
      const longest = Math.min(spec.max * 3 + 10, 20_000);
      bad.push(
        as(
          'long string',
          fc
            .tuple(
              fc.constantFrom('', ...INJECTION_STRINGS.filter((s) => s.trim() === s)),
              fc.string({ unit: solidChar, minLength: spec.max + 1, maxLength: longest }),
            )
            .map(([prefix, text]) => prefix + text),
        ),
      );
      const min = spec.min ?? 0;
      if (min > 0) bad.push(as(min === 1 ? 'empty' : 'too short', fc.string({ unit: solidChar, maxLength: min - 1 })));
      if (min > 0 && spec.trimmed) {
        const space = fc.constantFrom(' ', '\t', '\n', '\r', '\u00a0');
        bad.push(as('blank', fc.string({ unit: space, minLength: 1, maxLength: Math.min(spec.max, 60) })));
      }
      if (min > 1 && spec.trimmed) {
        bad.push(
          as(
            'too short once trimmed',
            fc
              .tuple(fc.string({ unit: solidChar, minLength: 1, maxLength: min - 1 }), fc.nat({ max: 20 }))
              .map(([text, pad]) => ' '.repeat(min + pad) + text + ' '),
          ),
        );
      }
      if (spec.pattern) {
        const pattern = spec.pattern;
        bad.push(
          as(
            'pattern',
            fc
              .oneof(injection, fc.string({ minLength: Math.max(min, 1), maxLength: spec.max }))
              .filter((s) => s.length >= min && s.length <= spec.max && !pattern.test(s)),
          ),
        );
      }
      return bad;
    }
    case 'number': {
      bad.push(as('wrong type', notANumber), as('Infinity', fc.constantFrom(Infinity, -Infinity)));
      const floor = spec.positive ? 0 : spec.min;
      if (floor !== undefined) {
        const below = fc.oneof(
          fc.double({ max: floor, noNaN: true, noDefaultInfinity: true }),
          fc.integer({ min: -1_000_000, max: Math.ceil(floor) }),
        );
        const refused = (x: number) => (spec.positive ? x <= 0 : x < floor);
        bad.push(as(floor <= 0 ? 'negative' : 'below minimum', below.filter(refused)));
      }
      if (spec.max !== undefined) {
        const max = spec.max;
        bad.push(
          as(
            'huge',
            fc
              .oneof(
                fc.double({ min: max, noNaN: true, noDefaultInfinity: true }),
                fc.constantFrom(1e308, Number.MAX_VALUE, Number.MAX_SAFE_INTEGER + 2, 1e20),
              )
              .filter((x) => x > max),
          ),
        );
      }
      if (spec.int)
        bad.push(
          as(
            'not whole',
            fc.double({ min: -1e6, max: 1e6, noNaN: true }).filter((x) => !Number.isInteger(x)),
          ),
        );
      return bad;
    }
    case 'enum': {
      const values = spec.values;
      const near = fc
        .constantFrom(...values)
        .chain((v) => fc.constantFrom(v.toUpperCase(), v.toLowerCase(), ` ${v}`, `${v} `, `${v}'; --`));
      const wrong = fc.oneof(anyText, near, fc.constantFrom('constructor', 'toString', '__proto__', 'valueOf', 'hasOwnProperty'));
      bad.push(
        as(
          'wrong enum',
          wrong.filter((v) => !values.includes(v)),
        ),
        as(
          'wrong type',
          fc.oneof(
            notAString,
            fc.constantFrom(...values).map((v) => [v]),
          ),
        ),
      );
      return bad;
    }
    case 'boolean':
      return [...bad, as('wrong type', notABoolean)];
    case 'date':
      return [...bad, as('not a date', notACalendarDay)];
    case 'datetime':
      return [...bad, as('not a date', notAMoment)];
    case 'email': {
      const notEmail = fc.oneof(
        anyText.filter((s) => (spec.emptyAllowed ? s !== '' : true) && !/\p{Surrogate}/u.test(s) && !isEmail(s)),
        // A lone surrogate, on which validator.js's isEmail throws.
        fc.constantFrom('\ud800@hospital.example', 'pharmacy@\udfffhospital.example'),
      );
      return [...bad, as('not an e-mail', notEmail), as('wrong type', fc.oneof(fc.integer(), fc.boolean(), fc.constant([]), someObject))];
    }
    case 'object':
      return [...bad, as('wrong type', notAnObject), as('list instead of object', fc.constantFrom([], [{}], [[]]))];
    case 'array':
      return [...bad, as('wrong type', notAnArray)];
  }
}
