import { z } from "zod";
import { singleLineText } from "@/lib/contracts/text";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";

/** Label charges outside this band are almost surely a unit mistake for a car or light truck (common practice). */
export const LABEL_CHARGE_RANGE_G = { min: 100, max: 3000 } as const;
/** Total system oil band, mL (common practice: cars and light trucks hold about 100–250 mL). */
export const TOTAL_OIL_RANGE_ML = { min: 20, max: 1000 } as const;
export const MODEL_YEAR_RANGE = { min: 1940, max: 2100 } as const;

/** One row of the shop's spec table. Masses in grams, volumes in millilitres. */
export const specRowSchema = z
  .object({
    yearFrom: z
      .number({ message: "The first year is missing." })
      .int("A year is a whole number, for example 2016.")
      .min(MODEL_YEAR_RANGE.min, `The first year is before ${MODEL_YEAR_RANGE.min}: check it.`)
      .max(MODEL_YEAR_RANGE.max, `The first year is after ${MODEL_YEAR_RANGE.max}: check it.`),
    yearTo: z
      .number({ message: "The last year is missing." })
      .int("A year is a whole number, for example 2019.")
      .min(MODEL_YEAR_RANGE.min, `The last year is before ${MODEL_YEAR_RANGE.min}: check it.`)
      .max(MODEL_YEAR_RANGE.max, `The last year is after ${MODEL_YEAR_RANGE.max}: check it.`),
    make: singleLineText({ message: "Make is missing." })
      .trim()
      .min(1, "Make is missing.")
      .max(60, "Make is at most 60 characters."),
    model: singleLineText({ message: "Model is missing." })
      .trim()
      .min(1, "Model is missing.")
      .max(80, "Model is at most 80 characters."),
    /** engine or variant; "" when the row covers every variant */
    variant: singleLineText().trim().max(120, "The engine or variant is at most 120 characters."),
    /** true: front and rear A/C; false: front only */
    rearAc: z.boolean({ message: "Say whether the vehicle has rear A/C." }),
    refrigerant: z.enum(SERVICE_REFRIGERANT_IDS, {
      message: "Choose the refrigerant on the under-hood label.",
    }),
    // The limits are said without numbers here: the form says them in the reader's unit.
    labelChargeG: z
      .number({ message: "The label charge is missing." })
      .min(
        LABEL_CHARGE_RANGE_G.min,
        "That label charge is too small for a car or light truck: check the unit.",
      )
      .max(
        LABEL_CHARGE_RANGE_G.max,
        "That label charge is too large for a car or light truck: check the unit.",
      ),
    oilType: singleLineText({ message: "The oil type is missing." })
      .trim()
      .min(1, "The oil type is missing.")
      .max(60, "The oil type is at most 60 characters."),
    totalOilMl: z
      .number({ message: "The total oil is a volume." })
      .min(TOTAL_OIL_RANGE_ML.min, "That total oil is too little for a car or light truck: check the unit.")
      .max(TOTAL_OIL_RANGE_ML.max, "That total oil is too much for a car or light truck: check the unit.")
      .nullable(),
    /** how the compressor is driven and controlled; null when the row does not say */
    compressorType: z
      .enum(COMPRESSOR_TYPES, { message: "Choose how the compressor is driven, or leave it blank." })
      .nullable()
      .optional(),
  })
  .refine((r) => r.yearFrom <= r.yearTo, { message: "The first year is after the last.", path: ["yearTo"] });

export type SpecRow = z.infer<typeof specRowSchema>;

/** "Škoda", "F-150 " → "skoda", "f 150": case, accents and punctuation do not tell rows apart. */
export function normaliseName(text: string): string {
  return text
    .normalize("NFKD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, " ")
    .trim();
}

function compactName(text: string): string {
  return normaliseName(text).replace(/ /g, "");
}

/** Two rows with the same key describe the same vehicle variant. */
export function specRowKey(
  r: Pick<SpecRow, "make" | "model" | "variant" | "yearFrom" | "yearTo" | "rearAc">,
): string {
  return [
    compactName(r.make),
    compactName(r.model),
    compactName(r.variant),
    r.yearFrom,
    r.yearTo,
    r.rearAc ? "rear" : "front",
  ].join("|");
}

/** Longest match key the spec_entry.match_key column holds (NFKD can lengthen odd characters). */
export const SPEC_MATCH_KEY_MAX_LENGTH = 700;

/** specRowKey as stored in spec_entry.match_key, whose unique index keeps one row per variant. */
export function specMatchKey(r: Parameters<typeof specRowKey>[0]): string {
  return specRowKey(r).slice(0, SPEC_MATCH_KEY_MAX_LENGTH);
}
