import fc from "fast-check";

// The classes of hostile input the fuzz test sends, each a fast-check arbitrary of a JSON value (or,
// for raw classes, of JSON text a browser could never produce from a form).

export interface HostileClass {
  name: string;
  /** A value to place anywhere a field is expected. */
  value: fc.Arbitrary<unknown>;
}

const LONE_SURROGATES = ["\uD800", "\uDBFF", "\uDC00", "\uDFFF", "a\uD83D", "\uDE00b"];
const INVISIBLES = [
  "\u0000",
  "\u0007",
  "\u001B[2J",
  "\u007F",
  "\u0085",
  "\u202E",
  "\u2066",
  "\u2028",
  "\uFEFF",
];
const ODD_UNICODE = ["😀", "👩🏽‍🔧", "e\u0301", "ﬃ", "Ⅻ", "𝟘𝟙", "\u00A0", "Z̤͔ͧ̑̓ä͖̭̈̇lͮ̒ͫǧ̗͚̚o̙̔ͮ̇͐̇"];
const SQL = [
  "' OR '1'='1",
  "1; DROP TABLE `case`; --",
  '" OR 1=1 -- ',
  "1 UNION SELECT password_hash FROM user",
  "%' AND SLEEP(5) AND '%'='",
  "\\'; SELECT 1; --",
];
const HTML = [
  "<script>alert(1)</script>",
  '"><img src=x onerror=alert(1)>',
  "javascript:alert(1)",
  "<svg/onload=alert(1)>",
  "{{7*7}}${7*7}",
  "</textarea><b>bold</b>",
];
const NUMBERS = [-1, 0, -0, 1e308, -1e308, 2 ** 53 + 1, -(2 ** 31) - 1, 0.1 + 0.2, 1e-320, 99999999999];

export const HOSTILE_CLASSES: HostileClass[] = [
  {
    name: "wrong types",
    value: fc.oneof(
      fc.constant(null),
      fc.boolean(),
      fc.constant([]),
      fc.constant({}),
      fc.constant("123"),
      fc.constant("true"),
      fc.integer(),
      fc.array(fc.integer(), { maxLength: 3 }),
    ),
  },
  { name: "out-of-range numbers", value: fc.constantFrom(...NUMBERS) },
  {
    name: "huge values",
    value: fc.oneof(
      fc.integer({ min: 5_000, max: 200_000 }).map((n) => "x".repeat(n)),
      fc.integer({ min: 1_000, max: 20_000 }).map((n) => Array.from({ length: n }, (_, i) => i)),
      fc
        .integer({ min: 500, max: 5_000 })
        .map((n) => Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, i]))),
    ),
  },
  {
    name: "deeply nested values",
    value: fc.integer({ min: 17, max: 3_000 }).map((levels) => {
      let v: unknown = "bottom";
      for (let i = 0; i < levels; i += 1) v = i % 2 ? [v] : { v };
      return v;
    }),
  },
  { name: "lone surrogates", value: fc.constantFrom(...LONE_SURROGATES).map((s) => `text ${s}`) },
  {
    name: "control and bidi characters",
    value: fc.constantFrom(...INVISIBLES).map((s) => `Dana${s}Example`),
  },
  { name: "odd but valid Unicode", value: fc.constantFrom(...ODD_UNICODE) },
  { name: "SQL fragments", value: fc.constantFrom(...SQL) },
  { name: "HTML and template fragments", value: fc.constantFrom(...HTML) },
  { name: "random JSON", value: fc.jsonValue({ maxDepth: 4 }) },
];

/** Hostile path segments for ids and tokens. */
export const HOSTILE_IDS = [
  "0",
  "-1",
  "1.5",
  "1e3",
  "abc",
  "99999999999999999999",
  "9007199254740993",
  "1;DROP TABLE case",
  "%00",
  "%E2%80%AE1",
  "' OR 1=1",
  "<script>",
  "A".repeat(43),
  "x".repeat(5_000),
];

/** Query strings: known keys with hostile values, and keys nobody reads. */
export const hostileQuery = fc
  .array(
    fc.tuple(
      fc.constantFrom(
        "q",
        "status",
        "limit",
        "cylinderId",
        "format",
        "step",
        "vehicleId",
        "size",
        "version",
        "retired",
        "charge",
        "oil",
        "page",
        "__proto__",
      ),
      fc.oneof(
        fc.constantFrom(...SQL, ...HTML, ...ODD_UNICODE, "-1", "0", "1e999", "NaN", "x".repeat(3_000)),
        fc.string({ maxLength: 20 }),
      ),
    ),
    { maxLength: 4 },
  )
  .map((pairs) => new URLSearchParams(pairs).toString());

/** Raw JSON bodies a form never sends: broken syntax, escapes for lone surrogates, huge nesting. */
export const RAW_BODIES = [
  "{",
  "[1,2",
  '{"a":1,}',
  "null",
  "0",
  '"string"',
  "[]",
  '{"__proto__":{"isAdmin":true}}',
  '{"constructor":{"prototype":{"x":1}}}',
  '{"complaint":"\\ud800"}',
  '{"name":"\\udfff\\ud800"}',
  "[".repeat(100_000) + "]".repeat(100_000),
  '{"a":' + "[".repeat(40) + "]".repeat(40) + "}",
  "\uFEFF{}",
  '{"a":1e999}',
];
