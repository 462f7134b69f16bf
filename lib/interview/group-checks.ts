import { VEHICLE_CHARGE_MASS_MAX_G } from "@/lib/contracts/case-figures";
import { textProblem, type TextLines } from "@/lib/contracts/text-rules";
import { FULL_VACUUM_KPA_GAUGE, MAX_READING_KPA_GAUGE } from "@/lib/refrigerants/gauge-limits";
import { quantityMarker } from "@/lib/units/quantity";
import type { InterviewAnswers } from "./answers";
import {
  behaviourSymptomIds,
  compressorOilChoices,
  compressorTypeChoices,
  compressorTypeFromOlderAnswer,
  expansionDeviceChoices,
  GAUGE_DISAGREEMENT_KPA,
  leakMethodChoices,
  leakPlaceChoices,
  oilTypeChoices,
  partReplacedChoices,
  refrigerantChoices,
} from "./choices";
import type { AnswerIssue } from "./issues";
import type { GroupId } from "./steps";

/*
 * The question groups' checks in plain TypeScript, for the phone: the zod schemas of answers.ts stay
 * the server's judge, and these return the same verdict, the same cleaned value and the same messages
 * in the same order, without shipping a schema library to the vehicle. group-checks.test.ts runs both
 * over the same generated answers and fails on any difference, so the two cannot drift apart.
 *
 * What zod does, and so what this does: a value of the wrong type stops its field (and the group's own
 * cross-field rule); a limit that fails does not, so the next limit and the group's rule still run.
 * Fields are checked in the schema's order; keys no group asks are dropped.
 */

// Limits go into messages as quantity markers, so a °F reader is told "above 131 °F", not "above 55 °C".
const limitC = (c: number) => quantityMarker({ kind: "temperature", value: c, decimals: 0 });
const limitG = (g: number) => quantityMarker({ kind: "mass", value: g });
const limitMl = (ml: number) => quantityMarker({ kind: "volume", value: ml });

interface Found {
  path: (string | number)[];
  message: string;
  /** a wrong type: the checks after it and the group's cross-field rule do not run */
  stops: boolean;
}
interface Checked {
  value: unknown;
  issues: Found[];
}
/** One field's check; `optional` fields accept undefined. */
interface FieldCheck {
  (value: unknown): Checked;
  optional?: boolean;
}

/** The type name zod's English messages give a value ("received string", "received NaN"). */
function typeName(value: unknown): string {
  if (typeof value === "number")
    return Number.isNaN(value) ? "NaN" : Number.isFinite(value) ? "number" : String(value);
  if (value === null) return "null";
  if (Array.isArray(value)) return "array";
  if (typeof value === "object") {
    const proto = Object.getPrototypeOf(value) as unknown;
    const ctor = (value as { constructor?: { name?: string } }).constructor;
    if (proto !== Object.prototype && "constructor" in (value as object) && ctor) return String(ctor.name);
  }
  return typeof value;
}
const expected = (what: string, value: unknown) =>
  `Invalid input: expected ${what}, received ${typeName(value)}`;

const wrongType = (message: string): Found => ({ path: [], message, stops: true });
const outOfRange = (message: string): Found => ({ path: [], message, stops: false });

type Limit = [test: (n: number) => boolean, message: string];
const atLeast = (min: number, message: string): Limit => [(n) => n >= min, message];
const atMost = (max: number, message: string): Limit => [(n) => n <= max, message];

/** A finite number within its limits; `whole` asks a safe integer first (zod's z.int()). */
function num(typeMessage: string, limits: Limit[], whole?: string): FieldCheck {
  return (value) => {
    if (typeof value !== "number" || !Number.isFinite(value))
      return { value, issues: [wrongType(typeMessage)] };
    const issues: Found[] = [];
    if (whole !== undefined) {
      if (!Number.isInteger(value)) return { value, issues: [wrongType(whole)] };
      if (!Number.isSafeInteger(value)) issues.push(outOfRange(whole));
    }
    for (const [ok, message] of limits) if (!ok(value)) issues.push(outOfRange(message));
    return { value, issues };
  };
}

function oneOf(choices: readonly string[], message: string): FieldCheck {
  return (value) => ({
    value,
    issues: typeof value === "string" && choices.includes(value) ? [] : [wrongType(message)],
  });
}

function yesNo(message: string): FieldCheck {
  return (value) => ({ value, issues: typeof value === "boolean" ? [] : [wrongType(message)] });
}

/** Characters as zod counts them for a maximum: code points once the UTF-16 length is over it. */
function lengthFor(value: { length: number }, max?: number): number {
  return typeof value === "string" && max !== undefined && value.length > max
    ? [...value].length
    : value.length;
}

/**
 * Text checked by the shared text rules, then trimmed and measured. As in zod, the length limits are
 * also measured on a value of the wrong type that has a length (an array), after the type message.
 */
function text(
  lines: TextLines,
  typeMessage: string | undefined,
  min?: [number, string],
  max?: [number, string],
): FieldCheck {
  return (input) => {
    let value = input;
    const issues: Found[] = [];
    if (typeof value !== "string") {
      issues.push(wrongType(typeMessage ?? expected("string", value)));
    } else {
      const problem = textProblem(value, lines);
      if (problem) issues.push(outOfRange(problem));
      value = value.trim();
    }
    const measurable =
      value !== null && value !== undefined && (value as { length?: unknown }).length !== undefined;
    if (measurable) {
      const sized = value as { length: number };
      if (min && !(lengthFor(sized) >= min[0])) issues.push(outOfRange(min[1]));
      if (max && !(lengthFor(sized, max[0]) <= max[0])) issues.push(outOfRange(max[1]));
    }
    return { value, issues };
  };
}

function optional(check: FieldCheck): FieldCheck {
  const wrapped: FieldCheck = (value) => (value === undefined ? { value, issues: [] } : check(value));
  wrapped.optional = true;
  return wrapped;
}

const isRecord = (value: unknown): value is Record<string, unknown> =>
  typeof value === "object" && value !== null && !Array.isArray(value);

type Rule = (value: Record<string, unknown>) => Found[];

/** The group's fields in order, then its cross-field rule when no field stopped. */
function group(shape: Record<string, FieldCheck>, rule?: Rule) {
  return (input: unknown): Checked => {
    if (!isRecord(input)) return { value: input, issues: [wrongType(expected("object", input))] };
    const value: Record<string, unknown> = {};
    const issues: Found[] = [];
    for (const [key, check] of Object.entries(shape)) {
      const present = key in input;
      if (!present && check.optional) continue;
      const result = check(input[key]);
      for (const issue of result.issues) issues.push({ ...issue, path: [key, ...issue.path] });
      if (present || result.value !== undefined) value[key] = result.value;
    }
    if (rule && !issues.some((i) => i.stops)) issues.push(...rule(value));
    return { value, issues };
  };
}

const number = (label: string) => `${label}: enter a number`;

function gaugeKpa(label: string): FieldCheck {
  return num(number(label), [
    atLeast(
      FULL_VACUUM_KPA_GAUGE,
      `${label}: a gauge cannot read below a full vacuum (about −101 kPa) — check the gauge zero`,
    ),
    atMost(MAX_READING_KPA_GAUGE, `${label}: that is above any vehicle A/C pressure — check the unit`),
  ]);
}

function tempC(label: string, minC: number, maxC: number): FieldCheck {
  return num(number(label), [
    atLeast(minC, `${label}: below ${limitC(minC)} is not a reading we can use — check the unit`),
    atMost(maxC, `${label}: above ${limitC(maxC)} is not a reading we can use — check the unit`),
  ]);
}

function percent(label: string): FieldCheck {
  return num(number(label), [
    atLeast(0, `${label} runs from 0 to 100 %`),
    atMost(100, `${label} runs from 0 to 100 %`),
  ]);
}

const custom = (field: string, message: string): Found => ({ path: [field], message, stops: false });
const given = (value: unknown): number | undefined => value as number | undefined;

const systemFields = group({
  refrigerant: oneOf(refrigerantChoices, "Choose the refrigerant on the label"),
  expansionDevice: oneOf(expansionDeviceChoices, "Choose orifice tube or TXV"),
  compressorType: oneOf(compressorTypeChoices, "Choose the compressor type, or 'not known'"),
  labelChargeG: optional(
    num(number("Label charge"), [
      atLeast(50, `Label charge: under ${limitG(50)} is not a vehicle charge — check the unit`),
      atMost(5000, `Label charge: over ${limitG(5000)} is not a light-vehicle charge — check the unit`),
    ]),
  ),
  oilType: optional(oneOf(oilTypeChoices, "Choose the oil type or leave it blank")),
});

const checks: Record<GroupId, (input: unknown) => Checked> = {
  complaint: group({
    ownerWords: text(
      "multi",
      "Write down the complaint",
      [1, "Write down the complaint in the owner's words"],
      [2000, "Keep the complaint under 2000 characters"],
    ),
  }),
  system: (input) => systemFields(compressorTypeFromOlderAnswer(input)),
  conditions: group({
    ambientC: tempC("Ambient temperature", -30, 55),
    relativeHumidityPct: optional(
      num(number("Humidity"), [
        atLeast(0, "Humidity runs from 0 to 100 %"),
        atMost(100, "Humidity runs from 0 to 100 %"),
      ]),
    ),
    altitudeM: optional(
      num(number("Altitude"), [
        atLeast(-450, "Altitude: below −450 m is not a place a vehicle can be — check the unit"),
        atMost(5000, "Altitude: above 5000 m is higher than we handle — check the unit"),
      ]),
    ),
    engineRpm: optional(
      num(
        number("Engine speed"),
        [
          atLeast(0, "Engine speed cannot be negative"),
          atMost(8000, "Engine speed: above 8000 rpm is not a test speed"),
        ],
        "Engine speed: whole revolutions per minute",
      ),
    ),
  }),
  static: group({
    sealantSeen: optional(yesNo("Say whether you saw sealant at the ports")),
    staticKpaGauge: optional(gaugeKpa("Static pressure")),
    staticSoakC: optional(tempC("Soak temperature", -30, 60)),
    staticSoakMin: optional(
      num("Soak time: enter a number of minutes", [
        atLeast(0, "Soak time cannot be negative"),
        atMost(10080, "Soak time: over a week is not a soak — check the unit"),
      ]),
    ),
  }),
  running: group(
    {
      highKpaGauge: optional(gaugeKpa("High side")),
      lowKpaGauge: optional(gaugeKpa("Low side")),
      liquidLineC: optional(tempC("Liquid line", -40, 110)),
      suctionLineC: optional(tempC("Suction line", -40, 80)),
      ventC: optional(tempC("Vent", -30, 60)),
      lowCutOutKpaGauge: optional(gaugeKpa("Low side at cut-out")),
      lowCutInKpaGauge: optional(gaugeKpa("Low side at cut-in")),
    },
    (r) => {
      const found: Found[] = [];
      const cutOut = given(r.lowCutOutKpaGauge);
      const cutIn = given(r.lowCutInKpaGauge);
      if (cutOut !== undefined && cutIn !== undefined && cutIn < cutOut) {
        found.push(
          custom(
            "lowCutInKpaGauge",
            "The clutch cuts back in at a higher low side than it cuts out — the two look swapped",
          ),
        );
      }
      const high = given(r.highKpaGauge);
      const low = given(r.lowKpaGauge);
      if (high !== undefined && low !== undefined && low > high + GAUGE_DISAGREEMENT_KPA) {
        found.push(
          custom("lowKpaGauge", "The low side reads above the high side — check the hose connections"),
        );
      }
      return found;
    },
  ),
  behaviour: group({
    symptoms: (input) => {
      if (!Array.isArray(input)) return { value: input, issues: [wrongType(expected("array", input))] };
      const issues: Found[] = [];
      input.forEach((item, index) => {
        if (!(typeof item === "string" && (behaviourSymptomIds as readonly string[]).includes(item)))
          issues.push({ ...wrongType("That is not one of the listed behaviours"), path: [index] });
      });
      if (issues.length === 0 && new Set(input).size !== input.length)
        issues.push(outOfRange("Each behaviour can be ticked once"));
      return { value: [...input] as unknown[], issues };
    },
  }),
  identification: group({
    purityPct: optional(percent("Purity")),
    airPct: optional(percent("Air")),
    hydrocarbonFlagged: optional(yesNo("Say whether the identifier flagged hydrocarbon")),
  }),
  chargeAudit: group(
    {
      recovered: yesNo("Say whether the charge was recovered"),
      recoveredChargeG: optional(
        num(number("Recovered mass"), [
          atLeast(0, "Recovered mass cannot be negative"),
          atMost(
            VEHICLE_CHARGE_MASS_MAX_G,
            `Recovered mass: over ${limitG(VEHICLE_CHARGE_MASS_MAX_G)} is not one vehicle's charge — check the unit`,
          ),
        ]),
      ),
      oilRemovedMl: optional(
        num(number("Oil removed"), [
          atLeast(0, "Oil removed cannot be negative"),
          atMost(1000, `Oil removed: over ${limitMl(1000)} is not one vehicle's oil — check the unit`),
        ]),
      ),
      chargedG: optional(
        num(number("Charged mass"), [
          atLeast(0, "Charged mass cannot be negative"),
          atMost(
            VEHICLE_CHARGE_MASS_MAX_G,
            `Charged mass: over ${limitG(VEHICLE_CHARGE_MASS_MAX_G)} is not one vehicle's charge — check the unit`,
          ),
        ]),
      ),
      partReplaced: optional(oneOf(partReplacedChoices, "Say whether a part was replaced, and its oil")),
      compressorOil: optional(oneOf(compressorOilChoices, "Choose what the compressor's oil measured")),
    },
    (a) =>
      !a.recovered && a.recoveredChargeG !== undefined
        ? [
            custom(
              "recoveredChargeG",
              "A recovered mass is entered but the charge is marked not recovered — change one of them",
            ),
          ]
        : [],
  ),
  leakFinding: group({
    method: oneOf(leakMethodChoices, "Choose how you looked for the leak"),
    whereFound: optional(oneOf(leakPlaceChoices, "Choose where the leak is, or 'not found yet'")),
    notes: optional(text("multi", undefined, undefined, [2000, "Keep the notes under 2000 characters"])),
  }),
};

export type GroupParse =
  { ok: true; value: NonNullable<InterviewAnswers[GroupId]> } | { ok: false; issues: AnswerIssue[] };

/** One question group checked on its own, as answerSchemas[group].safeParse would check it. */
export function checkGroupValues(group: GroupId, values: unknown): GroupParse {
  const { value, issues } = checks[group](values);
  if (issues.length === 0) return { ok: true, value: value as NonNullable<InterviewAnswers[GroupId]> };
  return {
    ok: false,
    issues: issues.map((i) => ({ field: i.path.map(String).join("."), message: i.message })),
  };
}
