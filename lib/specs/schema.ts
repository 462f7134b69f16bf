import { z } from "zod";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";

/** Label charges outside this band are almost surely a unit mistake for a car or light truck (common practice). */
export const LABEL_CHARGE_RANGE_G = { min: 100, max: 3000 } as const;
/** Total system oil band, mL (common practice: cars and light trucks hold about 100–250 mL). */
export const TOTAL_OIL_RANGE_ML = { min: 20, max: 1000 } as const;
export const MODEL_YEAR_RANGE = { min: 1940, max: 2100 } as const;

/** One row of the shop's spec table. Masses in grams, volumes in millilitres. */
export const specRowSchema = z
  .object({
    yearFrom: z.number().int().min(MODEL_YEAR_RANGE.min).max(MODEL_YEAR_RANGE.max),
    yearTo: z.number().int().min(MODEL_YEAR_RANGE.min).max(MODEL_YEAR_RANGE.max),
    make: z.string().trim().min(1, "make is empty").max(60),
    model: z.string().trim().min(1, "model is empty").max(80),
    /** engine or variant; "" when the row covers every variant */
    variant: z.string().trim().max(120),
    /** true: front and rear A/C; false: front only */
    rearAc: z.boolean(),
    refrigerant: z.enum(SERVICE_REFRIGERANT_IDS),
    labelChargeG: z
      .number()
      .min(LABEL_CHARGE_RANGE_G.min, `label charge must be at least ${LABEL_CHARGE_RANGE_G.min} g`)
      .max(LABEL_CHARGE_RANGE_G.max, `label charge must be at most ${LABEL_CHARGE_RANGE_G.max} g`),
    oilType: z.string().trim().min(1, "oil type is empty").max(60),
    totalOilMl: z.number().min(TOTAL_OIL_RANGE_ML.min).max(TOTAL_OIL_RANGE_ML.max).nullable(),
  })
  .refine((r) => r.yearFrom <= r.yearTo, { message: "year range reversed", path: ["yearTo"] });

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
