import fc from 'fast-check';
import { badValues, type BodySpec, type FieldSpec, injection, type Presence } from './bad-values.js';

type Path = (string | number)[];
type Json = Record<string, unknown>;

/** One way of breaking a body: set (or remove) the value at `at`; the API should name `broken`. */
type Mutation = { kind: string; at: Path; broken: Path; value?: unknown; remove?: true };

export type BadBody = {
  /** JSON text, which can hold what JSON.stringify cannot (1e999 is Infinity once parsed). */
  json: string;
  /** Dotted paths of the fields broken on purpose; the 400 must name these and nothing else. */
  broken: string[];
  kinds: string[];
  /** Keys sent alongside that the API may name or silently drop (see prototypeKeys). */
  extraKeys: string[];
};

const INFINITY = 'INFINITY-sentinel-5c1e';
const MINUS_INFINITY = '-INFINITY-sentinel-5c1e';

/** Keys a careless handler might copy onto an entity. */
const MASS_ASSIGNMENT_KEYS = [
  'id',
  'status',
  'role',
  'isAdmin',
  'passwordHash',
  'userId',
  'verifiedById',
  'prescriberId',
  'approverId',
  'createdAt',
  'version',
  'rowVersion',
];

const nullIsBad = (presence: Presence) => presence === 'required' || presence === 'partial';
const missingIsBad = (presence: Presence) => presence === 'required' || presence === 'nullable';

/** Mutations of one field: missing, a bad value, and for lists too many or a bad item. */
function fieldMutations(spec: FieldSpec, path: Path, current: unknown): fc.Arbitrary<Mutation>[] {
  const presence = spec.presence ?? 'required';
  const arbitraries: fc.Arbitrary<Mutation>[] = [];
  if (missingIsBad(presence)) arbitraries.push(fc.constant({ kind: 'missing', at: path, broken: path, remove: true }));
  const values = badValues(spec, nullIsBad(presence));
  arbitraries.push(fc.oneof(...values).map(({ kind, value }) => ({ kind, at: path, broken: path, value })));
  if (spec.type === 'array') {
    const items = Array.isArray(current) ? current : [];
    const tooMany = fc
      .integer({ min: spec.maxItems + 1, max: spec.maxItems + 3 })
      .map((n) => Array.from({ length: n }, () => structuredClone(spec.sample)));
    arbitraries.push(tooMany.map((value) => ({ kind: 'too many items', at: path, broken: path, value })));
    const itemValues = badValues(spec.items, true);
    arbitraries.push(
      fc.tuple(fc.oneof(...itemValues), fc.nat({ max: items.length })).map(([{ kind, value }, index]) => ({
        kind: `bad item: ${kind}`,
        at: path,
        broken: [...path, index],
        value: [...items.slice(0, index), value, ...items.slice(index)],
      })),
    );
  }
  return arbitraries;
}

const PROTOTYPE_NAMES = new Set([...Object.getOwnPropertyNames(Object.prototype), '__proto__', 'prototype']);

function unknownFieldMutation(spec: BodySpec, path: Path): fc.Arbitrary<Mutation> {
  // Object.prototype's names are left to prototypeKeys: class-transformer drops them silently.
  const key = fc
    .oneof(fc.string({ maxLength: 16 }), fc.constantFrom(...MASS_ASSIGNMENT_KEYS), injection)
    .filter((k) => !(k in spec) && !PROTOTYPE_NAMES.has(k));
  return fc
    .tuple(key, fc.jsonValue({ maxDepth: 2 }))
    .map(([k, value]) => ({ kind: 'unknown field', at: [...path, k], broken: [...path, k], value }));
}

/**
 * One mutation somewhere in `body`: each field (and an unknown one) is equally likely at each
 * level, and a nested object or list item shares its field's chance, so deep structures do not
 * crowd out the top-level fields.
 */
function mutationOf(spec: BodySpec, body: Json, path: Path = []): fc.Arbitrary<Mutation> {
  const choices = [unknownFieldMutation(spec, path)];
  for (const [name, field] of Object.entries(spec)) {
    const here = [...path, name];
    const value = body[name];
    const own = fieldMutations(field, here, value);
    if (field.type === 'object' && isPlainObject(value)) own.push(mutationOf(field.fields, value, here));
    if (field.type === 'array' && field.items.type === 'object' && Array.isArray(value)) {
      const { fields } = field.items;
      value.forEach((item, index) => isPlainObject(item) && own.push(mutationOf(fields, item, [...here, index])));
    }
    choices.push(fc.oneof(...own));
  }
  return fc.oneof(...choices);
}

function isPlainObject(value: unknown): value is Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export const dotted = (path: Path): string => path.join('.');
/** The API names `rules.0.drugId` for a broken `rules.0.drugId`, and `wardIds` for a bad `wardIds.2`. */
export const related = (a: string, b: string): boolean => a === b || a.startsWith(`${b}.`) || b.startsWith(`${a}.`);

function apply(body: Json, mutation: Mutation): boolean {
  let parent: unknown = body;
  for (const step of mutation.at.slice(0, -1)) {
    parent = (parent as Json)[step as string];
    if (typeof parent !== 'object' || parent === null) return false;
  }
  const last = mutation.at[mutation.at.length - 1] as string;
  if (mutation.remove) delete (parent as Json)[last];
  else (parent as Json)[last] = mutation.value;
  return true;
}

/** Objects under keys that exist on Object.prototype: the validation pipe must never let them pollute it. */
const prototypeKeys = fc.subarray([
  '"__proto__":{"polluted":"yes"}',
  '"constructor":{"prototype":{"polluted":"yes"}}',
  '"toString":"polluted"',
]);

export function toJson(body: unknown): string {
  return JSON.stringify(body, (_key, value: unknown) => (value === Infinity ? INFINITY : value === -Infinity ? MINUS_INFINITY : value))
    .replaceAll(`"${INFINITY}"`, '1e999')
    .replaceAll(`"${MINUS_INFINITY}"`, '-1e999');
}

/**
 * Bodies that start from a valid one and break one to three unrelated fields in the ways `spec`
 * refuses, so that every one of them must be answered 400 naming exactly the broken fields.
 */
export function badBodies(spec: BodySpec, valid: Json): fc.Arbitrary<BadBody> {
  return fc.tuple(fc.array(mutationOf(spec, valid), { minLength: 1, maxLength: 3 }), prototypeKeys).map(([mutations, extras]) => {
    const body = structuredClone(valid);
    const applied: Mutation[] = [];
    for (const mutation of mutations) {
      // A later mutation must not touch what an earlier one broke (or rebuild a list around it).
      const clash = (done: Mutation) =>
        related(dotted(done.at), dotted(mutation.at)) || related(dotted(done.broken), dotted(mutation.broken));
      if (applied.some(clash)) continue;
      if (apply(body, mutation)) applied.push(mutation);
    }
    const json = toJson(body);
    const withExtras = extras.length === 0 ? json : `{${extras.join(',')}${json === '{}' ? '' : ','}${json.slice(1)}`;
    const bad: BadBody = {
      json: withExtras,
      broken: applied.map((m) => dotted(m.broken)),
      kinds: applied.map((m) => m.kind),
      extraKeys: extras.map((extra) => extra.slice(1, extra.indexOf('"', 1))),
    };
    // fast-check prints counterexamples with this: keep a 501-rule list from filling the screen.
    return Object.assign(bad, {
      [fc.toStringMethod]: () =>
        `${bad.kinds.join(' + ')} at ${bad.broken.join(', ')}: ${bad.json.length > 600 ? `${bad.json.slice(0, 600)}…` : bad.json}`,
    });
  });
}
