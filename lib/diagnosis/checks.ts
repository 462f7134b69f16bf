import type { Extraction } from "./evidence-types";
import { READING_GRADES, type ObservationId, type ReadingGroup } from "./observations";
import type { DiagnosisInput } from "./schema";
import type { SymptomId } from "./symptoms";

export type CheckId =
  | "leak_test"
  | "static_repeat"
  | "static_pressure"
  | "identify_refrigerant"
  | "running_pressures"
  | "liquid_line_temperature"
  | "suction_line_temperature"
  | "recover_and_weigh"
  | "vent_temperature"
  | "condenser_fan"
  | "condenser_water_spray"
  | "watch_low_side"
  | "txv_bulb_test"
  | "liquid_line_survey";

export interface CheckContext {
  input: DiagnosisInput;
  extraction: Extraction;
  symptoms: ReadonlySet<SymptomId>;
  /** The refrigerant failed identification: no pressure–temperature checks, no recovery into shop equipment. */
  mixed: boolean;
  /** The "do not run" state: only checks that leave the compressor off. */
  doNotRun: boolean;
  /** Log-odds of the leader over the runner-up. */
  gapLogOdds: number;
}

export interface CheckDefinition {
  id: CheckId;
  instruction: string;
  /** True when the check runs the compressor: never offered in the "do not run" state. */
  runsSystem: boolean;
  available: (ctx: CheckContext) => boolean;
  /** Each possible result, as the observations it would add. */
  outcomes: (ctx: CheckContext) => ObservationId[][];
}

const GRADE_OUTCOMES = new Map<ReadingGroup, ObservationId[][]>();
const grades = (group: ReadingGroup): ObservationId[][] => {
  let outcomes = GRADE_OUTCOMES.get(group);
  if (!outcomes) {
    outcomes = READING_GRADES[group].map((grade) => [`${group}:${grade}` as ObservationId]);
    GRADE_OUTCOMES.set(group, outcomes);
  }
  return outcomes;
};
const BOTH_SIDES: ObservationId[][] = grades("high_side").flatMap((h) =>
  grades("low_side").map((l) => [...h, ...l]),
);
const EITHER = new Map<string, ObservationId[][]>();
const either = (a: SymptomId, b: SymptomId): ObservationId[][] => {
  const key = `${a}|${b}`;
  let outcomes = EITHER.get(key);
  if (!outcomes) {
    outcomes = [[`symptom:${a}`], [`symptom:${b}`]];
    EITHER.set(key, outcomes);
  }
  return outcomes;
};
const neither = (ctx: CheckContext, ...ids: SymptomId[]) => ids.every((id) => !ctx.symptoms.has(id));

const IDENTIFIER_OUTCOMES: ObservationId[][] = [
  ["purity:fail"],
  ["purity:pass", "air:none"],
  ["purity:pass", "air:some"],
  ["purity:pass", "air:high"],
];
// An orifice-tube evaporator floods into the accumulator, so "near zero" is not a separate result there.
const ORIFICE_SUPERHEAT_OUTCOMES: ObservationId[][] = [
  ["superheat:normal"],
  ["superheat:high"],
  ["superheat:very_high"],
];

/** Ordered cheapest and least intrusive first: on a tie the earlier check wins. */
export const CHECKS: readonly CheckDefinition[] = [
  {
    id: "static_pressure",
    runsSystem: false,
    instruction:
      "Switch the engine off, let the system settle to the air temperature around it (in shade, pressures equalised), then read the static pressure and the air temperature beside the lines.",
    available: (ctx) => !ctx.mixed && ctx.input.staticKpaGauge === undefined,
    outcomes: () => grades("static"),
  },
  {
    id: "identify_refrigerant",
    runsSystem: false,
    instruction:
      "Connect a refrigerant identifier (SAE J2912 type) to the low-side port and record purity and air percentages before connecting any recovery machine.",
    available: (ctx) => ctx.input.identifierPurityPct === undefined,
    outcomes: () => IDENTIFIER_OUTCOMES,
  },
  {
    id: "condenser_fan",
    runsSystem: true,
    instruction:
      "With the A/C on, check that the condenser fan runs and that nothing blocks the condenser face.",
    available: (ctx) => neither(ctx, "condenser_fan_running", "condenser_fan_not_running"),
    outcomes: () => either("condenser_fan_running", "condenser_fan_not_running"),
  },
  {
    id: "vent_temperature",
    runsSystem: true,
    instruction:
      "Run at the usual test conditions for 5–10 minutes and read the centre-vent temperature with a probe thermometer.",
    available: (ctx) => ctx.input.ventC === undefined,
    outcomes: () => grades("vent"),
  },
  {
    id: "running_pressures",
    runsSystem: true,
    instruction:
      "Connect the gauges and run at the usual test conditions (engine warm, about 1,500 rpm, A/C max, blower high) for 5–10 minutes, then read the high and low side.",
    available: (ctx) =>
      !ctx.mixed && (ctx.input.highKpaGauge === undefined || ctx.input.lowKpaGauge === undefined),
    outcomes: (ctx) =>
      ctx.input.highKpaGauge === undefined
        ? ctx.input.lowKpaGauge === undefined
          ? BOTH_SIDES
          : grades("high_side")
        : grades("low_side"),
  },
  {
    id: "liquid_line_temperature",
    runsSystem: true,
    instruction:
      "Clamp a contact thermometer on the liquid line at the condenser outlet and read it together with the high side, to work out the subcooling.",
    available: (ctx) =>
      !ctx.mixed && ctx.input.liquidLineC === undefined && !ctx.extraction.computed.highSideTranscritical,
    outcomes: () => grades("subcooling"),
  },
  {
    id: "suction_line_temperature",
    runsSystem: true,
    instruction:
      "Clamp a contact thermometer on the suction line at the evaporator outlet and read it together with the low side, to work out the superheat.",
    available: (ctx) => !ctx.mixed && ctx.input.suctionLineC === undefined,
    outcomes: (ctx) =>
      ctx.input.expansionDevice === "txv" ? grades("superheat") : ORIFICE_SUPERHEAT_OUTCOMES,
  },
  {
    id: "condenser_water_spray",
    runsSystem: true,
    instruction:
      "With the system running and the gauges on, spray water gently across the condenser face and watch the high side.",
    available: (ctx) =>
      !ctx.mixed && neither(ctx, "water_spray_drops_head_pressure", "water_spray_no_change"),
    outcomes: () => either("water_spray_drops_head_pressure", "water_spray_no_change"),
  },
  {
    id: "watch_low_side",
    runsSystem: true,
    instruction:
      "Run at the usual test conditions for 15 minutes and note whether the low side stays steady or swings down toward vacuum and back.",
    available: (ctx) => !ctx.mixed && neither(ctx, "low_side_swings_to_vacuum", "low_side_steady"),
    outcomes: () => either("low_side_swings_to_vacuum", "low_side_steady"),
  },
  {
    id: "txv_bulb_test",
    runsSystem: true,
    instruction:
      "With the A/C on max, chill the expansion-valve bulb (the low side should fall), then warm it in your hand (the low side should rise).",
    available: (ctx) =>
      !ctx.mixed &&
      ctx.input.expansionDevice === "txv" &&
      neither(ctx, "txv_bulb_test_responds", "txv_bulb_test_no_response"),
    outcomes: () => either("txv_bulb_test_responds", "txv_bulb_test_no_response"),
  },
  {
    id: "liquid_line_survey",
    runsSystem: true,
    instruction:
      "Run the system and take contact-thermometer readings along the liquid line from the condenser outlet, across the drier, to the expansion device; look for a sharp drop.",
    available: (ctx) =>
      !ctx.mixed && neither(ctx, "liquid_line_temperature_drop", "liquid_line_even_temperature"),
    outcomes: () => either("liquid_line_temperature_drop", "liquid_line_even_temperature"),
  },
  {
    id: "recover_and_weigh",
    runsSystem: false,
    instruction:
      "Identify the refrigerant, then recover the charge with certified equipment (slowly on orifice-tube systems), weigh it against the label charge and measure the oil that came out.",
    available: (ctx) =>
      !ctx.mixed && ctx.input.recoveredChargeG === undefined && ctx.input.labelChargeG !== undefined,
    outcomes: () => grades("charge"),
  },
  {
    id: "leak_test",
    runsSystem: false,
    instruction:
      "Find the leak: pressurise with dry nitrogen or an approved tracer gas (SAE J2970) as the maker's procedure allows, or use an electronic detector at its most sensitive setting (SAE J2791/J2913) or UV dye (SAE J2297); confirm any hit a second way.",
    available: (ctx) => neither(ctx, "leak_found", "no_leak_found"),
    outcomes: () => either("leak_found", "no_leak_found"),
  },
];
