import fc from "fast-check";

// What a careless client or an attacker sends, as fast-check arbitraries: values of every wrong type and
// size, strings with NUL, unicode and injection text, bad ids and bad escapes for path segments, bodies
// that are not JSON at all, and ways of changing a request that a route was written for.

/** Text that has broken programs before (SQL, HTML, templates, paths, format strings, number words). */
const NASTY_TEXT = [
  "",
  " ",
  "\u0000",
  "a\u0000b",
  "' OR '1'='1",
  "'; DROP TABLE users; --",
  '"><script>alert(1)</script>',
  "{{7*7}}",
  "${7*7}",
  "../../etc/passwd",
  "%s%s%s%n",
  "=SUM(A1:A9)",
  "null",
  "undefined",
  "NaN",
  "-Infinity",
  "1e309",
  "0x1F",
  "0000-01-01",
  "2026-02-30",
  "9999-12-31T23:59:59Z",
  "\u202Eevil\u202C",
  "\uD800",
  "\uFEFF",
  "👩‍👩‍👧‍👦",
  "Z̤͔ͧ̑̓ä͖̭̈̇lͮ̒ͫǫ̗",
  "-".repeat(36),
  "00000000-0000-0000-0000-000000000000",
  "a".repeat(300),
];

/** Numbers at and beyond every edge: JSON has no NaN or Infinity (they are sent as null). */
const edgeNumber = fc.oneof(
  fc.constantFrom(0, -0, 1, -1, 0.1, 1e-300, 5e-324, -5e-324, 1e21, 1e308, -1e308, 2 ** 31, 2 ** 53 + 2, -(2 ** 63), Number.NaN, Number.POSITIVE_INFINITY),
  fc.double(),
  fc.integer(),
);

/** Hostile text short enough for an address: a request line past Node's 16 KiB header limit is cut off before any route sees it. */
const shortHostileString = fc.oneof(
  { arbitrary: fc.constantFrom(...NASTY_TEXT), weight: 4 },
  { arbitrary: fc.string({ unit: "binary", maxLength: 40 }), weight: 2 },
  { arbitrary: fc.string({ unit: "grapheme", maxLength: 40 }), weight: 1 },
  { arbitrary: fc.string({ maxLength: 12 }).map((s) => `${s}\u0000${s}`), weight: 1 },
);

export const hostileString = fc.oneof(
  { arbitrary: shortHostileString, weight: 8 },
  { arbitrary: fc.integer({ min: 255, max: 20_000 }).map((n) => "x".repeat(n)), weight: 1 },
);

/** Text as it goes into an address: a lone surrogate cannot be %-encoded as UTF-8, so it goes as U+FFFD. */
const inAddress = (text: string) => encodeURIComponent(text.replace(/[\uD800-\uDFFF]/g, "\uFFFD"));

/** Any value of any type, including values of the right shape but the wrong size. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { arbitrary: hostileString, weight: 4 },
  { arbitrary: edgeNumber, weight: 3 },
  { arbitrary: fc.constantFrom(null, true, false, [], {}), weight: 2 },
  { arbitrary: fc.jsonValue({ maxDepth: 3 }), weight: 2 },
  { arbitrary: fc.array(fc.jsonValue({ maxDepth: 1 }), { minLength: 1000, maxLength: 3000 }), weight: 1 },
);

/** What to put in place of an id in a path: the right id now and then, else something that is not one. */
export const hostileSegment = (real: string) =>
  fc.oneof(
    { arbitrary: fc.constant(real), weight: 2 },
    { arbitrary: fc.uuid(), weight: 2 },
    {
      arbitrary: fc.constantFrom(
        "-".repeat(36),
        "%ZZ",
        "%",
        "%00",
        "%E0%A4%A",
        "%C0%AF",
        "..",
        "%2e%2e",
        "null",
        "0",
        "-1",
        "1e999",
        "%27%20OR%201=1",
        "a".repeat(5000),
      ),
      weight: 3,
    },
    { arbitrary: shortHostileString.map(inAddress), weight: 2 },
    { arbitrary: fc.constant(real.toUpperCase()), weight: 1 },
    { arbitrary: fc.constant(`${real}x`), weight: 1 },
  );

/** A JSON text nested far deeper than any form: 100,000 arrays. */
const DEEP = `${"[".repeat(100_000)}${"]".repeat(100_000)}`;

/** A body that is not what any route takes: broken JSON, bytes that are not UTF-8, deep nesting, nothing. */
export const rawBody = fc.oneof(
  fc.constantFrom("", "{", '{"a":', "[1,2", "{'single':1}", '{"a":1}garbage', "\u0000", "true", "null", "1e999", DEEP, `{"__proto__":{"admin":true}}`),
  fc.uint8Array({ maxLength: 64 }),
  fc.string({ unit: "binary", maxLength: 80 }),
);

/** The Content-Type a raw body is sent with, or none. */
export const contentType = fc.constantFrom<string | undefined>(
  undefined,
  "application/json",
  "application/json; charset=utf-16",
  "text/plain",
  "multipart/form-data",
  "multipart/form-data; boundary=----x",
  "application/x-www-form-urlencoded",
  "application/octet-stream",
);

/** A query string of known and unknown parameters with hostile values. */
export const hostileQuery = (known: readonly string[]) =>
  fc
    .array(fc.tuple(fc.oneof(fc.constantFrom(...known), shortHostileString), shortHostileString), { maxLength: 4 })
    .map((pairs) => pairs.map(([key, value]) => `${inAddress(key)}=${inAddress(value)}`).join("&"));

type Json = Record<string, unknown>;

/** The paths to every value inside a JSON object: ["specs", "stretchPoints", 0, "tensionKN"] and so on. */
function pathsOf(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return prefix.length ? [prefix] : [];
  const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
  return [...(prefix.length ? [prefix] : []), ...entries.flatMap(([key, v]) => pathsOf(v, [...prefix, key]))];
}

function withAt(value: unknown, path: (string | number)[], change: (parent: Json, key: string | number) => void): unknown {
  const copy = structuredClone(value) as Json;
  let parent = copy;
  for (const key of path.slice(0, -1)) parent = parent[key as string] as Json;
  change(parent, path[path.length - 1]);
  return copy;
}

/** A route's own body changed the ways clients get it wrong: one value replaced, one removed, extra fields, or another value whole. */
export function mutatedJson(template: unknown): fc.Arbitrary<unknown> {
  const paths = pathsOf(template);
  const replaced = paths.length
    ? fc.tuple(fc.constantFrom(...paths), hostileValue).map(([path, value]) => withAt(template, path, (parent, key) => (parent[key as string] = value)))
    : hostileValue;
  const removed = paths.length
    ? fc
        .constantFrom(...paths)
        .map((path) => withAt(template, path, (parent, key) => (Array.isArray(parent) ? parent.splice(Number(key), 1) : delete parent[key as string])))
    : hostileValue;
  const extra = fc
    .dictionary(hostileString, hostileValue, { minKeys: 1, maxKeys: 3 })
    .map((more) => (template && typeof template === "object" && !Array.isArray(template) ? { ...template, ...more } : more));
  return fc.oneof(
    { arbitrary: replaced, weight: 5 },
    { arbitrary: removed, weight: 2 },
    { arbitrary: extra, weight: 2 },
    { arbitrary: hostileValue, weight: 1 },
  );
}

/** A multipart form like the route's own, with a field replaced by hostile text, a file of random bytes or a hostile name, or a field missing. */
export function mutatedForm(template: FormData): fc.Arbitrary<FormData> {
  const names = [...new Set([...template.keys()])];
  return fc
    .record({
      field: fc.constantFrom(...names, "extra"),
      change: fc.constantFrom("text", "file", "remove"),
      text: hostileString,
      bytes: fc.uint8Array({ maxLength: 2048 }),
      fileName: hostileString,
    })
    .map(({ field, change, text, bytes, fileName }) => {
      const form = new FormData();
      for (const [name, value] of template.entries()) if (name !== field) form.append(name, value);
      if (change === "text") form.append(field, text);
      if (change === "file") form.append(field, new Blob([bytes]), fileName);
      return form;
    });
}
