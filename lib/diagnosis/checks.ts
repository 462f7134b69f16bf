import type { Extraction } from "./evidence-types";
import { READING_GRADES, type ObservationId, type ReadingGroup } from "./observations";
import type { DiagnosisInput } from "./schema";
import type { SymptomId } from "./symptoms";

export type CheckId =
  | "look_for_sealant"
  | "identify_refrigerant"
  | "static_pressure"
  | "static_repeat"
  | "condenser_fan"
  | "vent_temperature"
  | "running_pressures"
  | "cycling_points"
  | "liquid_line_temperature"
  | "suction_line_temperature"
  | "condenser_water_spray"
  | "watch_low_side"
  | "txv_bulb_test"
  | "liquid_line_survey"
  | "recover_and_weigh"
  | "drain_compressor_oil"
  | "leak_test";

export interface CheckContext {
  input: DiagnosisInput;
  extraction: Extraction;
  symptoms: ReadonlySet<SymptomId>;
  /** The refrigerant failed identification: no pressure–temperature checks, no recovery into shop equipment. */
  refrigerantContaminated: boolean;
  /** The "do not run" state: only checks that leave the compressor off. */
  doNotRun: boolean;
  /** Log-odds of the leader over the runner-up. */
  gapLogOdds: number;
}

export interface CheckDefinition {
  id: CheckId;
  /** One instruction, phrased for the system in front of the technician. */
  instruction: (ctx: CheckContext) => string;
  /** True when the check runs the compressor: never offered in the "do not run" state. */
  runsSystem: boolean;
  /** True when it puts a hose on a service port: sealant is looked for first, and the refrigerant identified. */
  connectsHose: boolean;
  available: (ctx: CheckContext) => boolean;
  /** Each possible result, as the observations it would add; results the readings already exclude are left out. */
  outcomes: (ctx: CheckContext) => ObservationId[][];
}

const GRADE_OUTCOMES = new Map<ReadingGroup, ObservationId[][]>();
const grades = (group: ReadingGroup): ObservationId[][] => {
  let outcomes = GRADE_OUTCOMES.get(group);
  // Stryker disable next-line ConditionalExpression: the cache only spares rebuilding a list with the same contents
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
  // Stryker disable next-line ConditionalExpression: the cache only spares rebuilding a list with the same contents
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
// A running high side that condenses above the air temperature proves liquid is there: the static
// cannot come back empty or without liquid, nor the recovery empty.
const STATIC_WITH_LIQUID = grades("static").filter(
  ([id]) => id !== "static:empty" && id !== "static:no_liquid",
);
const CHARGE_WITH_LIQUID = grades("charge").filter(([id]) => id !== "charge:empty");

/** The running high side condenses above the ambient air: there is liquid in the system. */
export function liquidProven(ctx: CheckContext): boolean {
  const { condensingC } = ctx.extraction.computed;
  return condensingC !== undefined && condensingC > ctx.input.ambientC;
}

/** The static check came back with liquid in the system. */
const staticShowsLiquid = (ctx: CheckContext) =>
  ctx.extraction.observations.some(
    (o) => o.id.startsWith("static:") && o.id !== "static:empty" && o.id !== "static:no_liquid",
  );

const electric = (ctx: CheckContext) => ctx.input.compressorType === "electric";
/** How to run the system for a test: a hybrid or electric car runs its compressor in ready mode, not on the engine. */
const running = (ctx: CheckContext) =>
  electric(ctx)
    ? "in the vehicle's ready mode (high-voltage system on), A/C on max, blower high"
    : "at the usual test conditions (engine warm, about 1,500 rpm, A/C on max, blower high)";
const recovered = (ctx: CheckContext) => ctx.input.recoveredChargeG !== undefined;

/** Ordered cheapest and least intrusive first: on a tie the earlier check wins. */
export const CHECKS: readonly CheckDefinition[] = [
  {
    id: "look_for_sealant",
    instruction: () =>
      "Before any hose goes on, look for leak sealant: residue at the service ports, a sealant-can label or sticker under the hood, or a sealant detector at the low-side port if the shop has one.",
    runsSystem: false,
    connectsHose: false,
    available: (ctx) => neither(ctx, "sealant_found", "no_sealant_found"),
    outcomes: () => either("sealant_found", "no_sealant_found"),
  },
  {
    id: "identify_refrigerant",
    instruction: () =>
      "Connect a refrigerant identifier (SAE J2912 type) to the low-side port and record purity and air percentages before connecting gauges or any recovery machine.",
    runsSystem: false,
    connectsHose: true,
    available: (ctx) => ctx.input.identifierPurityPct === undefined && !recovered(ctx),
    outcomes: () => IDENTIFIER_OUTCOMES,
  },
  {
    id: "static_pressure",
    instruction: (ctx) =>
      `${electric(ctx) ? "With the vehicle switched off (not in ready mode)" : "With the engine off"}, let the system settle to the temperature around it (in shade, pressures equalised, an hour or more), then read the static pressure and the temperature of the parts beside the lines.`,
    runsSystem: false,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated && ctx.input.staticKpaGauge === undefined && !recovered(ctx),
    outcomes: (ctx) => (liquidProven(ctx) ? STATIC_WITH_LIQUID : grades("static")),
  },
  {
    id: "condenser_fan",
    instruction: (ctx) =>
      `With the system running ${running(ctx)}, check that the condenser fan runs and that nothing blocks the condenser face.`,
    runsSystem: true,
    connectsHose: false,
    available: (ctx) => neither(ctx, "condenser_fan_running", "condenser_fan_not_running"),
    outcomes: () => either("condenser_fan_running", "condenser_fan_not_running"),
  },
  {
    id: "vent_temperature",
    instruction: (ctx) =>
      `Run ${running(ctx)} for 5–10 minutes and read the centre-vent temperature with a probe thermometer.`,
    runsSystem: true,
    connectsHose: false,
    available: (ctx) => ctx.input.ventC === undefined,
    outcomes: () => grades("vent"),
  },
  {
    id: "running_pressures",
    instruction: (ctx) =>
      `Connect the gauges and run ${running(ctx)} for 5–10 minutes, then read the high and low side${electric(ctx) ? "; read the compressor's speed request and the inverter data with a scan tool" : ""}.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      (ctx.input.highKpaGauge === undefined || ctx.input.lowKpaGauge === undefined),
    outcomes: (ctx) =>
      ctx.input.highKpaGauge === undefined
        ? ctx.input.lowKpaGauge === undefined
          ? BOTH_SIDES
          : grades("high_side")
        : grades("low_side"),
  },
  {
    id: "cycling_points",
    instruction: (ctx) =>
      `With the gauges on, run ${running(ctx)} and note the low side at the moment the clutch cuts out and again at the moment it cuts back in.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      ctx.input.compressorType === "cycling_clutch" &&
      (ctx.input.lowCutOutKpaGauge === undefined || ctx.input.lowCutInKpaGauge === undefined),
    outcomes: () => grades("cycling"),
  },
  {
    id: "liquid_line_temperature",
    instruction: () =>
      "Clamp a contact thermometer on the liquid line at the condenser outlet and read it together with the high side, to work out the subcooling.",
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      ctx.input.liquidLineC === undefined &&
      !ctx.extraction.computed.highSideTranscritical,
    outcomes: () => grades("subcooling"),
  },
  {
    id: "suction_line_temperature",
    instruction: (ctx) =>
      `Clamp a contact thermometer on the suction line at the ${ctx.input.expansionDevice === "txv" ? "evaporator outlet" : "accumulator outlet"} and read it together with the low side, to work out the superheat.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) => !ctx.refrigerantContaminated && ctx.input.suctionLineC === undefined,
    outcomes: (ctx) =>
      ctx.input.expansionDevice === "txv" ? grades("superheat") : ORIFICE_SUPERHEAT_OUTCOMES,
  },
  {
    id: "condenser_water_spray",
    instruction: (ctx) =>
      `With the gauges on and the system running ${running(ctx)}, spray water gently across the condenser face and watch the high side.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      neither(ctx, "water_spray_drops_head_pressure", "water_spray_no_change"),
    outcomes: () => either("water_spray_drops_head_pressure", "water_spray_no_change"),
  },
  {
    id: "watch_low_side",
    instruction: (ctx) =>
      `With the gauges on, run ${running(ctx)} for 15 minutes and note whether the low side stays steady or swings down toward vacuum and back.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated && neither(ctx, "low_side_swings_to_vacuum", "low_side_steady"),
    outcomes: () => either("low_side_swings_to_vacuum", "low_side_steady"),
  },
  {
    id: "txv_bulb_test",
    instruction: (ctx) =>
      `With the gauges on and the system running ${running(ctx)}, chill the expansion valve's sensing element (on most cars a block valve: its head and outlet passage; on a valve with a remote bulb, the bulb): the low side should fall. Then warm it by hand: the low side should rise.`,
    runsSystem: true,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      ctx.input.expansionDevice === "txv" &&
      neither(ctx, "txv_bulb_test_responds", "txv_bulb_test_no_response"),
    outcomes: () => either("txv_bulb_test_responds", "txv_bulb_test_no_response"),
  },
  {
    id: "liquid_line_survey",
    instruction: (ctx) =>
      `Run ${running(ctx)} and take contact-thermometer readings along the liquid line from the condenser outlet, across the drier, to the expansion device; look for a sharp drop.`,
    runsSystem: true,
    connectsHose: false,
    available: (ctx) =>
      !ctx.refrigerantContaminated &&
      neither(ctx, "liquid_line_temperature_drop", "liquid_line_even_temperature"),
    outcomes: () => either("liquid_line_temperature_drop", "liquid_line_even_temperature"),
  },
  {
    id: "recover_and_weigh",
    instruction: (ctx) =>
      `Recover the charge with certified equipment${electric(ctx) ? " that injects no oil (dedicated to electric compressors)" : ""}${ctx.input.expansionDevice === "orifice_tube" ? ", slowly, so the accumulator's oil is not pulled out" : ""}; weigh it against the label charge and measure the oil that came out.`,
    runsSystem: false,
    connectsHose: true,
    available: (ctx) =>
      !ctx.refrigerantContaminated && !recovered(ctx) && ctx.input.labelChargeG !== undefined,
    outcomes: (ctx) => (liquidProven(ctx) || staticShowsLiquid(ctx) ? CHARGE_WITH_LIQUID : grades("charge")),
  },
  {
    id: "drain_compressor_oil",
    instruction: () =>
      "With the charge recovered, drain the compressor's oil into a graduated container and measure it against the maker's quantity for the compressor.",
    runsSystem: false,
    connectsHose: false,
    available: (ctx) => recovered(ctx) && neither(ctx, "oil_short_at_drain", "oil_normal_at_drain"),
    outcomes: () => either("oil_short_at_drain", "oil_normal_at_drain"),
  },
  {
    id: "leak_test",
    instruction: () =>
      "Find the leak: pressurise with dry nitrogen or an approved tracer gas (SAE J2970) as the maker's procedure allows, or use an electronic detector at its most sensitive setting (SAE J2791/J2913) or UV dye (SAE J2297); confirm any hit a second way.",
    runsSystem: false,
    connectsHose: true,
    available: (ctx) => neither(ctx, "leak_found", "no_leak_found"),
    outcomes: () => either("leak_found", "no_leak_found"),
  },
];
