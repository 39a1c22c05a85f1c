// Generated request bodies for the fuzz test (fast-check): mostly a valid example with one to
// three parts replaced, removed or added, sometimes any JSON at all, sometimes text that is not
// JSON. The values are the kind a hostile client sends: NUL, lone surrogates, huge and tiny
// numbers, wrong types, deep nesting, reply markers, SQL and markup.
import fc from 'fast-check';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
type Path = (string | number)[];

const ODD_TEXT = [
  '', ' ', '\u0000', 'a\u0000b', '\uD800', '\uDFFF', 'x\uDBFFy', '\u202E', '\uFEFF', '🎵', 'e\u0301', 'x'.repeat(10_000),
  '$', '$Q1', '$@0', '__proto__', 'constructor', 'toString', '00000000-0000-0000-0000-000000000000',
  '12345678-1234-1234-1234-1234567890ab\'--', "'; drop table plans; --", '<script>alert(1)</script>', '1e309', '-0', 'NaN', 'null', '{}', '[]',
];

export const anyText: fc.Arbitrary<string> = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 48 }),
  fc.string({ maxLength: 16 }),
  fc.constantFrom(...ODD_TEXT),
);

// Every number JSON can carry, from the edges of double precision to the edges of int32 and int64.
export const anyNumber: fc.Arbitrary<number> = fc.oneof(
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -0, -1, 1, 0.5, 1e308, -1e308, 5e-324, 2 ** 31, -(2 ** 31) - 1, 2 ** 53 + 1, -(2 ** 63)),
);

function leaf(numbers: fc.Arbitrary<number>): fc.Arbitrary<Json> {
  return fc.oneof(anyText, numbers, fc.boolean(), fc.constant(null));
}

// Arrays nested past any sensible depth (kept to what JSON.stringify can write here; deeper
// nesting is sent as text by deepText).
const deepNesting: fc.Arbitrary<Json> = fc.integer({ min: 50, max: 1000 }).map((depth) => {
  let value: Json = 1;
  for (let level = 0; level < depth; level += 1) value = [value];
  return value;
});

const deepText: fc.Arbitrary<string> = fc.integer({ min: 1000, max: 100_000 }).map((depth) => `${'['.repeat(depth)}${']'.repeat(depth)}`);

function anyValue(numbers: fc.Arbitrary<number>): fc.Arbitrary<Json> {
  return fc.oneof(
    { weight: 6, arbitrary: leaf(numbers) },
    { weight: 1, arbitrary: fc.array(leaf(numbers), { maxLength: 6 }) },
    { weight: 1, arbitrary: fc.dictionary(anyText, leaf(numbers), { maxKeys: 4 }) },
    { weight: 1, arbitrary: deepNesting },
  );
}

function pathsOf(value: Json, path: Path = []): Path[] {
  if (typeof value !== 'object' || value === null) return [];
  const entries: [string | number, Json][] = Array.isArray(value) ? value.map((entry, index) => [index, entry]) : Object.entries(value);
  return entries.flatMap(([key, entry]) => [[...path, key], ...pathsOf(entry, [...path, key])]);
}

interface Mutation { path: Path; kind: 'replace' | 'remove' | 'add'; value: Json; key: string }

function mutate(root: Json, mutation: Mutation): Json {
  const copy = structuredClone(root);
  let parent: Json = copy;
  for (const key of mutation.path.slice(0, -1)) {
    if (typeof parent !== 'object' || parent === null) return copy; // an earlier mutation changed the shape
    parent = (parent as Record<string | number, Json>)[key];
  }
  if (typeof parent !== 'object' || parent === null) return copy;
  const last = mutation.path[mutation.path.length - 1];
  const target = parent as Record<string | number, Json>;
  if (mutation.kind === 'replace') target[last] = mutation.value;
  else if (mutation.kind === 'remove') {
    if (Array.isArray(parent)) parent.splice(Number(last), 1);
    else delete target[last];
  } else if (Array.isArray(parent)) parent.push(mutation.value);
  else target[mutation.key] = mutation.value;
  return copy;
}

/**
 * Bodies for one route, as the raw text to send. `numbers` replaces anyNumber where a route must
 * still be kept from unbounded work (see the fuzz test).
 */
export function bodiesFor(example: Json, numbers: fc.Arbitrary<number> = anyNumber): fc.Arbitrary<string> {
  const paths = pathsOf(example);
  const mutation: fc.Arbitrary<Mutation> = fc.record({
    path: paths.length > 0 ? fc.constantFrom(...paths) : fc.constant<Path>([]),
    kind: fc.constantFrom<Mutation['kind']>('replace', 'remove', 'add'),
    value: anyValue(numbers),
    key: anyText,
  });
  const mutated = fc.array(mutation, { minLength: 1, maxLength: 3 })
    .map((mutations) => mutations.filter((one) => one.path.length > 0).reduce(mutate, example))
    .map((body) => JSON.stringify(body));
  return fc.oneof(
    { weight: 14, arbitrary: mutated },
    { weight: 3, arbitrary: anyValue(numbers).map((body) => JSON.stringify(body)) },
    { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 3 }).map((body) => JSON.stringify(body)) },
    { weight: 1, arbitrary: fc.oneof(anyText, deepText) },
  );
}
