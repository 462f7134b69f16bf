import { z } from "zod/mini";
import { VEHICLE_CHARGE_MASS_MAX_G } from "@/lib/contracts/case-figures";
import { multiLineText } from "@/lib/contracts/text-mini";
import { ensureEnglishMessages } from "@/lib/contracts/zod-mini-messages";
import { FULL_VACUUM_KPA_GAUGE, MAX_READING_KPA_GAUGE } from "@/lib/refrigerants/gauge-limits";
import { quantityMarker } from "@/lib/units/quantity";

// Limits go into messages as quantity markers, so a °F reader is told "above 131 °F", not "above 55 °C".
const limitC = (c: number) => quantityMarker({ kind: "temperature", value: c, decimals: 0 });
const limitG = (g: number) => quantityMarker({ kind: "mass", value: g });
const limitMl = (ml: number) => quantityMarker({ kind: "volume", value: ml });
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

/*
 * One zod schema per question group, in internal units: gauge readings in kPa gauge,
 * temperatures in °C, masses in g, oil in mL. Screens convert the technician's own units
 * before validating. Messages are written for a technician at the vehicle.
 */

// The gauge limits live in lib/refrigerants/gauge-limits.ts. Tighter limits per refrigerant, and the
// full vacuum at the shop's altitude, are checked once those are known (cross-checks.ts).

// Built with zod's mini build: these schemas run in the browser on every step, and the mini build
// weighs a fraction of the full one. Each check is the one the full build's method adds (`.min(n)` on
// a number is `z.gte(n)`, on a string `z.minLength(n)`), in the same order, with the same messages.
ensureEnglishMessages();

function gaugeKpa(label: string) {
  return z.number({ error: `${label}: enter a number` }).check(
    z.gte(FULL_VACUUM_KPA_GAUGE, {
      error: `${label}: a gauge cannot read below a full vacuum (about −101 kPa) — check the gauge zero`,
    }),
    z.lte(MAX_READING_KPA_GAUGE, {
      error: `${label}: that is above any vehicle A/C pressure — check the unit`,
    }),
  );
}

function tempC(label: string, minC: number, maxC: number) {
  return z
    .number({ error: `${label}: enter a number` })
    .check(
      z.gte(minC, { error: `${label}: below ${limitC(minC)} is not a reading we can use — check the unit` }),
      z.lte(maxC, { error: `${label}: above ${limitC(maxC)} is not a reading we can use — check the unit` }),
    );
}

export const complaintAnswersSchema = z.object({
  ownerWords: multiLineText({ message: "Write down the complaint" }).check(
    z.trim(),
    z.minLength(1, { error: "Write down the complaint in the owner's words" }),
    z.maxLength(2000, { error: "Keep the complaint under 2000 characters" }),
  ),
});

/** Answers saved before the compressor type was asked said only whether it was electric. */
function compressorTypeFromOlderAnswer(value: unknown): unknown {
  if (typeof value !== "object" || value === null) return value;
  const v = value as Record<string, unknown>;
  if (v.compressorType !== undefined || typeof v.electricCompressor !== "boolean") return value;
  const { electricCompressor, ...rest } = v;
  return { ...rest, compressorType: electricCompressor ? "electric" : "unknown" };
}

// The full build's z.preprocess is this pipe: the older answer is rewritten, then checked.
export const systemAnswersSchema = z.pipe(
  z.transform(compressorTypeFromOlderAnswer),
  z.object({
    refrigerant: z.enum(refrigerantChoices, { error: "Choose the refrigerant on the label" }),
    expansionDevice: z.enum(expansionDeviceChoices, { error: "Choose orifice tube or TXV" }),
    compressorType: z.enum(compressorTypeChoices, {
      error: "Choose the compressor type, or 'not known'",
    }),
    labelChargeG: z.optional(
      z.number({ error: "Label charge: enter a number" }).check(
        z.gte(50, { error: `Label charge: under ${limitG(50)} is not a vehicle charge — check the unit` }),
        z.lte(5000, {
          error: `Label charge: over ${limitG(5000)} is not a light-vehicle charge — check the unit`,
        }),
      ),
    ),
    oilType: z.optional(z.enum(oilTypeChoices, { error: "Choose the oil type or leave it blank" })),
  }),
);

export const conditionsAnswersSchema = z.object({
  ambientC: tempC("Ambient temperature", -30, 55),
  relativeHumidityPct: z.optional(
    z
      .number({ error: "Humidity: enter a number" })
      .check(
        z.gte(0, { error: "Humidity runs from 0 to 100 %" }),
        z.lte(100, { error: "Humidity runs from 0 to 100 %" }),
      ),
  ),
  altitudeM: z.optional(
    z
      .number({ error: "Altitude: enter a number" })
      .check(
        z.gte(-450, { error: "Altitude: below −450 m is not a place a vehicle can be — check the unit" }),
        z.lte(5000, { error: "Altitude: above 5000 m is higher than we handle — check the unit" }),
      ),
  ),
  engineRpm: z.optional(
    z
      .number({ error: "Engine speed: enter a number" })
      .check(
        z.int({ error: "Engine speed: whole revolutions per minute" }),
        z.gte(0, { error: "Engine speed cannot be negative" }),
        z.lte(8000, { error: "Engine speed: above 8000 rpm is not a test speed" }),
      ),
  ),
});

export const staticAnswersSchema = z.object({
  /** Looked for before any hose goes on. */
  sealantSeen: z.optional(z.boolean({ error: "Say whether you saw sealant at the ports" })),
  staticKpaGauge: z.optional(gaugeKpa("Static pressure")),
  /** The temperature the parts soaked to, measured beside the lines. */
  staticSoakC: z.optional(tempC("Soak temperature", -30, 60)),
  staticSoakMin: z.optional(
    z
      .number({ error: "Soak time: enter a number of minutes" })
      .check(
        z.gte(0, { error: "Soak time cannot be negative" }),
        z.lte(10080, { error: "Soak time: over a week is not a soak — check the unit" }),
      ),
  ),
});

// Two service gauges on equalised pressures can disagree by a few psi; 50 kPa leaves room for that (common practice).
export const GAUGE_DISAGREEMENT_KPA = 50;

export const runningAnswersSchema = z
  .object({
    highKpaGauge: z.optional(gaugeKpa("High side")),
    lowKpaGauge: z.optional(gaugeKpa("Low side")),
    liquidLineC: z.optional(tempC("Liquid line", -40, 110)),
    suctionLineC: z.optional(tempC("Suction line", -40, 80)),
    ventC: z.optional(tempC("Vent", -30, 60)),
    /** Cycling-clutch systems: the low side when the clutch cuts out and when it cuts back in. */
    lowCutOutKpaGauge: z.optional(gaugeKpa("Low side at cut-out")),
    lowCutInKpaGauge: z.optional(gaugeKpa("Low side at cut-in")),
  })
  .check(
    z.superRefine((r, ctx) => {
      if (
        r.lowCutOutKpaGauge !== undefined &&
        r.lowCutInKpaGauge !== undefined &&
        r.lowCutInKpaGauge < r.lowCutOutKpaGauge
      ) {
        ctx.addIssue({
          code: "custom",
          path: ["lowCutInKpaGauge"],
          message: "The clutch cuts back in at a higher low side than it cuts out — the two look swapped",
        });
      }
      const { highKpaGauge, lowKpaGauge } = r;
      if (
        highKpaGauge !== undefined &&
        lowKpaGauge !== undefined &&
        lowKpaGauge > highKpaGauge + GAUGE_DISAGREEMENT_KPA
      ) {
        ctx.addIssue({
          code: "custom",
          path: ["lowKpaGauge"],
          message: "The low side reads above the high side — check the hose connections",
        });
      }
    }),
  );

export const behaviourAnswersSchema = z.object({
  symptoms: z
    .array(z.enum(behaviourSymptomIds, { error: "That is not one of the listed behaviours" }))
    .check(
      z.refine((list) => new Set(list).size === list.length, { error: "Each behaviour can be ticked once" }),
    ),
});

const percent = (label: string) =>
  z
    .number({ error: `${label}: enter a number` })
    .check(
      z.gte(0, { error: `${label} runs from 0 to 100 %` }),
      z.lte(100, { error: `${label} runs from 0 to 100 %` }),
    );

export const identificationAnswersSchema = z.object({
  purityPct: z.optional(percent("Purity")),
  airPct: z.optional(percent("Air")),
  hydrocarbonFlagged: z.optional(z.boolean({ error: "Say whether the identifier flagged hydrocarbon" })),
});

export const chargeAuditAnswersSchema = z
  .object({
    recovered: z.boolean({ error: "Say whether the charge was recovered" }),
    recoveredChargeG: z.optional(
      z.number({ error: "Recovered mass: enter a number" }).check(
        z.gte(0, { error: "Recovered mass cannot be negative" }),
        z.lte(VEHICLE_CHARGE_MASS_MAX_G, {
          error: `Recovered mass: over ${limitG(VEHICLE_CHARGE_MASS_MAX_G)} is not one vehicle's charge — check the unit`,
        }),
      ),
    ),
    oilRemovedMl: z.optional(
      z.number({ error: "Oil removed: enter a number" }).check(
        z.gte(0, { error: "Oil removed cannot be negative" }),
        z.lte(1000, {
          error: `Oil removed: over ${limitMl(1000)} is not one vehicle's oil — check the unit`,
        }),
      ),
    ),
    /** Weighed in after the repair; lifts the do-not-run rule once the system holds a charge again. */
    chargedG: z.optional(
      z.number({ error: "Charged mass: enter a number" }).check(
        z.gte(0, { error: "Charged mass cannot be negative" }),
        z.lte(VEHICLE_CHARGE_MASS_MAX_G, {
          error: `Charged mass: over ${limitG(VEHICLE_CHARGE_MASS_MAX_G)} is not one vehicle's charge — check the unit`,
        }),
      ),
    ),
    partReplaced: z.optional(
      z.enum(partReplacedChoices, { error: "Say whether a part was replaced, and its oil" }),
    ),
    compressorOil: z.optional(
      z.enum(compressorOilChoices, { error: "Choose what the compressor's oil measured" }),
    ),
  })
  .check(
    z.superRefine((a, ctx) => {
      if (!a.recovered && a.recoveredChargeG !== undefined) {
        ctx.addIssue({
          code: "custom",
          path: ["recoveredChargeG"],
          message: "A recovered mass is entered but the charge is marked not recovered — change one of them",
        });
      }
    }),
  );

export const leakFindingAnswersSchema = z.object({
  method: z.enum(leakMethodChoices, { error: "Choose how you looked for the leak" }),
  whereFound: z.optional(z.enum(leakPlaceChoices, { error: "Choose where the leak is, or 'not found yet'" })),
  notes: z.optional(
    multiLineText().check(z.trim(), z.maxLength(2000, { error: "Keep the notes under 2000 characters" })),
  ),
});

export const answerSchemas = {
  complaint: complaintAnswersSchema,
  system: systemAnswersSchema,
  conditions: conditionsAnswersSchema,
  static: staticAnswersSchema,
  running: runningAnswersSchema,
  behaviour: behaviourAnswersSchema,
  identification: identificationAnswersSchema,
  chargeAudit: chargeAuditAnswersSchema,
  leakFinding: leakFindingAnswersSchema,
} as const;

/** Every group at once, each group checked on its own; interviewAnswersSchema (checked-answers.ts) adds the cross-checks. */
export const interviewAnswersObjectSchema = z.object({
  complaint: z.optional(complaintAnswersSchema),
  system: z.optional(systemAnswersSchema),
  conditions: z.optional(conditionsAnswersSchema),
  static: z.optional(staticAnswersSchema),
  running: z.optional(runningAnswersSchema),
  behaviour: z.optional(behaviourAnswersSchema),
  identification: z.optional(identificationAnswersSchema),
  chargeAudit: z.optional(chargeAuditAnswersSchema),
  leakFinding: z.optional(leakFindingAnswersSchema),
});

export type InterviewAnswers = z.infer<typeof interviewAnswersObjectSchema>;
export type AnswersFor<G extends keyof typeof answerSchemas> = z.infer<(typeof answerSchemas)[G]>;
