/**
 * fast-check arbitraries for bodies a careless or hostile client sends: wrong types, huge and
 * non-finite numbers, number-like strings, SQL- and script-looking text, control characters,
 * emoji and right-to-left marks, very long strings, deep nesting, and objects keyed by the field
 * names the shared schemas really declare (so a body reaches past the first "unknown key").
 */
import { gzipSync } from 'node:zlib';
import * as fc from 'fast-check';
import { isSchema } from 'yup';
import * as auth from '../../../shared/schemas/auth.schema';
import * as bike from '../../../shared/schemas/bike.schema';
import * as catalogue from '../../../shared/schemas/catalogue.schema';
import * as damperKind from '../../../shared/schemas/damper-kind.schema';
import * as damping from '../../../shared/schemas/damping.schema';
import * as draft from '../../../shared/schemas/draft.schema';
import * as quote from '../../../shared/schemas/quote.schema';
import * as setupLog from '../../../shared/schemas/setup-log.schema';
import * as shopData from '../../../shared/schemas/shop-data.schema';
import * as shopSettings from '../../../shared/schemas/shop-settings.schema';
import * as sizingRecord from '../../../shared/schemas/sizing-record.schema';
import * as sizing from '../../../shared/schemas/sizing.schema';
import * as weighIn from '../../../shared/schemas/weigh-in.schema';

interface Described {
  fields?: Record<string, Described>;
  innerType?: Described | Described[];
}

function collectKeys(description: Described, into: Set<string>): void {
  for (const [key, field] of Object.entries(description.fields ?? {})) {
    into.add(key);
    collectKeys(field, into);
  }
  const inner = Array.isArray(description.innerType) ? description.innerType[0] : description.innerType;
  if (inner) collectKeys(inner, into);
}

/** Every field name the shared schemas declare, at any depth, plus the engine settings' `values` and prototype keys. */
export function schemaFieldNames(): string[] {
  const keys = new Set(['values', '__proto__', 'constructor', 'prototype']);
  for (const module of [auth, bike, catalogue, damperKind, damping, draft, quote, setupLog, shopData, shopSettings, sizingRecord, sizing, weighIn]) {
    for (const value of Object.values(module)) if (isSchema(value)) collectKeys(value.describe() as Described, keys);
  }
  return [...keys].sort();
}

/** SQL injection and script samples: OWASP Testing Guide v4.2, WSTG-INPV-05 and WSTG-INPV-01. */
export const SQL_LOOKING = ["' OR '1'='1", "'; DROP TABLE spring_rate; --", '" OR 1=1 --', "1; SELECT * FROM user --", "Robert'); DELETE FROM bike; --", "%' AND 1=0 UNION SELECT NULL --"];
export const SCRIPT_LOOKING = ['<script>alert(1)</script>', '<img src=x onerror=alert(1)>', '"><svg onload=alert(1)>', 'javascript:alert(1)'];

const trickyStrings = fc.constantFrom(
  ...SQL_LOOKING,
  ...SCRIPT_LOOKING,
  'NaN',
  'Infinity',
  '-Infinity',
  '1e309',
  '-0',
  '0x1F',
  '1_000',
  ' 12 ',
  '12,5',
  '',
  ' ',
  'null',
  'undefined',
  'true',
  '[]',
  '{}',
  '../../etc/passwd',
  '/etc/passwd',
  'C:\\Windows\\win.ini',
  'a\u0000b',
  '\u202egnp.csv',
  '\ud83d\ude00\u0301',
  '\ufeff',
  '=1+1',
  '@SUM(A1)',
  '2026-02-30T25:61:00Z',
  'x@y',
  '%00',
);

const hostileString = fc.oneof(
  { weight: 4, arbitrary: trickyStrings },
  { weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 30 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 30 }) },
  { weight: 1, arbitrary: fc.integer({ min: 300, max: 20_000 }).map((n) => 'x'.repeat(n)) },
);

const hostileNumber = fc.oneof(
  fc.integer(),
  fc.double(),
  fc.constantFrom(Number.MAX_SAFE_INTEGER + 2, 2 ** 63, 1e308, -1e308, Number.MIN_VALUE, -0, 0, -1, 0.1 + 0.2, 1e-320),
);

const hostileLeaf = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null));

/** An object nested `depth` levels, like `{"a":{"a":...}}`, or the same with arrays. */
const deepNesting = fc.tuple(fc.integer({ min: 20, max: 1500 }), fc.boolean()).map(([depth, arrays]) => {
  let value: unknown = 1;
  for (let i = 0; i < depth; i++) value = arrays ? [value] : { a: value };
  return value;
});

export function hostileValue(keys: string[]) {
  const key = fc.oneof({ weight: 5, arbitrary: fc.constantFrom(...keys) }, { weight: 1, arbitrary: hostileString });
  const { value } = fc.letrec((tie) => ({
    value: fc.oneof({ depthSize: 'small', withCrossShrink: true }, hostileLeaf, tie('array'), tie('object')),
    array: fc.array(tie('value'), { maxLength: 4 }),
    object: fc.dictionary(key, tie('value'), { maxKeys: 6 }),
  }));
  return fc.oneof({ weight: 6, arbitrary: value }, { weight: 1, arbitrary: deepNesting });
}

/** A body for a route: mostly objects keyed by schema names, sometimes an array or a bare value. */
export function hostileBody(keys: string[]) {
  const value = hostileValue(keys);
  return fc.oneof(
    { weight: 6, arbitrary: fc.dictionary(fc.constantFrom(...keys), value, { minKeys: 1, maxKeys: 8 }) },
    { weight: 1, arbitrary: fc.array(value, { maxLength: 3 }) },
    { weight: 1, arbitrary: value },
  );
}

/** A query string of schema names with hostile values, some repeated (Express then hands an array). */
export function hostileQuery(keys: string[]) {
  return fc
    .array(fc.tuple(fc.constantFrom(...keys), fc.oneof(hostileString, hostileNumber.map(String))), { minLength: 1, maxLength: 5 })
    .map((pairs) => new URLSearchParams(pairs).toString());
}

/** Bytes that are not JSON, sent as if they were. */
export const malformedJson = fc.oneof(
  fc.constantFrom('{', '{"a":', '{"a":1,}', "{'a':1}", '[1,2', 'NaN', 'undefined', '{"a":NaN}', '\u0000', '{"a":"\\u12"}', '{"__proto__":'),
  fc.string({ unit: 'binary', minLength: 1, maxLength: 40 }).filter((s) => {
    try {
      JSON.parse(s);
      return false;
    } catch {
      return true;
    }
  }),
);

/**
 * Percent-escapes that do not decode, for path parameters: cut short, a byte that is never UTF-8,
 * a lone %, % before letters that are not hex (RFC 3986 §2.1), an overlong "/" and a UTF-16
 * surrogate written in UTF-8 (both refused by RFC 3629 §3).
 */
export const BROKEN_ESCAPES = ['%E0%A4%A', '%ff', '%', '%zz', '%C0%AF', '%ED%A0%80'];

const plainJson = Buffer.from('{"email":"a@example.test","password":"long enough password"}');

/**
 * Bodies that are not what their Content-Encoding names (RFC 9110 §8.4.1; the codings body-parser
 * inflates): plain JSON labelled gzip, deflate and br, and a gzip stream cut short.
 */
export const MISLABELLED_BODIES: { encoding: string; raw: Buffer }[] = [
  { encoding: 'gzip', raw: plainJson },
  { encoding: 'deflate', raw: plainJson },
  { encoding: 'br', raw: plainJson },
  { encoding: 'gzip', raw: gzipSync(plainJson).subarray(0, 20) },
];
