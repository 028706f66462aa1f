// fast-check bodies for the endpoint fuzz: random JSON, mutations of a valid body, and hostile raw text.
import fc from 'fast-check';

export interface FuzzRequest {
  kind: string;
  raw: string;
  contentType: string;
}

const json = (kind: string, value: unknown): FuzzRequest => ({ kind, raw: JSON.stringify(value) ?? 'null', contentType: 'application/json' });

const PROTO_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf'];

// Values of the wrong type or at the edges of numbers and strings.
const wrongValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(null, true, false, 0, -1, -0, 1e308, -1e308, 2 ** 53 + 1, 0.1, 1e-320, '', ' ', 'NaN', 'Infinity', '-1', '1e400', '0x10', [], {}, [null], { '': '' }),
  fc.string({ maxLength: 20 }),
  fc.integer(),
  fc.double(),
  fc.array(fc.integer(), { maxLength: 3 }),
  fc.constantFrom('H2(g) ->', '-> H2O(l)', '2 2 H2(g) -> 4 H', 'H2(g) + O2(g) -> H2O(l) -> H2O(g)', '((((H2))))(g) -> X', 'Na+(aq) + Cl-(aq) -> NaCl(s)', '\u0000', '\u{1F600}', '<script>x</script>', "'; DROP TABLE routes; --"),
);

const hugeString = fc.constantFrom(10_000, 100_000, 300_000).map((n) => 'Ħ'.repeat(n / 2));
const nested = (depth: number, leaf: unknown): unknown => {
  let value = leaf;
  for (let i = 0; i < depth; i += 1) value = i % 2 ? { a: value } : [value];
  return value;
};

type Path = Array<string | number>;
function pathsOf(value: unknown, prefix: Path = [], out: Path[] = []): Path[] {
  if (prefix.length) out.push(prefix);
  if (value && typeof value === 'object' && prefix.length < 6) {
    for (const [k, v] of Object.entries(value)) pathsOf(v, [...prefix, Array.isArray(value) ? Number(k) : k], out);
  }
  return out;
}

function mutateAt(root: unknown, path: Path, edit: (parent: Record<string | number, unknown>, key: string | number) => void): unknown {
  const copy = structuredClone(root) as Record<string | number, unknown>;
  let parent = copy;
  for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, unknown>;
  edit(parent, path[path.length - 1]!);
  return copy;
}

type Mutation = { op: 'delete' } | { op: 'set'; value: unknown } | { op: 'repeat'; times: number } | { op: 'extra'; key: string; value: unknown };

// Weighted so that most bodies stay small; the huge and deep ones are rare but present in every run.
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { arbitrary: fc.constant({ op: 'delete' as const }), weight: 30 },
  { arbitrary: wrongValue.map((value) => ({ op: 'set' as const, value })), weight: 60 },
  { arbitrary: fc.jsonValue({ maxDepth: 2 }).map((value) => ({ op: 'set' as const, value })), weight: 30 },
  { arbitrary: fc.integer({ min: 2, max: 12 }).map((times) => ({ op: 'repeat' as const, times })), weight: 10 },
  {
    arbitrary: fc.tuple(fc.oneof(fc.constantFrom(...PROTO_KEYS), fc.string({ maxLength: 8 })), wrongValue).map(([key, value]) => ({ op: 'extra' as const, key, value })),
    weight: 30,
  },
  { arbitrary: fc.integer({ min: 50, max: 1000 }).map((d) => ({ op: 'set' as const, value: nested(d, 1) })), weight: 2 },
  { arbitrary: hugeString.map((value) => ({ op: 'set' as const, value })), weight: 1 },
);

function applyMutation(seed: unknown, path: Path | undefined, m: Mutation): unknown {
  if (!path) {
    if (m.op === 'extra' && seed && typeof seed === 'object') return { ...(seed as object), [m.key]: m.value };
    if (m.op === 'repeat') return Array.from({ length: m.times }, () => seed);
    return m.op === 'set' ? m.value : seed;
  }
  return mutateAt(seed, path, (parent, key) => {
    if (m.op === 'delete') delete parent[key];
    else if (m.op === 'set') parent[key] = m.value;
    else if (m.op === 'repeat') parent[key] = Array.from({ length: m.times }, () => parent[key]);
    else {
      const target = parent[key];
      if (target && typeof target === 'object' && !Array.isArray(target)) (target as Record<string, unknown>)[m.key] = m.value;
      else parent[key] = { [m.key]: m.value };
    }
  });
}

// Every number of a valid body set to each of these, deterministically, in every run: the random runs rarely land
// exactly on a yield or version, and tiny, huge and negative-zero values are where arithmetic goes non-finite.
const EDGE_NUMBERS = [1e-306, 5e-324, 1e308, -1e308, -0];

export function edgeExamples(seed: unknown): FuzzRequest[] {
  if (seed === undefined) return [];
  return pathsOf(seed)
    .filter((path) => typeof path.reduce<unknown>((v, k) => (v as Record<string | number, unknown>)[k], seed) === 'number')
    .flatMap((path) => EDGE_NUMBERS.map((value) => json('edge-number', mutateAt(seed, path, (parent, key) => (parent[key] = value)))));
}

/** One to three mutations of a valid body, at random places in it. */
export function nearValid(seed: unknown): fc.Arbitrary<FuzzRequest> {
  const paths = pathsOf(seed);
  const place = paths.length ? fc.option(fc.constantFrom(...paths), { freq: 6 }) : fc.constant(null);
  return fc.array(fc.tuple(place, mutation), { minLength: 1, maxLength: 3 }).map((edits) => {
    let body = seed;
    for (const [path, m] of edits) {
      try {
        body = applyMutation(body, path ?? undefined, m);
      } catch {
        // an earlier edit removed this place; skip it
      }
    }
    return json('near-valid', body);
  });
}

// Raw text JSON.stringify never makes: prototype keys as own keys, out-of-range numbers, broken syntax, deep nesting.
const hostileRaw: fc.Arbitrary<FuzzRequest> = fc.oneof(
  fc.constantFrom(
    '{"__proto__":{"polluted":"yes"}}', '{"constructor":{"prototype":{"polluted":"yes"}}}', '[{"__proto__":{"polluted":"yes"}}]',
    '{"a":1e400}', '{"version":-1e400}', '{', '}', '[', '', ' ', 'null', 'true', '0', '"text"', '[]', '{}', '{"a":}', '{"a":1,,}', '\u0000', '\uFEFF{}', '{"a":"\\ud800"}',
  ).map((raw) => ({ kind: 'hostile', raw, contentType: 'application/json' })),
  fc.integer({ min: 100, max: 3_000 }).map((d) => ({ kind: 'deep', raw: '['.repeat(d) + ']'.repeat(d), contentType: 'application/json' })),
  fc.integer({ min: 100, max: 3_000 }).map((d) => ({ kind: 'deep', raw: '{"a":'.repeat(d) + '1' + '}'.repeat(d), contentType: 'application/json' })),
  fc.constantFrom('text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x').map((contentType) => ({ kind: 'wrong-type', raw: 'a=1', contentType })),
  fc.string({ maxLength: 40 }).map((raw) => ({ kind: 'text', raw, contentType: 'application/json' })),
);

// Just over the 1 MB limit: rare, since each costs a megabyte of reading.
const oversized: fc.Arbitrary<FuzzRequest> = fc.constant({ kind: 'oversized', raw: JSON.stringify({ a: 'x'.repeat(1024 * 1024 + 16) }), contentType: 'application/json' });

export function fuzzRequests(seed: unknown | undefined): fc.Arbitrary<FuzzRequest> {
  const generic = [
    { arbitrary: fc.jsonValue({ maxDepth: 3 }).map((v) => json('random', v)), weight: 120 },
    { arbitrary: fc.dictionary(fc.constantFrom(...PROTO_KEYS, 'id', 'version', 'name', 'body', 'steps'), wrongValue, { maxKeys: 4 }).map((v) => json('wrong-types', v)), weight: 80 },
    { arbitrary: hostileRaw, weight: 90 },
    { arbitrary: oversized, weight: 1 },
  ];
  if (seed === undefined) return fc.oneof(...generic);
  return fc.oneof({ arbitrary: nearValid(seed), weight: 700 }, ...generic);
}
