// Bad request bodies, generated from a route's JSON Schema (the OpenAPI document's rendering of
// its zod schema: fast-check's zod bridges do not fit zod 4). A body is mostly well formed so it
// gets past the first check and deep into the service, with a few nodes broken: wrong types,
// numbers past their columns, huge or control-character text, dates that do not exist or lie
// outside their window, extra and missing keys, nulls, arrays where objects go. Values that are
// valid but extreme (the bounds themselves, full-length text) come too: they must be stored.
import fc, { type Arbitrary } from 'fast-check';
import {
  BAD_DATE_TIMES,
  BAD_DATES,
  BAD_EMAILS,
  BAD_IDS,
  BAD_NUMBERS,
  BAD_TEXT,
  GENERIC_BAD,
  RAW_JUNK,
} from './fuzz-bad-values';

export interface JsonSchema {
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  enum?: unknown[];
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  format?: string;
  pattern?: string;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
}

/**
 * What the world holds, by body field name, so bodies can name real records (and records of the
 * wrong kind) and carry plausible meter values and dates: without them few bodies get past the
 * domain's rules to the database.
 */
export interface FuzzHints {
  /** ids by field name: machineId → the machine's id; taskIds → task ids */
  byField: Record<string, string[]>;
  all: string[];
  emails: string[];
  /** plausible numbers by field name (meter values after the latest reading) */
  numbers: Record<string, number[]>;
  /** plausible dates or date-times by field name */
  dates: Record<string, string[]>;
}

/** A body: JSON to send, or raw text (malformed JSON, deep nesting). */
export type FuzzBody = { json: unknown } | { raw: string };

const DAY = 86_400_000;
const isoDay = (days: number) => new Date(Date.now() + days * DAY).toISOString().slice(0, 10);
/** How often a node of an otherwise valid body is replaced by a bad value. */
const MUTATION_WEIGHT = { keep: 14, mutate: 1 };

const PLAIN = 'abcdefghijklmnopqrstuvwxyz ABCXYZ0123456789-./,'.split('');
const ODD = ['é', '½', 'ø', 'Ω', '°', '"', "'", '\\', '%', '_', '<', '>', '&', '\u00a0'];
const textUnit = fc.oneof(
  { weight: 9, arbitrary: fc.constantFrom(...PLAIN) },
  { weight: 1, arbitrary: fc.constantFrom(...ODD) },
);
const typesOf = (s: JsonSchema) =>
  s.type === undefined ? [] : Array.isArray(s.type) ? s.type : [s.type];

/** The world's values for this field most of the time, else `other`. */
function hinted<T>(known: T[] | undefined, other: Arbitrary<T>, weight = 4): Arbitrary<T> {
  return known?.length
    ? fc.oneof({ weight, arbitrary: fc.constantFrom(...known) }, { weight: 1, arbitrary: other })
    : other;
}

// ---- valid (possibly extreme) values -------------------------------------------------------

function validString(s: JsonSchema, hints: FuzzHints, key: string): Arbitrary<string> {
  if (s.format === 'uuid')
    return hinted(hints.byField[key], fc.oneof(fc.constantFrom(...hints.all), fc.uuid()), 12);
  if (s.format === 'email')
    return hinted(
      hints.emails,
      fc.stringMatching(/^[a-z][a-z0-9.]{0,20}$/).map((local) => `${local}@example.com`),
      2,
    );
  if (s.format === 'date')
    return hinted(hints.dates[key], fc.integer({ min: -700, max: 400 }).map(isoDay));
  if (s.format === 'date-time') {
    const zones = fc.constantFrom('Z', '-05:00', '+10:00');
    const any = fc.tuple(fc.integer({ min: 0, max: 400 * 24 }), zones).map(([hoursAgo, zone]) => {
      const offsetHours = zone === 'Z' ? 0 : zone === '-05:00' ? -5 : 10;
      const at = Date.now() - hoursAgo * 3_600_000 - 600_000 + offsetHours * 3_600_000;
      return `${new Date(at).toISOString().slice(0, 19)}${zone}`;
    });
    return hinted(hints.dates[key], any);
  }
  const min = s.minLength ?? 0;
  const max = s.maxLength ?? 200;
  if (s.pattern && !s.pattern.startsWith('^[^\\u0000'))
    return hinted(
      hints.byField[key],
      fc.stringMatching(new RegExp(s.pattern)).filter((v) => v.length >= min && v.length <= max),
    );
  const short = fc.string({
    unit: textUnit,
    minLength: Math.max(min, 1),
    maxLength: Math.min(max, 24),
  });
  return fc.oneof(
    { weight: 8, arbitrary: hinted(hints.byField[key], short) },
    { weight: 1, arbitrary: fc.constant('x'.repeat(max)) },
    // full length in two-unit characters: the most bytes the schema lets through
    { weight: 1, arbitrary: fc.constant('🚜'.repeat(Math.floor(max / 2)) || 'x') },
  );
}

function validNumber(s: JsonSchema, integer: boolean, hints: FuzzHints, key: string) {
  const lower = s.exclusiveMinimum ?? s.minimum ?? -1e9;
  const upper = s.exclusiveMaximum ?? s.maximum ?? 1e9;
  const any = integer
    ? fc.integer({
        min: Math.ceil(s.exclusiveMinimum !== undefined ? lower + 1 : lower),
        max: Math.floor(s.exclusiveMaximum !== undefined ? upper - 1 : upper),
      })
    : fc.double({
        min: lower,
        max: upper,
        minExcluded: s.exclusiveMinimum !== undefined,
        maxExcluded: s.exclusiveMaximum !== undefined,
        noNaN: true,
        noDefaultInfinity: true,
      });
  return hinted(hints.numbers[key], any, 2);
}

function validOf(
  s: JsonSchema,
  hints: FuzzHints,
  key: string,
  mutate: boolean,
): Arbitrary<unknown> {
  if (s.enum) return fc.constantFrom(...s.enum);
  const choices = s.anyOf ?? s.oneOf;
  if (choices) return fc.oneof(...choices.map((c) => nodeOf(c, hints, key, mutate)));
  const types = typesOf(s);
  const value = (type: string | undefined): Arbitrary<unknown> => {
    switch (type) {
      case 'string':
        return validString(s, hints, key);
      case 'integer':
      case 'number':
        return validNumber(s, type === 'integer', hints, key);
      case 'boolean':
        return fc.boolean();
      case 'array': {
        const minLength = s.minItems ?? 0;
        const maxLength = Math.min(s.maxItems ?? 3, Math.max(minLength, 3));
        const items = s.items ? nodeOf(s.items, hints, key, mutate) : fc.jsonValue();
        return fc.array(items, { minLength, maxLength });
      }
      case 'object': {
        const model: Record<string, Arbitrary<unknown>> = {};
        for (const [k, p] of Object.entries(s.properties ?? {}))
          model[k] = nodeOf(p, hints, k, mutate);
        return fc.record(model, { requiredKeys: (s.required ?? []).filter((k) => k in model) });
      }
      default:
        return fc.jsonValue({ maxDepth: 2 });
    }
  };
  const nonNull = types.filter((t) => t !== 'null');
  const base = nonNull.length ? fc.oneof(...nonNull.map(value)) : value(undefined);
  if (!types.includes('null')) return base;
  return fc.oneof({ weight: 4, arbitrary: base }, { weight: 1, arbitrary: fc.constant(null) });
}

// ---- bad values -----------------------------------------------------------------------------

function badOf(s: JsonSchema, hints: FuzzHints, key: string): Arbitrary<unknown> {
  const types = typesOf(s);
  const options: Arbitrary<unknown>[] = [fc.constantFrom(...GENERIC_BAD)];
  if (types.includes('number') || types.includes('integer')) {
    const edges = [s.maximum, s.minimum, s.exclusiveMinimum].filter(
      (n): n is number => n !== undefined,
    );
    const nearEdges = edges.flatMap((n) => [n + 1, n - 1, n + 0.005, n * 10]);
    options.push(fc.constantFrom(...BAD_NUMBERS, ...nearEdges));
  }
  if (types.includes('string')) {
    const max = s.maxLength ?? 1000;
    options.push(fc.constantFrom(...BAD_TEXT, 'x'.repeat(max + 1), 'y'.repeat(200_000)));
    const control = fc.integer({ min: 0, max: 0x9f }).filter((c) => c < 0x20 || c >= 0x7f);
    options.push(control.map((c) => `a${String.fromCharCode(c)}b`));
    if (s.format === 'date')
      options.push(fc.constantFrom(...BAD_DATES, isoDay(-3650), isoDay(3650)));
    if (s.format === 'date-time') options.push(fc.constantFrom(...BAD_DATE_TIMES));
    if (s.format === 'uuid')
      options.push(fc.constantFrom(...BAD_IDS, ...hints.all.map((id) => id.toUpperCase())));
    if (s.format === 'email') options.push(fc.constantFrom(...BAD_EMAILS));
  }
  if (types.includes('array') && s.items) {
    const item = validOf(s.items, hints, key, false);
    options.push(item.map((v) => ({ v })));
    options.push(fc.array(badOf(s.items, hints, key), { minLength: 1, maxLength: 2 }));
    const tooMany = (s.maxItems ?? Infinity) + 1;
    if (tooMany <= 2001) options.push(item.map((v) => Array.from({ length: tooMany }, () => v)));
  }
  if (types.includes('object')) {
    const whole = validOf(s, hints, key, false) as Arbitrary<Record<string, unknown>>;
    options.push(whole.map((o) => [o]));
    options.push(whole.map((o) => ({ ...o, zzUnknownField: 'x' })));
    // an own "__proto__" key, as JSON.parse makes it
    const proto = { value: { admin: true }, enumerable: true };
    options.push(whole.map((o) => Object.defineProperty({ ...o }, '__proto__', proto)));
    const required = s.required ?? [];
    if (required.length)
      options.push(
        fc.tuple(whole, fc.constantFrom(...required)).map(([o, k]) => {
          // a nullable object's valid value may be null: nothing to drop then
          if (o === null || typeof o !== 'object') return o;
          const { [k]: _dropped, ...rest } = o;
          return rest;
        }),
      );
  }
  return fc.oneof(...options);
}

function nodeOf(s: JsonSchema, hints: FuzzHints, key: string, mutate: boolean): Arbitrary<unknown> {
  const valid = validOf(s, hints, key, mutate);
  if (!mutate) return valid;
  return fc.oneof(
    { weight: MUTATION_WEIGHT.keep, arbitrary: valid },
    { weight: MUTATION_WEIGHT.mutate, arbitrary: badOf(s, hints, key) },
  );
}

/** Bodies for a route's JSON Schema: extreme but valid, mutated in places, broken as a whole. */
export function bodyArbitrary(schema: JsonSchema, hints: FuzzHints): Arbitrary<FuzzBody> {
  const json = (a: Arbitrary<unknown>) => a.map((v): FuzzBody => ({ json: v }));
  return fc.oneof(
    { weight: 3, arbitrary: json(validOf(schema, hints, '', false)) },
    { weight: 6, arbitrary: json(nodeOf(schema, hints, '', true)) },
    { weight: 2, arbitrary: json(badOf(schema, hints, '')) },
    { weight: 1, arbitrary: fc.constantFrom(...RAW_JUNK).map((raw): FuzzBody => ({ raw })) },
  );
}
