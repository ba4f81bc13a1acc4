import fc from "fast-check";

/**
 * Request bodies an attacker or a broken client might send, as raw text: raw text lets a body carry
 * what JSON.stringify cannot write (1e999, which JSON.parse reads as Infinity; bare NaN; nesting
 * thousands of levels deep) and lets the same machinery send text that is not JSON at all.
 */
export interface HostileBody {
  text: string;
  contentType: string;
}

/** A fragment written into the body verbatim. */
class Raw {
  constructor(readonly token: string) {}
}

type Tree = Raw | null | boolean | number | string | Tree[] | { [key: string]: Tree };

/** Serialises a generated tree; generated depth is small, so recursion here is safe. */
export function writeJson(value: Tree): string {
  if (value instanceof Raw) return value.token;
  if (Array.isArray(value)) return `[${value.map(writeJson).join(",")}]`;
  if (value !== null && typeof value === "object") {
    return `{${Object.entries(value).map(([k, v]) => `${JSON.stringify(k)}:${writeJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

const raw = (token: string) => new Raw(token);

/** Numbers that break naive code: overflow to Infinity, NaN spelled as a string, huge, tiny, negative zero. */
const hostileNumber: fc.Arbitrary<Tree> = fc.oneof(
  fc.constantFrom<Tree>(
    raw("1e999"), raw("-1e999"), raw("1e-999"), raw("-0"), raw("9007199254740993"), raw("123456789012345678901234567890"),
    "NaN", "Infinity", "-Infinity", "1e3", "0x10", "", 0, -1, -1e308, 1e308, 5e-324, Number.MAX_SAFE_INTEGER, -2147483649,
  ),
  fc.double().map((d) => (Number.isFinite(d) ? d : String(d))),
  fc.integer(),
);

/** Nesting far past any schema: 10 to 20,000 levels of arrays or objects. */
const deepNesting: fc.Arbitrary<Tree> = fc
  .record({ depth: fc.integer({ min: 10, max: 20_000 }), objects: fc.boolean() })
  .map(({ depth, objects }) => raw(objects ? `${'{"a":'.repeat(depth)}1${"}".repeat(depth)}` : `${"[".repeat(depth)}${"]".repeat(depth)}`));

const longString: fc.Arbitrary<Tree> = fc
  .record({ length: fc.integer({ min: 1_000, max: 200_000 }), char: fc.constantFrom("x", "\u00e9", "\\u0000", "\u{1F5FB}") })
  .map(({ length, char }) => raw(JSON.stringify("").slice(0, 1) + char.repeat(Math.floor(length / char.length)) + '"'));

const oddString = fc.oneof(
  fc.string({ maxLength: 30 }),
  fc.constantFrom("__proto__", "constructor", "prototype", "toString", "<script>alert(1)</script>", "'; DROP TABLE beams; --", "\u0000", "../../etc/passwd"),
);

/** A hostile leaf or small JSON structure. */
const smallHostile: fc.Arbitrary<Tree> = fc.oneof(
  { arbitrary: hostileNumber, weight: 6 },
  { arbitrary: oddString, weight: 4 },
  { arbitrary: fc.constantFrom<Tree>(null, true, false, [], {}), weight: 3 },
  { arbitrary: fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Tree>, weight: 3 },
);

/** Also deep or long values, used only in top-level slots so that most bodies stay small and fast. */
export const hostileValue: fc.Arbitrary<Tree> = fc.oneof(
  { arbitrary: smallHostile, weight: 100 },
  { arbitrary: deepNesting, weight: 1 },
  { arbitrary: longString, weight: 1 },
);

/** Unknown keys, prototype-polluting ones included. */
const unknownFields: fc.Arbitrary<Record<string, Tree>> = fc.dictionary(
  fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("__proto__", "constructor", "prototype", "isAdmin", "role", "id")),
  hostileValue,
  { maxKeys: 3 },
);

const maybe = <T>(arb: fc.Arbitrary<T>, value: fc.Arbitrary<Tree> = smallHostile) => fc.oneof({ arbitrary: arb as fc.Arbitrary<Tree | T>, weight: 3 }, { arbitrary: value, weight: 1 });

const support = maybe(
  fc.record({
    type: maybe(fc.constantFrom("pinned", "fixed", "roller", "guided", "spring", "free", "PINNED")),
    ky: maybe(fc.constantFrom(0, -1e6, 1e7)),
    kr: maybe(fc.constantFrom(0, -1, 1e6)),
  }, { requiredKeys: ["type"] }),
);

const node = fc.record({
  x: maybe(fc.oneof(fc.constantFrom(0, 5, 10, -5), fc.double({ min: -100, max: 100, noNaN: true }))),
  support,
  hinge: maybe(fc.boolean()),
}, { requiredKeys: ["x"] });

/** Zero or negative stiffness and missing properties among plausible ones. */
const segment = fc.record({
  E: maybe(fc.constantFrom(2e11, 0, -2e11, 1e-300)),
  I: maybe(fc.constantFrom(8e-5, 0, -8e-5, 1e300)),
  A: maybe(fc.constantFrom(0.01, 0, -1)),
  G: maybe(fc.constantFrom(7.7e10, 0)),
  shearFactor: maybe(fc.constantFrom(5 / 6, 0, -1)),
}, { requiredKeys: ["E", "I"] });

const load = fc.record({
  type: maybe(fc.constantFrom("point", "moment", "distributed", "settlement", "gravity")),
  x: hostileNumber, x1: hostileNumber, x2: hostileNumber, fy: hostileNumber, mz: hostileNumber,
  qy1: hostileNumber, qy2: hostileNumber, uy: hostileNumber,
}, { requiredKeys: ["type"] });

const loadCase = fc.record({
  id: maybe(fc.constantFrom("D", "L", "", "D")),
  category: maybe(fc.constantFrom("dead", "live", "wind", "")),
  pattern: maybe(fc.boolean()),
  loads: maybe(fc.array(load, { maxLength: 4 })),
}, { requiredKeys: ["id", "loads"] });

/** Thousands of spans: over the node limit, so answered before the solver runs. */
const thousandsOfSpans: fc.Arbitrary<Tree> = fc.integer({ min: 1_001, max: 5_000 }).map((n) =>
  raw(`[${Array.from({ length: n }, (_, i) => `{"x":${i * 3},"support":{"type":"pinned"}}`).join(",")}]`),
);

/** A model in the exchange format's shape with hostile values anywhere, and unknown fields. */
export const hostileModel: fc.Arbitrary<Tree> = fc
  .record({
    format: maybe(fc.constantFrom("spanwright.beam/1", "spanwright.beam/2", ""), hostileValue),
    theory: maybe(fc.constantFrom("euler-bernoulli", "timoshenko", "string")),
    nodes: fc.oneof({ arbitrary: fc.array(node, { maxLength: 6 }) as fc.Arbitrary<Tree>, weight: 60 }, { arbitrary: thousandsOfSpans, weight: 1 }, { arbitrary: hostileValue, weight: 3 }),
    segments: maybe(fc.array(segment, { maxLength: 6 })),
    loadCases: maybe(fc.array(loadCase, { maxLength: 3 })),
    combinations: maybe(fc.array(fc.record({ id: maybe(fc.string({ maxLength: 3 })), factors: maybe(fc.dictionary(fc.string({ maxLength: 2 }), hostileNumber, { maxKeys: 3 })) }), { maxLength: 2 })),
    stations: maybe(fc.array(hostileNumber, { maxLength: 5 })),
    extra: unknownFields,
  }, { requiredKeys: [] })
  .map(({ extra, ...model }) => ({ ...extra, ...model }) as Tree);

/** Text that is not a JSON object: truncated, bare NaN, other content types, empty. */
const notJson: fc.Arbitrary<HostileBody> = fc.oneof(
  fc.constantFrom("", "{", "{\"nodes\":", "NaN", "{\"x\": NaN}", "[1,2,", "null", "\"a string\"", "42", "true", "{'single': 1}", "\u0000\u0001")
    .map((text) => ({ text, contentType: "application/json" })),
  fc.record({ text: fc.string({ maxLength: 200 }), contentType: fc.constantFrom("text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/xml", "application/json; charset=utf-7") }),
);

/** Wraps object bodies and mixes in non-JSON text and bare hostile values. */
export function asBody(objects: fc.Arbitrary<Tree>): fc.Arbitrary<HostileBody> {
  return fc.oneof(
    { arbitrary: objects.map((tree) => ({ text: writeJson(tree), contentType: "application/json" })), weight: 8 },
    { arbitrary: notJson, weight: 1 },
    { arbitrary: hostileValue.map((tree) => ({ text: writeJson(tree), contentType: "application/json" })), weight: 1 },
  );
}

export const hostileSolveBody = asBody(hostileModel);

export function hostileSaveBody(currentVersion: () => number): fc.Arbitrary<HostileBody> {
  return asBody(
    fc.record({
      baseVersion: fc.oneof(hostileNumber, fc.constant(0).map(() => currentVersion() as Tree), fc.constantFrom<Tree>(0, -1, 1.5, "1")),
      model: fc.oneof({ arbitrary: hostileModel, weight: 4 }, { arbitrary: hostileValue, weight: 1 }),
      changeSummary: maybe(fc.string({ maxLength: 40 })),
      extra: unknownFields,
    }, { requiredKeys: [] }).map(({ extra, ...body }) => ({ ...extra, ...body }) as Tree),
  );
}

/** Sign-up and sign-in bodies; valid e-mail addresses are rare so few requests reach the password hash. */
export const hostileCredentialsBody = asBody(
  fc.record({
    email: fc.oneof({ arbitrary: hostileValue, weight: 9 }, { arbitrary: fc.constantFrom("fuzz@example.test", "FUZZ@EXAMPLE.TEST "), weight: 1 }),
    name: maybe(fc.string({ maxLength: 20 })),
    password: fc.oneof(hostileValue, fc.constantFrom("short", "a".repeat(257), "\u0000".repeat(12))),
    extra: unknownFields,
  }, { requiredKeys: [] }).map(({ extra, ...body }) => ({ ...extra, ...body }) as Tree),
);
