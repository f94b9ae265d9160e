// Bad input for API fuzzing (fast-check): malformed JSON bodies made by mutating a valid one,
// hostile values, raw bodies that are not JSON, raw multipart bodies, and the check every answer
// must pass. Used by __tests__/server/fuzz-writes.test.ts.
import fc from 'fast-check';

import { errorBodySchema } from '@/shared/errors';

/** A JSON value; objects may carry own keys such as "__proto__" (set with defineProperty). */
export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Keys that pollute prototypes or shadow built-ins when code copies them carelessly. */
const PROTO_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'valueOf', 'hasOwnProperty', '__defineGetter__'] as const;

/** Text that has broken servers before: SQL and template injection, NUL, odd unicode, numbers as text. */
const NASTY_STRINGS = [
  '',
  ' ',
  '\t\n',
  "'; DROP TABLE baths; --",
  "' OR '1'='1",
  '" OR ""="',
  '$$',
  '$1',
  '\\x00',
  '\u0000',
  'a\u0000b',
  '%',
  '_',
  '%00',
  '%s%s%n',
  '${7*7}',
  '{{7*7}}',
  '<script>alert(1)</script>',
  '../../../../etc/passwd',
  '\u202eevil',
  '\ud800',
  '\udfff\ud800',
  '\ufeff',
  '\u200b',
  'e\u0301',
  '🧪⚗️',
  'NaN',
  'Infinity',
  '-Infinity',
  '1e309',
  '-0',
  '0x10',
  '1,5',
  ' 42 ',
  '1_000',
  '99999999999999999999',
  'null',
  'undefined',
  'true',
  '[]',
  '{}',
  '__proto__',
  'constructor',
] as const;

// Number tokens JSON can carry that a double (or an integer column) cannot hold; put into the
// JSON text raw, through a marker string, as deep nesting is.
const RAW_NUMBERS = ['1e400', '-1e400', '1e-400', '-0', '123456789012345678901234567890', '0.30000000000000004', '2147483648', '9007199254740993'];
const RAW = '\u0001raw:';

function defineKey(target: Record<string, Json>, key: string, value: Json): void {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}

/** Nested arrays or objects `depth` levels deep. */
function nested(depth: number, kind: 'array' | 'object'): Json {
  let v: Json = 1;
  for (let i = 0; i < depth; i++) {
    if (kind === 'array') v = [v];
    else {
      const o: Record<string, Json> = {};
      defineKey(o, 'a', v);
      v = o;
    }
  }
  return v;
}

const keyArb: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...PROTO_KEYS) },
  { weight: 1, arbitrary: fc.constantFrom('', ' ', '0', 'a.b', '$where', '$gt', "'; DROP TABLE baths; --", '\u0000', 'Ag+', 'id', 'role', 'roles', 'isAdmin') },
  { weight: 2, arbitrary: fc.string({ maxLength: 12 }) },
);

/** Hostile text: injection, NUL, lone surrogates, odd unicode, numbers and words as text, huge strings. */
const nastyTextArb: fc.Arbitrary<Json> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom<Json>(...NASTY_STRINGS) },
  { weight: 2, arbitrary: fc.string({ maxLength: 40 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 20 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'binary-ascii', maxLength: 20 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 20 }) },
  { weight: 1, arbitrary: fc.constantFrom(5_000, 30_000, 95_000).map((n) => 'x'.repeat(n)) },
  { weight: 1, arbitrary: fc.constant('é'.repeat(20_000)) },
);

/** Hostile numbers: out of range, beyond integer columns and doubles, negative zero, and numbers as text. */
const nastyNumberArb: fc.Arbitrary<Json> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<Json>(0, -1, 1.5, -1e308, 1e308, 2 ** 31, -(2 ** 31) - 1, 2 ** 53 + 2, 99_999_999_999, 5e-324, -273.15) },
  { weight: 2, arbitrary: fc.constantFrom(...RAW_NUMBERS).map((n) => `${RAW}${n}`) },
  { weight: 2, arbitrary: fc.integer() },
  { weight: 2, arbitrary: fc.double().map((n) => (Number.isFinite(n) ? n : String(n))) },
  { weight: 1, arbitrary: fc.constantFrom<Json>('NaN', 'Infinity', '1e309', '12', ' 12 ', '0x10', '1,5', '-0', '') },
);

const scalarArb: fc.Arbitrary<Json> = fc.oneof(
  { weight: 6, arbitrary: nastyTextArb },
  { weight: 4, arbitrary: nastyNumberArb },
  { weight: 1, arbitrary: fc.constantFrom<Json>(null, true, false) },
);

/** A hostile value: a scalar, a small array or object (prototype keys included), or deep nesting. */
const nastyArb: fc.Arbitrary<Json> = fc.oneof(
  { weight: 10, arbitrary: scalarArb },
  { weight: 2, arbitrary: fc.array(scalarArb, { maxLength: 4 }) },
  {
    weight: 2,
    arbitrary: fc.array(fc.tuple(keyArb, scalarArb), { maxLength: 4 }).map((entries) => {
      const o: Record<string, Json> = {};
      for (const [k, v] of entries) defineKey(o, k, v);
      return o;
    }),
  },
  { weight: 1, arbitrary: fc.tuple(fc.integer({ min: 20, max: 1_000 }), fc.constantFrom('array' as const, 'object' as const)).map(([d, k]) => nested(d, k)) },
  // Deeper than JSON.stringify can go: spliced into the text as a marker, like the raw numbers.
  { weight: 1, arbitrary: fc.tuple(fc.integer({ min: 5_000, max: 19_000 }), fc.constantFrom('array', 'object')).map(([d, k]) => `${RAW}deep-${k}-${d}`) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json> },
);

type Path = (string | number)[];

/** Every path into a value (objects and arrays), the root excluded. */
function pathsOf(value: Json, prefix: Path = []): Path[] {
  if (value === null || typeof value !== 'object') return [];
  const out: Path[] = [];
  const entries: [string | number, Json][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  for (const [k, v] of entries) {
    const p = [...prefix, k];
    out.push(p, ...pathsOf(v, p));
  }
  return out;
}

function clone(v: Json): Json {
  // JSON.parse makes "__proto__" an own key again, so a prototype key put in a body survives.
  return JSON.parse(JSON.stringify(v)) as Json;
}

type Mutation =
  | { kind: 'replace'; at: Path; value: Json }
  | { kind: 'delete'; at: Path }
  | { kind: 'extra'; at: Path; key: string; value: Json }
  | { kind: 'numbers-as-strings' };

function parentOf(root: Json, at: Path): Json | undefined {
  let node: Json | undefined = root;
  for (const k of at.slice(0, -1)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, Json>)[k];
  }
  return node;
}

function stringifyNumbers(v: Json): Json {
  if (typeof v === 'number') return String(v);
  if (Array.isArray(v)) return v.map(stringifyNumbers);
  if (v && typeof v === 'object') {
    const o: Record<string, Json> = {};
    for (const [k, x] of Object.entries(v)) defineKey(o, k, stringifyNumbers(x));
    return o;
  }
  return v;
}

function mutate(root: Json, m: Mutation): Json {
  if (m.kind === 'numbers-as-strings') return stringifyNumbers(root);
  if (m.at.length === 0 && m.kind === 'replace') return m.value;
  const parent = m.kind === 'extra' ? parentOf(root, [...m.at, '']) : parentOf(root, m.at);
  if (parent === null || parent === undefined || typeof parent !== 'object') return root;
  if (m.kind === 'extra') {
    if (!Array.isArray(parent)) defineKey(parent as Record<string, Json>, m.key, m.value);
    return root;
  }
  const key = m.at[m.at.length - 1] as string | number;
  if (m.kind === 'delete') {
    if (Array.isArray(parent)) parent.splice(Number(key), 1);
    else delete (parent as Record<string, Json>)[key];
  } else if (Array.isArray(parent)) parent[Number(key)] = m.value;
  else defineKey(parent as Record<string, Json>, String(key), m.value);
  return root;
}

function rawText(token: string): string {
  const deep = /^deep-(array|object)-(\d+)$/.exec(token);
  if (!deep) return token;
  const n = Number(deep[2]);
  return deep[1] === 'array' ? `${'['.repeat(n)}1${']'.repeat(n)}` : `${'{"a":'.repeat(n)}1${'}'.repeat(n)}`;
}

/** The JSON text of a value, with the raw markers put back as bare number tokens or deep nesting. */
function toJsonText(v: Json): string {
  return JSON.stringify(v).replace(/"\\u0001raw:([^"]+)"/g, (_m, token: string) => rawText(token));
}

/** One fuzzed JSON body: the text sent, and whether it is an object naming a field the route knows. */
export type FuzzBody = { text: string; namesKnownField: boolean };

/** Whether a body is a plain object holding at least one of the template's top-level keys. */
export function namesKnownField(body: Json, template: Json): boolean {
  if (body === null || typeof body !== 'object' || Array.isArray(body)) return false;
  if (template === null || typeof template !== 'object' || Array.isArray(template)) return false;
  return Object.keys(body).some((k) => Object.prototype.hasOwnProperty.call(template, k));
}

function valueAt(root: Json, at: Path): Json | undefined {
  return parentOf(root, [...at, '']) as Json | undefined;
}

/** A hostile value of the same kind as the one it replaces (text for text, a number for a number). */
function sameKindArb(original: Json | undefined): fc.Arbitrary<Json> {
  if (typeof original === 'string') return nastyTextArb;
  if (typeof original === 'number') return nastyNumberArb;
  if (typeof original === 'boolean') return fc.constantFrom<Json>('true', 'false', 1, 0, null, 'yes');
  return nastyArb;
}

/**
 * Malformed bodies made from a valid `template`: mostly one mutation (a value of the same kind
 * or of any kind, a field left out, an extra key, numbers sent as text), sometimes two or three,
 * a hostile whole body, the template in an array, or the template itself.
 */
export function bodyArb(template: Json): fc.Arbitrary<FuzzBody> {
  const paths = pathsOf(template);
  const objectPaths: Path[] = [[], ...paths.filter((p) => {
    const v = valueAt(template, p);
    return v !== null && typeof v === 'object' && !Array.isArray(v);
  })];
  const pathArb = paths.length > 0 ? fc.constantFrom(...paths) : fc.constant<Path>([]);
  const mutation: fc.Arbitrary<Mutation> = fc.oneof(
    { weight: 5, arbitrary: pathArb.chain((at) => sameKindArb(valueAt(template, at)).map((value) => ({ kind: 'replace' as const, at, value }))) },
    { weight: 3, arbitrary: fc.record({ kind: fc.constant('replace' as const), at: pathArb, value: nastyArb }) },
    { weight: 2, arbitrary: fc.record({ kind: fc.constant('delete' as const), at: pathArb }) },
    { weight: 2, arbitrary: fc.record({ kind: fc.constant('extra' as const), at: fc.constantFrom(...objectPaths), key: keyArb, value: nastyArb }) },
    { weight: 1, arbitrary: fc.constant({ kind: 'numbers-as-strings' as const }) },
  );
  const apply = (ms: Mutation[]) => ms.reduce((acc, m) => mutate(acc, m), clone(template));
  const body: fc.Arbitrary<Json> = fc.oneof(
    { weight: 10, arbitrary: mutation.map((m) => apply([m])) },
    { weight: 3, arbitrary: fc.array(mutation, { minLength: 2, maxLength: 3 }).map(apply) },
    { weight: 2, arbitrary: nastyArb },
    { weight: 1, arbitrary: fc.constant(template).map(clone) },
    { weight: 1, arbitrary: fc.constant(template).map((t) => [clone(t)]) },
  );
  return body.map((b) => ({ text: toJsonText(b), namesKnownField: namesKnownField(b, template) }));
}

// The systematic pass: each of these in each field of its kind, once.
const WORST_TEXT: Json[] = ['\u0000', 'a\u0000b', '\ud800', 'ok\udc00', "'; DROP TABLE baths; --", "' OR '1'='1", '$$', '\\x00', 'x'.repeat(20_000)];
const WORST_NUMBERS: Json[] = ['1e400', '-1e400', '1e-400', '-0', '2147483648', '99999999999', '9007199254740993'].map((n) => `${RAW}${n}`).concat(['NaN', '12']);
const WORST_KEYS: [string, Json][] = [
  ['__proto__', { admin: true }],
  ['constructor', { prototype: { admin: true } }],
  ['\u0000', 1],
  ['\ud800', 1],
  ['deep', `${RAW}deep-object-8000`],
  ['x', 'a\u0000b'],
];

/** Every field of the template with each of the worst values of its kind, and each object with the worst extra keys. */
export function worstBodies(template: Json): FuzzBody[] {
  const out: Json[] = [];
  for (const at of pathsOf(template)) {
    const v = valueAt(template, at);
    const worst = typeof v === 'string' ? WORST_TEXT : typeof v === 'number' ? WORST_NUMBERS : typeof v === 'boolean' ? ['true', null] : [];
    for (const value of worst) out.push(mutate(clone(template), { kind: 'replace', at, value }));
  }
  const objects: Path[] = [[], ...pathsOf(template).filter((p) => {
    const v = valueAt(template, p);
    return v !== null && typeof v === 'object' && !Array.isArray(v);
  })];
  if (template !== null && typeof template === 'object' && !Array.isArray(template)) {
    for (const at of objects) for (const [key, value] of WORST_KEYS) out.push(mutate(clone(template), { kind: 'extra', at, key, value }));
  }
  return out.map((b) => ({ text: toJsonText(b), namesKnownField: namesKnownField(b, template) }));
}

/** A raw body sent with a content type (and maybe an encoding) that the API does not take as JSON. */
export type RawBody = { name: string; contentType?: string; encoding?: string; body: string | Buffer; expectInvalidJson?: boolean };

/** Bodies that are not JSON, or JSON under the wrong type: each route must answer a 4xx or take it as no body. */
export const RAW_BODIES: RawBody[] = [
  { name: 'truncated JSON', contentType: 'application/json', body: '{"name":', expectInvalidJson: true },
  { name: 'not JSON at all', contentType: 'application/json', body: 'name=silver', expectInvalidJson: true },
  { name: 'bare null (strict JSON takes objects and arrays only)', contentType: 'application/json', body: 'null', expectInvalidJson: true },
  { name: 'a bare string', contentType: 'application/json', body: '"silver"', expectInvalidJson: true },
  { name: 'NaN in JSON', contentType: 'application/json', body: '{"volume": NaN}', expectInvalidJson: true },
  { name: 'single quotes', contentType: 'application/json', body: "{'name': 'x'}", expectInvalidJson: true },
  { name: 'trailing garbage', contentType: 'application/json', body: '{"name":"x"}}', expectInvalidJson: true },
  { name: 'a NUL byte', contentType: 'application/json', body: '\u0000', expectInvalidJson: true },
  // Read with replacement characters, this is the valid JSON {"\ufffd\ufffd": 1}.
  { name: 'invalid UTF-8', contentType: 'application/json', body: Buffer.from([0x7b, 0x22, 0xff, 0xfe, 0x22, 0x3a, 0x31, 0x7d]) },
  { name: 'empty JSON body', contentType: 'application/json', body: '' },
  { name: 'JSON sent as text/plain', contentType: 'text/plain', body: '{"name":"x"}' },
  { name: 'a form post', contentType: 'application/x-www-form-urlencoded', body: 'name=x&__proto__[admin]=1&constructor[prototype][admin]=1' },
  { name: 'XML', contentType: 'application/xml', body: '<?xml version="1.0"?><!DOCTYPE a [<!ENTITY x SYSTEM "file:///etc/passwd">]><a>&x;</a>' },
  { name: 'no content type', body: '{"name":"x"}' },
  { name: 'a charset JSON cannot be read in', contentType: 'application/json; charset=utf-7', body: '{"name":"x"}' },
  { name: 'gzip that is not gzip', contentType: 'application/json', encoding: 'gzip', body: 'not gzip at all' },
  { name: 'an unknown content encoding', contentType: 'application/json', encoding: 'compress', body: '{}' },
  { name: 'multipart without a boundary', contentType: 'multipart/form-data', body: 'garbage' },
  { name: 'multipart with garbage', contentType: 'multipart/form-data; boundary=XyZ', body: 'this is not multipart' },
  { name: 'multipart cut off', contentType: 'multipart/form-data; boundary=XyZ', body: '--XyZ\r\nContent-Disposition: form-data; name="mode"\r\n\r\nall' },
];

/** One part of a hand-made multipart body. */
export type Part = { name: string; filename?: string; type?: string; content: Uint8Array };

const encode = (text: string) => new TextEncoder().encode(text);

/** Hand-made multipart: the parts, and how the body is broken ("none": it is not). */
export function multipartBody(parts: Part[], boundary = 'XyZ', breakage = 'none', cutAt = 0): { contentType: string; body: Buffer } {
  const chunks: Buffer[] = [];
  for (const p of parts) {
    const disposition = p.filename === undefined ? `form-data; name="${p.name}"` : `form-data; name="${p.name}"; filename="${p.filename}"`;
    const head = `--${boundary}\r\nContent-Disposition: ${disposition}\r\n${p.type ? `Content-Type: ${p.type}\r\n` : ''}${breakage === 'no-header-end' ? '' : '\r\n'}`;
    chunks.push(Buffer.from(head, 'utf8'), Buffer.from(p.content), Buffer.from('\r\n'));
  }
  if (breakage !== 'no-final') chunks.push(Buffer.from(`--${boundary}--\r\n`));
  let body = Buffer.concat(chunks);
  if (breakage === 'cut' && body.length > 0) body = body.subarray(0, cutAt % body.length);
  const said = breakage === 'wrong-boundary' ? `${boundary}-other` : boundary;
  return { contentType: `multipart/form-data; boundary=${said.includes(' ') ? `"${said}"` : said}`, body };
}

const FILE_NAMES = ['results.csv', 'results.txt', 'report.pdf', 'scan.png', 'photo.jpg', 'a.exe', '../../../etc/passwd', '', '.csv', 'x"y.csv', 'nul\u0000.csv', 'é.csv', `${'a'.repeat(300)}.csv`, 'Assay 2026.11.20'];

const partArb: fc.Arbitrary<Part> = fc.record(
  {
    name: fc.oneof(fc.constantFrom('file', 'file', 'mode', 'title', '', '__proto__', 'file[]', 'mode[]', 'title[a]'), fc.string({ maxLength: 8 })),
    filename: fc.oneof(fc.constantFrom(...FILE_NAMES), fc.string({ maxLength: 20 })),
    type: fc.constantFrom('text/csv', 'application/pdf', 'image/png', 'application/octet-stream', 'application/x-msdownload', 'text/html', ''),
    content: fc.oneof(
      fc.uint8Array({ maxLength: 200 }),
      fc.constantFrom('sampled_at,analyst,ph\n2026-11-20,A,7\n', 'kind,reaction,log_value,source\nbeta,Ag+ + 2 NH3 = Ag(NH3)2+,7.2,Fuzz\n', '%PDF-1.4\n%%EOF\n', 'all', 'valid', '', "'; DROP TABLE baths; --").map(encode),
    ),
  },
  { requiredKeys: ['name', 'content'] },
);

/** A multipart body of random parts: well-formed, or broken in one of several ways. */
export const multipartArb: fc.Arbitrary<{ contentType: string; body: Buffer }> = fc
  .record({
    parts: fc.array(partArb, { maxLength: 4 }),
    boundary: fc.constantFrom('XyZ', '----fuzz', 'a'.repeat(70), 'x y'),
    breakage: fc.constantFrom('none', 'none', 'no-final', 'cut', 'wrong-boundary', 'no-header-end'),
    cutAt: fc.nat(),
  })
  .map(({ parts, boundary, breakage, cutAt }) => multipartBody(parts, boundary, breakage, cutAt));

/** A CSV cell: usually plausible for its column, sometimes hostile. */
function cellArb(plausible: string): fc.Arbitrary<string> {
  return fc.oneof(
    { weight: 4, arbitrary: fc.constant(plausible) },
    { weight: 2, arbitrary: nastyTextArb.map((v) => String(v).slice(0, 300)) },
    { weight: 1, arbitrary: nastyNumberArb.map((v) => String(v).replace(RAW, '')) },
  );
}

function csvCell(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * A CSV file of a few rows under `columns` (name -> a plausible value): columns dropped, added or
 * repeated, hostile cells, a BOM, CRLF or LF, a quote left open.
 */
function csvArb(columns: Record<string, string>): fc.Arbitrary<Uint8Array> {
  const names = Object.keys(columns);
  const header = fc.oneof(
    { weight: 4, arbitrary: fc.constant(names) },
    { weight: 1, arbitrary: fc.subarray(names) },
    { weight: 1, arbitrary: fc.constantFrom(...names).map((extra) => [...names, extra, 'unknown column']) },
  );
  return fc
    .record({
      header,
      rows: fc.array(fc.tuple(...names.map((n) => cellArb(columns[n] as string))), { maxLength: 4 }),
      eol: fc.constantFrom('\n', '\r\n'),
      bom: fc.boolean(),
      openQuote: fc.boolean(),
    })
    .map(({ header: cols, rows, eol, bom, openQuote }) => {
      const lines = [cols.join(','), ...rows.map((r) => cols.map((c) => csvCell(r[names.indexOf(c)] ?? '')).join(','))];
      const text = `${bom ? '\ufeff' : ''}${lines.join(eol)}${openQuote ? `${eol}"open` : eol}`;
      return encode(text);
    });
}

/** The first bytes of the accepted attachment types, a Windows program, and nothing in particular. */
const FILE_STARTS: Uint8Array[] = [
  encode('%PDF-1.4\n'),
  Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
  Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]),
  encode('MZ\u0090\u0000'),
  encode('<html><script>alert(1)</script>'),
  new Uint8Array(0),
];

/** An attachment upload: a file (by its first bytes) under some name, and a title. */
export const attachmentPartsArb: fc.Arbitrary<Part[]> = fc
  .record({
    start: fc.constantFrom(...FILE_STARTS),
    tail: fc.uint8Array({ maxLength: 300 }),
    filename: fc.oneof(fc.constantFrom(...FILE_NAMES), fc.string({ maxLength: 30 })),
    type: fc.constantFrom('application/pdf', 'image/png', 'image/jpeg', 'application/octet-stream', 'text/html'),
    title: fc.option(nastyTextArb.map((v) => String(v).slice(0, 500))),
  })
  .map(({ start, tail, filename, type, title }) => {
    const parts: Part[] = [{ name: 'file', filename, type, content: Buffer.concat([start, tail]) }];
    if (title !== null) parts.unshift({ name: 'title', content: encode(title) });
    return parts;
  });

/** A CSV upload: the file under a name, and a mode field (or none). */
export function csvPartsArb(columns: Record<string, string>): fc.Arbitrary<Part[]> {
  return fc
    .record({
      csv: csvArb(columns),
      filename: fc.oneof({ weight: 4, arbitrary: fc.constantFrom('results.csv', 'results.txt', 'RESULTS.CSV') }, { weight: 1, arbitrary: fc.constantFrom(...FILE_NAMES) }),
      mode: fc.option(fc.oneof(fc.constantFrom('all', 'valid'), nastyTextArb.map((v) => String(v).slice(0, 100)))),
    })
    .map(({ csv, filename, mode }) => {
      const parts: Part[] = [{ name: 'file', filename, type: 'text/csv', content: csv }];
      if (mode !== null) parts.unshift({ name: 'mode', content: encode(mode) });
      return parts;
    });
}

/** What a sent request looked like, for the check and for the failure message. */
export type Sent = { route: string; url: string; what: string; namesKnownField: boolean };

type Answer = { status: number; body: unknown; text?: string };

function isUploadReport(d: unknown): boolean {
  const problems = (d as { problems?: unknown } | null)?.problems;
  return Array.isArray(problems) && problems.every((p) => typeof p?.row === 'number' && (typeof p?.column === 'string' || p?.column === null) && typeof p?.message === 'string');
}

/**
 * Why an answer breaks the API's promises, or null when it keeps them:
 * - never a 5xx (nor a 1xx or 3xx);
 * - a 4xx has the one error shape and no stack trace;
 * - a validation_failed names the field: details is a list of {path, message} (or, for a CSV
 *   upload refused by its rows, the upload report with row and column per problem). The first
 *   path may be empty only when the body names none of the route's fields: the body as a whole
 *   is wrong (not an object, an array, absent, or an object of unknown keys only), so there is no
 *   field to point at.
 */
export function answerProblem(res: Answer, sent: Sent): string | null {
  const { status } = res;
  if (status >= 500) return `${status} ${JSON.stringify(res.body).slice(0, 200)}`;
  if (status < 200 || (status >= 300 && status < 400)) return `unexpected status ${status}`;
  if (status < 300) return null;
  const parsed = errorBodySchema.safeParse(res.body);
  if (!parsed.success) return `${status} without the error shape: ${(res.text ?? JSON.stringify(res.body)).slice(0, 200)}`;
  if (/\bat .+\.(ts|js):\d+/.test(JSON.stringify(res.body))) return `${status} with a stack trace`;
  const { code, details } = parsed.data.error;
  if (code !== 'validation_failed') return null;
  if (isUploadReport(details)) return null;
  if (!Array.isArray(details) || details.length === 0) return `${status} validation_failed without details`;
  const first = details[0] as { path?: unknown; message?: unknown };
  if (typeof first.path !== 'string' || typeof first.message !== 'string') return `${status} validation_failed whose details[0] is not {path, message}`;
  if (first.path === '' && sent.namesKnownField) return `${status} validation_failed naming no field ("${parsed.data.error.message}")`;
  return null;
}

/** A short, printable description of a body for failure messages. */
export function brief(text: string | Buffer, max = 240): string {
  const s = typeof text === 'string' ? text : `<${text.length} bytes> ${text.subarray(0, 80).toString('latin1')}`;
  const shown = s.length > max ? `${s.slice(0, max)}… (${s.length} chars)` : s;
  return JSON.stringify(shown);
}
