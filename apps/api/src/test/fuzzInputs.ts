import fc from 'fast-check';

/** Strings shaped like SQL injection and other hostile text (common practice, from memory). */
export const injections = [
  "' OR 1=1 --",
  "' OR '1'='1",
  '1 OR 1=1',
  '1; DROP TABLE die_requests',
  "Robert'); DROP TABLE users; --",
  "1' AND pg_sleep(1) --",
  "' UNION SELECT password_hash FROM users --",
  '%27%3B',
  '\\x00',
  '\u0000',
  '$1',
  '?',
  '%',
  '_',
  '\\',
  '__proto__',
  'constructor',
  '<script>alert(1)</script>',
] as const;

/** Text a database or a parser may choke on, for the text fields of a body. */
const hostileText = fc.constantFrom(
  '\u0000',
  'a\u0000b',
  '\ud800',
  'a\udfffb',
  "' OR 1=1 --",
  "Robert'); DROP TABLE users; --",
  '%_\\',
  'x'.repeat(5_000),
  '漢字 🚀 ø',
);

/** UTF-16 code units one by one: NUL, lone surrogates and everything else a client can send. */
const anyCodeUnits = fc.string({
  unit: fc.integer({ min: 0, max: 0xffff }).map((u) => String.fromCharCode(u)),
  maxLength: 12,
});

/** Text a URL can carry: encodeURIComponent refuses a lone surrogate. */
const encodable = (s: string) => {
  try {
    encodeURIComponent(s);
    return true;
  } catch {
    return false;
  }
};

/** Dates and instants, real, impossible and out of range. */
const oddDates = [
  '2026-02-30',
  '2026-13-01',
  '0000-01-01',
  '9999-12-31',
  '275760-09-14',
  '2026-1-1',
  '1970-01-01T00:00:00Z',
  '2026-12-01T25:61:00+00:00',
];

/**
 * Dates at and past the edges: PostgreSQL has no year 0 (ISO 8601's 0000 is 1 BC) and refuses it;
 * the schemas take 1900-01-01 to 2200-12-31. Offsets move an instant across the edge.
 */
export const extremeDates = [
  '0000-01-01',
  '0000-01-01T00:00:00Z',
  '0000-12-31T23:59:59-14:00',
  '0001-01-01',
  '1899-12-31',
  '1899-12-31T23:59:59Z',
  '1900-01-01',
  '1900-01-01T00:00:00+14:00',
  '2200-12-31',
  '2200-12-31T23:59:59-14:00',
  '2201-01-01',
  '9999-12-31',
  '9999-12-31T23:59:59+00:00',
];

/** Numbers at and past the edges of the columns they land in (PostgreSQL integer is 4 bytes). */
const edgeNumbers = [
  0,
  -0,
  -1,
  0.5,
  1e-9,
  2_147_483_647,
  2_147_483_648,
  9_999_999_999_999,
  Number.MAX_SAFE_INTEGER,
  1e308,
  -1e308,
];

/** One bad value of any JSON type. */
export const junk: fc.Arbitrary<unknown> = fc.oneof(
  {
    weight: 4,
    arbitrary: fc.constantFrom<unknown>(
      ...injections,
      ...oddDates,
      ...edgeNumbers,
      'x'.repeat(5_000),
      '',
      ' ',
      null,
      true,
      false,
      [],
      {},
    ),
  },
  fc.string({ maxLength: 40 }),
  anyCodeUnits,
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.array(fc.jsonValue({ maxDepth: 1 }), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.jsonValue({ maxDepth: 1 }), { maxKeys: 3 }),
);

type Path = Array<string | number>;

/** Every path into a JSON value: each key and index at every depth. */
function pathsOf(value: unknown, prefix: Path = []): Path[] {
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => {
    const path = [...prefix, Array.isArray(value) ? Number(k) : k];
    return [path, ...pathsOf(v, path)];
  });
}

const valueAt = (value: unknown, path: Path): unknown =>
  path.reduce<unknown>((at, key) => (at as Record<string | number, unknown>)?.[key], value);

/** A copy of `value` with the value at `path` replaced, or removed when `to` is undefined. */
function replaceAt(value: unknown, path: Path, to: unknown): unknown {
  const copy = structuredClone(value) as Record<string | number, unknown>;
  let at = copy;
  for (const key of path.slice(0, -1)) at = at[key] as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  if (to === undefined && !Array.isArray(at)) delete at[last];
  else at[last] = to;
  return copy;
}

/**
 * A well-formed body with one field (at any depth) replaced by junk or left out, so that every
 * other field passes and the broken one is checked by the code behind it. `keys` adds the
 * schema's optional fields that the example leaves out.
 */
export function oneFieldBroken(example: object, keys: string[] = []): fc.Arbitrary<unknown> {
  const paths = [...pathsOf(example), ...keys.filter((k) => !(k in example)).map((k) => [k])];
  if (!paths.length) return fc.constant(example);
  return fc.constantFrom(...paths).chain((path) => {
    // Text gets hostile text, and numbers edge numbers, as often as junk of other kinds.
    const was = typeof valueAt(example, path);
    const bad =
      was === 'string'
        ? fc.oneof(hostileText, junk)
        : was === 'number'
          ? fc.oneof(fc.constantFrom(...edgeNumbers), junk)
          : junk;
    return fc.option(bad, { nil: undefined, freq: 6 }).map((to) => replaceAt(example, path, to));
  });
}

/** Values of a field's own type that pass most checks, yet may break the code that stores them. */
const typedEdges = (value: unknown): unknown[] =>
  typeof value === 'string'
    ? ['a\u0000b', 'a\ud800b']
    : typeof value === 'number'
      ? [2_147_483_648, Number.MAX_SAFE_INTEGER]
      : [];

/** The empty body, then the example with each field in turn set to each edge of its type. */
export const edgeBodies = (example: object): unknown[] => [
  {},
  ...pathsOf(example).flatMap((path) =>
    typedEdges(valueAt(example, path)).map((edge) => replaceAt(example, path, edge)),
  ),
];

/** Any JSON at all, and objects of real field names with junk in them. */
export const anyJson = (keys: string[]): fc.Arbitrary<unknown> =>
  fc.oneof(
    fc.jsonValue({ maxDepth: 3 }),
    keys.length
      ? fc.dictionary(fc.constantFrom(...keys), junk, { maxKeys: 5 })
      : fc.dictionary(fc.string(), junk, { maxKeys: 3 }),
  );

/** What a JSON route is sent: mostly its own body with one field broken, else any JSON. */
export const jsonBody = (example: object, keys: string[] = []): fc.Arbitrary<unknown> =>
  fc.oneof(
    { weight: 3, arbitrary: oneFieldBroken(example, keys) },
    { weight: 1, arbitrary: anyJson([...new Set([...Object.keys(example), ...keys])]) },
    { weight: 1, arbitrary: fc.constant(example) },
  );

/** What parseId would take for a record's id (a positive 4-byte integer, as Number() reads it). */
const readsAsId = (s: string) => {
  const n = Number(s);
  return Number.isSafeInteger(n) && n > 0 && n <= 2_147_483_647;
};

/**
 * A junk `:id` as it goes in the URL: raw escapes that cannot be decoded, and encoded strings and
 * numbers that are no record's id. 2147483647 reads as an id, but no test makes that many records.
 */
export const pathJunk: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom('%', '%zz', '%E0%A4%A', '%00', '%2e%2e', '1%20OR%201=1', '%C0%AF', '2147483647'),
  fc
    .constantFrom<string>(
      ...injections,
      '-1',
      '0',
      '1.5',
      '1e400',
      '9999999999999',
      'NaN',
      'Infinity',
      'null',
      'ø',
      '漢字',
      '🚀',
    )
    .map(encodeURIComponent),
  fc
    .oneof(fc.integer({ max: 0 }), fc.bigInt({ min: 2n ** 31n, max: 10n ** 20n }), fc.double({ noInteger: true }))
    .map(String),
  fc
    .oneof(
      fc.string({ minLength: 1 }),
      anyCodeUnits.filter((s) => s.length > 0),
    )
    .filter((s) => !readsAsId(s) && encodable(s))
    .map(encodeURIComponent),
);

/** Every filter is tried with each of these: injection-shaped text and numbers past the id column. */
export const queryEdges = [...injections, '2147483648', '9999999999999', '-1', '1e400', '0x10', ''];

/** A query-string value: injection-shaped, odd or random, at times repeated into an array. */
export const queryValue: fc.Arbitrary<string[]> = fc.oneof(
  fc
    .constantFrom<string>(
      ...injections,
      ...oddDates,
      ...edgeNumbers.map(String),
      '',
      'true',
      'cut,crease,zz',
      'x'.repeat(500),
    )
    .map((v) => [v]),
  fc
    .oneof(
      fc.string({ maxLength: 20 }),
      anyCodeUnits.filter(encodable),
      fc.integer().map(String),
      fc.double().map(String),
    )
    .map((v) => [v]),
  fc.array(fc.constantFrom<string>(...injections), { minLength: 2, maxLength: 3 }),
);

/** A query string over the given filter keys, each value encoded as a browser would. */
export const queryString = (keys: string[]): fc.Arbitrary<string> =>
  fc.dictionary(fc.constantFrom(...keys), queryValue, { minKeys: 1, maxKeys: Math.min(4, keys.length) }).map((q) =>
    Object.entries(q)
      .flatMap(([k, vs]) => vs.map((v) => `${k}=${encodeURIComponent(v)}`))
      .join('&'),
  );

/** Junk as text, for a form field or a CSV cell. */
export const junkText = junk.map((v) => (typeof v === 'string' ? v : JSON.stringify(v)));

/** CSV text: a header of real column names, then rows of odd cells (quotes, commas, blanks). */
export const csvText = (headers: string[]): fc.Arbitrary<string> => {
  const cell = fc.oneof(
    fc.constantFrom('2026-03-02', '1,185.00', '"unclosed', '""', '-4', '2.5', 'abc', ''),
    fc.string({ maxLength: 12 }),
    junkText,
  );
  return fc
    .tuple(
      fc.subarray(headers, { minLength: 1 }),
      fc.array(fc.array(cell, { maxLength: 8 }), { maxLength: 6 }),
      fc.constantFrom('\n', '\r\n', '\r'),
    )
    .map(([head, rows, eol]) => [head.join(','), ...rows.map((r) => r.join(','))].join(eol));
};
