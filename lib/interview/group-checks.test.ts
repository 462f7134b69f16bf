import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { VEHICLE_CHARGE_MASS_MAX_G } from "@/lib/contracts/case-figures";
import { FULL_VACUUM_KPA_GAUGE, MAX_READING_KPA_GAUGE } from "@/lib/refrigerants/gauge-limits";
import { answerSchemas } from "./answers";
import {
  behaviourSymptomIds,
  compressorOilChoices,
  compressorTypeChoices,
  expansionDeviceChoices,
  leakMethodChoices,
  leakPlaceChoices,
  oilTypeChoices,
  partReplacedChoices,
  refrigerantChoices,
} from "./choices";
import { exampleAnswers, emptySystemAnswers } from "./example-answers";
import { checkGroupValues } from "./group-checks";
import { groupIds, type GroupId } from "./steps";
import { parseGroupValues } from "./validate";

// The phone's plain checks against the server's zod schemas, over the same generated answers: the same
// verdict, the same cleaned value and the same messages in the same order, or this fails.

/** The keys a group's schema asks (through the pipe that rewrites the older system answer). */
function keysOf(group: GroupId): string[] {
  type Def = { shape?: Record<string, unknown>; out?: { _zod: { def: Def } } };
  const def = (answerSchemas[group] as unknown as { _zod: { def: Def } })._zod.def;
  return Object.keys(def.shape ?? def.out?._zod.def.shape ?? {});
}

// Every limit in the schemas, and a step either side, so each boundary is crossed both ways.
const limits = [
  FULL_VACUUM_KPA_GAUGE,
  MAX_READING_KPA_GAUGE,
  VEHICLE_CHARGE_MASS_MAX_G,
  -450,
  -40,
  -30,
  0,
  1,
  50,
  55,
  60,
  80,
  100,
  110,
  1000,
  5000,
  8000,
  10080,
];
const nearLimit = fc
  .tuple(fc.constantFrom(...limits), fc.constantFrom(-1, -0.5, -1e-9, 0, 1e-9, 0.5, 1))
  .map(([limit, step]) => limit + step);
const numbers = fc.oneof(
  nearLimit,
  fc.integer({ min: -20000, max: 20000 }),
  fc.double({ min: -20000, max: 20000, noNaN: true }),
  fc.constantFrom(NaN, Infinity, -Infinity, -0, 2 ** 60, -(2 ** 60), Number.MAX_SAFE_INTEGER + 2),
);
const choices = fc.constantFrom(
  ...refrigerantChoices,
  ...expansionDeviceChoices,
  ...compressorTypeChoices,
  ...oilTypeChoices,
  ...partReplacedChoices,
  ...compressorOilChoices,
  ...leakMethodChoices,
  ...leakPlaceChoices,
  ...behaviourSymptomIds,
  "R-12",
  "",
);
const oddCharacters = fc.constantFrom(
  " ",
  "\t",
  "\n",
  "\r",
  "\u0000",
  "\u0007",
  "\u007F",
  "\u0085",
  "\u2028",
  "\u202E",
  "\u2067",
  "\uD800",
  "\uDC00",
  "😀",
  "é",
);
const strings = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc
    .array(fc.oneof(fc.string({ maxLength: 3 }), oddCharacters), { maxLength: 8 })
    .map((parts) => parts.join("")),
  // Around the 2000-character limit, counted in UTF-16 units and in code points.
  fc
    .tuple(
      fc.integer({ min: 1990, max: 2010 }),
      fc.constantFrom("x", " ", "😀"),
      fc.constantFrom("", "  ", "😀"),
    )
    .map(([n, fill, end]) => fill.repeat(n) + end),
);
const symptomLists = fc.oneof(
  fc.array(fc.constantFrom(...behaviourSymptomIds), { maxLength: 4 }),
  fc.uniqueArray(fc.constantFrom(...behaviourSymptomIds), { maxLength: 4 }),
  fc.array(fc.oneof(fc.constantFrom(...behaviourSymptomIds), fc.string({ maxLength: 4 }), numbers), {
    maxLength: 3,
  }),
);
const odd = fc.constantFrom<unknown>(
  null,
  undefined,
  [],
  {},
  [1],
  ["x"],
  "12",
  "",
  new Date(0),
  Object.create(null),
);
const anyValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 5, arbitrary: numbers },
  { weight: 4, arbitrary: choices },
  { weight: 2, arbitrary: strings },
  { weight: 2, arbitrary: fc.boolean() },
  { weight: 2, arbitrary: symptomLists },
  { weight: 2, arbitrary: odd },
);

/** A group's answers: its own keys (each present or absent), the older electricCompressor, and a stray key. */
function groupValues(group: GroupId): fc.Arbitrary<unknown> {
  const keys = [...keysOf(group), "electricCompressor", "stray"];
  const record = fc.record(Object.fromEntries(keys.map((k) => [k, anyValue])), { requiredKeys: [] });
  // Start from a valid group now and then, so one changed field is judged against otherwise good answers.
  const base =
    (exampleAnswers as Record<string, unknown>)[group] ??
    (emptySystemAnswers as Record<string, unknown>)[group];
  const edited = fc
    .tuple(fc.constantFrom(...keys), anyValue)
    .map(([key, value]) => ({ ...(base as object), [key]: value }));
  return fc.oneof(
    { weight: 6, arbitrary: record },
    { weight: 3, arbitrary: edited },
    { weight: 1, arbitrary: odd },
  );
}

describe("the phone's answer checks and the server's schemas", () => {
  it.each(groupIds.map((g) => [g]))("agree on every generated %s group", (group) => {
    let accepted = 0;
    let refused = 0;
    fc.assert(
      fc.property(groupValues(group), (values) => {
        const plain = checkGroupValues(group, values);
        const server = parseGroupValues(group, values);
        expect(plain).toStrictEqual(server);
        if (server.ok) accepted++;
        else refused++;
      }),
      { numRuns: 3000, seed: 20261203 + groupIds.indexOf(group) },
    );
    // The generated answers reach both verdicts, so agreement is not only on refusals.
    expect(accepted).toBeGreaterThan(30);
    expect(refused).toBeGreaterThan(30);
  });

  it("agree on the example cases", () => {
    for (const answers of [exampleAnswers, emptySystemAnswers]) {
      for (const group of groupIds) {
        const values = (answers as Record<string, unknown>)[group];
        if (values === undefined) continue;
        expect(checkGroupValues(group, values), group).toStrictEqual(parseGroupValues(group, values));
      }
    }
  });

  it("say a wrong value in the technician's terms and trim the complaint", () => {
    expect(checkGroupValues("complaint", { ownerWords: "  warm at idle " })).toEqual({
      ok: true,
      value: { ownerWords: "warm at idle" },
    });
    expect(checkGroupValues("running", { highKpaGauge: 900, lowKpaGauge: 1200 })).toEqual({
      ok: false,
      issues: [
        {
          field: "lowKpaGauge",
          message: "The low side reads above the high side — check the hose connections",
        },
      ],
    });
    expect(checkGroupValues("conditions", { ambientC: "32" })).toEqual({
      ok: false,
      issues: [{ field: "ambientC", message: "Ambient temperature: enter a number" }],
    });
  });
});
