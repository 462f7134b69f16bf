import { z } from "zod";
import { multiLineText, plausibleInstant, singleLineText } from "./text";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import { REPLACED_PART_IDS } from "@/lib/service/oil";
import { type CaseFigures, VEHICLE_CHARGE_MASS_MAX_G } from "./case-figures";
import {
  gaugeKpaQuantity,
  massGQuantity,
  type Quantity,
  quantityMarker,
  tempCQuantity,
  vacuumKpaAbsQuantity,
  volumeMlQuantity,
} from "@/lib/units/quantity";

export const SERVICE_STEPS = ["identify", "recovery", "evacuation", "oil", "recharge", "final"] as const;
export type ServiceStepId = (typeof SERVICE_STEPS)[number];

/**
 * A limit's figure: a quantity kind becomes a marker, so the message reaches each reader in their own
 * units (the route answers it in SI with the marked wording beside it); a plain unit stays as written.
 */
type LimitUnit = "%" | "min" | ((value: number) => Quantity);
const figure = (value: number, unit: LimitUnit) =>
  typeof unit === "function" ? quantityMarker(unit(value)) : `${value} ${unit}`;
const num = (label: string, min: number, max: number, unit: LimitUnit) =>
  z
    .number({ message: `${label} is a number.` })
    .min(min, `${label} cannot be below ${figure(min, unit)}.`)
    .max(max, `${label} cannot be above ${figure(max, unit)}.`)
    .nullable()
    .optional();
const whole = (label: string, min: number, max: number, unit: LimitUnit, wholeUnit: string) =>
  z
    .number({ message: `${label} is a number.` })
    .int(`${label} is in whole ${wholeUnit}.`)
    .min(min, `${label} cannot be below ${figure(min, unit)}.`)
    .max(max, `${label} cannot be above ${figure(max, unit)}.`)
    .nullable()
    .optional();
const id = (label: string) =>
  z
    .number({ message: `${label}: choose one from the list.` })
    .int()
    .positive()
    .nullable()
    .optional();
const instant = plausibleInstant("Give a date and time.").nullable().optional();
const line = (max: number) =>
  singleLineText().trim().max(max, `At most ${max} characters.`).nullable().optional();
const text = (max: number) =>
  multiLineText().trim().max(max, `At most ${max} characters.`).nullable().optional();

/** A save of the service record: every value in internal units (g, mL, kPa absolute, °C); empty fields are null. */
/** The step that asks for each field of the record: the rules above and the screen's messages read it. */
export const SERVICE_STEP_OF_FIELD = {
  specEntryId: "identify",
  labelChargeG: "identify",
  purityPct: "identify",
  airPct: "identify",
  recoveryStartedAt: "recovery",
  recoveryEndedAt: "recovery",
  recoveredChargeG: "recovery",
  recoveryCylinderId: "recovery",
  oilRemovedMl: "recovery",
  oilPulled: "recovery",
  slowRecoveryNote: "recovery",
  deepestKpaAbs: "evacuation",
  holdStartKpaAbs: "evacuation",
  holdEndKpaAbs: "evacuation",
  holdMinutes: "evacuation",
  oilAddedType: "oil",
  oilAddedMl: "oil",
  partsReplaced: "oil",
  targetG: "recharge",
  chargedG: "recharge",
  chargeCylinderId: "recharge",
  finalAmbientC: "final",
  finalHighKpaGauge: "final",
  finalLowKpaGauge: "final",
  finalVentC: "final",
  notes: "final",
} as const satisfies Record<string, ServiceStepId>;

/**
 * The record's `step` is where it resumes: saving a step sends the step after it. So a step's fields are
 * settled once the record's step has moved past it.
 */
function movedPast(step: ServiceStepId, asked: ServiceStepId): boolean {
  return SERVICE_STEPS.indexOf(step) > SERVICE_STEPS.indexOf(asked);
}

export const serviceRecordInputSchema = z
  .object({
    baseVersion: z
      .number({ message: "baseVersion is the version you last loaded (0 for a new record)." })
      .int()
      .min(0),
    step: z.enum(SERVICE_STEPS, { message: "Unknown step." }),
    specEntryId: id("Spec row"),
    labelChargeG: whole("Label charge", 50, 5000, massGQuantity, "grams"),
    purityPct: num("Purity", 0, 100, "%"),
    airPct: num("Air", 0, 100, "%"),
    recoveryStartedAt: instant,
    recoveryEndedAt: instant,
    recoveredChargeG: whole("Recovered mass", 0, VEHICLE_CHARGE_MASS_MAX_G, massGQuantity, "grams"),
    recoveryCylinderId: id("Recovery cylinder"),
    oilRemovedMl: whole("Oil drained", 0, 1000, volumeMlQuantity, "millilitres"),
    oilPulled: z.boolean().default(false),
    slowRecoveryNote: text(2000),
    deepestKpaAbs: num("Deepest vacuum", 0, 110, vacuumKpaAbsQuantity),
    holdStartKpaAbs: num("Vacuum at the start of the hold", 0, 110, vacuumKpaAbsQuantity),
    holdEndKpaAbs: num("Vacuum at the end of the hold", 0, 110, vacuumKpaAbsQuantity),
    holdMinutes: num("Hold time", 0.5, 240, "min"),
    oilAddedType: line(60),
    oilAddedMl: whole("Oil added", 0, 1000, volumeMlQuantity, "millilitres"),
    partsReplaced: z
      .array(
        z.object({
          part: z.enum(REPLACED_PART_IDS, { message: "Unknown part." }),
          count: z.number().int().min(1).max(10).default(1),
          measuredMl: whole("Oil measured from the part", 0, 500, volumeMlQuantity, "millilitres"),
        }),
      )
      .max(12, "At most 12 replaced parts.")
      .default([]),
    targetG: whole("Target charge", 50, 5000, massGQuantity, "grams"),
    chargedG: whole("Charged mass", 0, VEHICLE_CHARGE_MASS_MAX_G, massGQuantity, "grams"),
    chargeCylinderId: id("Charging cylinder"),
    finalAmbientC: num("Ambient temperature", -30, 60, (v) => tempCQuantity(v)),
    finalHighKpaGauge: num("High side", -101, 4000, gaugeKpaQuantity),
    finalLowKpaGauge: num("Low side", -101, 1500, gaugeKpaQuantity),
    finalVentC: num("Centre vent temperature", -10, 50, (v) => tempCQuantity(v)),
    notes: text(4000),
  })
  .strict()
  .refine(
    (r) =>
      !r.recoveryStartedAt ||
      !r.recoveryEndedAt ||
      Date.parse(r.recoveryEndedAt) >= Date.parse(r.recoveryStartedAt),
    {
      message: "Recovery cannot end before it started.",
      path: ["recoveryEndedAt"],
    },
  )
  // A mass needs its cylinder once the step that asks for the cylinder is saved. A mass brought over from
  // the interview may sit on the record before then (the ledger line is written when the cylinder is
  // named), so an earlier step never refuses for a field it does not show.
  .refine(
    (r) =>
      !movedPast(r.step, SERVICE_STEP_OF_FIELD.recoveryCylinderId) ||
      !(r.recoveredChargeG && r.recoveredChargeG > 0) ||
      r.recoveryCylinderId,
    {
      message: "Choose the recovery cylinder the refrigerant went into: the ledger needs it.",
      path: ["recoveryCylinderId"],
    },
  )
  .refine(
    (r) =>
      !movedPast(r.step, SERVICE_STEP_OF_FIELD.chargeCylinderId) ||
      !(r.chargedG && r.chargedG > 0) ||
      r.chargeCylinderId,
    {
      message: "Choose the cylinder the charge came from: the ledger needs it.",
      path: ["chargeCylinderId"],
    },
  );
export type ServiceRecordInput = z.infer<typeof serviceRecordInputSchema>;
export type ServiceRecordDraft = z.input<typeof serviceRecordInputSchema>;
/** Every field of the record has its step above: a new field without one fails the typecheck here. */
export type ServiceFieldsWithoutAStep = Exclude<
  keyof ServiceRecordInput,
  "baseVersion" | "step" | keyof typeof SERVICE_STEP_OF_FIELD
>;
const everyFieldHasAStep: [ServiceFieldsWithoutAStep] extends [never] ? true : false = true;
void everyFieldHasAStep;

/** How a typed entry is written and read: a quantity in the shop's units, a moment, or plain text. */
export type ServiceEntryKind =
  "mass" | "volume" | "percent" | "minutes" | "vacuum" | "gauge" | "temperature" | "instant" | "text";

/**
 * Every field of the record that is typed rather than picked, by its one name, with its kind. The
 * screen's draft, the save's mapping and the stored row all take their field names from here: a new
 * typed field is a line here, a line in the schema above, a column (migration and model) and its input
 * on the screen.
 */
export const SERVICE_RECORD_ENTRIES = {
  labelChargeG: "mass",
  purityPct: "percent",
  airPct: "percent",
  recoveryStartedAt: "instant",
  recoveryEndedAt: "instant",
  recoveredChargeG: "mass",
  oilRemovedMl: "volume",
  slowRecoveryNote: "text",
  deepestKpaAbs: "vacuum",
  holdStartKpaAbs: "vacuum",
  holdEndKpaAbs: "vacuum",
  holdMinutes: "minutes",
  oilAddedType: "text",
  oilAddedMl: "volume",
  targetG: "mass",
  chargedG: "mass",
  finalAmbientC: "temperature",
  finalHighKpaGauge: "gauge",
  finalLowKpaGauge: "gauge",
  finalVentC: "temperature",
  notes: "text",
} as const satisfies Partial<Record<keyof ServiceRecordInput, ServiceEntryKind>>;
export type ServiceEntryField = keyof typeof SERVICE_RECORD_ENTRIES;

/** The fields picked from a list rather than typed: a spec-table row and the two cylinders. */
export const SERVICE_RECORD_CHOICES = ["specEntryId", "recoveryCylinderId", "chargeCylinderId"] as const;

export const serviceRecordDeleteQuerySchema = z.object({
  version: z.coerce.number({ message: "version is the version you last loaded." }).int().positive(),
});

/** The case as the service record sees it: its vehicle and what the label says. */
export interface ServiceCaseContext {
  id: number;
  status: string;
  technicianId: string;
  vehicleId: number | null;
  vehicle: string | null;
  make: string | null;
  model: string | null;
  year: number | null;
  engine: string | null;
  refrigerant: RefrigerantId | null;
  expansionDevice: ExpansionDevice | null;
  electricCompressor: boolean;
  labelChargeG: number | null;
  oilType: string | null;
  /**
   * The figures typed once (label charge, recovered mass, oil drained, identifier result, charged mass)
   * from where each is kept: what a record not yet started begins with, so nothing is typed twice.
   */
  figures: CaseFigures;
}

/** A saved service record as the server returns it. */
export type ServiceRecordDto = Omit<ServiceRecordInput, "baseVersion"> & {
  id: number;
  version: number;
  technicianId: string;
  technician: string;
  refrigerant: RefrigerantId;
  holdPassed: boolean | null;
  finalReadingSetId: number | null;
  updatedAt: string;
};

/** GET /api/cases/[id]/service. */
export interface ServiceRecordResponse {
  case: ServiceCaseContext;
  record: ServiceRecordDto | null;
}

/** PUT /api/cases/[id]/service: the saved record, how many ledger rows it posted, and what to look at. */
export interface ServiceRecordSaveResponse {
  record: ServiceRecordDto;
  posted: number;
  /** said in SI */
  warnings: string[];
  /** the same, with quantity markers, for a screen to say in its reader's units (lib/units/quantity.ts) */
  markedWarnings: string[];
}

/** DELETE /api/cases/[id]/service: how many correction rows cancelled the record's postings. */
export type ServiceRecordDeleteResponse = { corrections: number };
