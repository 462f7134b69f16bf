import { z } from "zod";
import { specRowSchema } from "@/lib/specs";
import { partOilAllowancesSchema } from "@/lib/service/oil";

export const specParamsSchema = z.object({
  id: z.coerce
    .number({ message: "A spec row id is a number." })
    .int("A spec row id is a whole number.")
    .positive("A spec row id is positive."),
});

export const specListQuerySchema = z.object({
  q: z.string().trim().max(80, "Search with at most 80 characters.").optional(),
});

/** The row as a form sends it: grams and millilitres, converted from the typed units in the browser. */
export const specInputSchema = specRowSchema;
export type SpecInput = z.infer<typeof specInputSchema>;

const unitsSchema = z
  .object({
    charge: z.enum(["g", "kg", "oz", "lb"], { message: "Charge unit is g, kg, oz or lb." }).optional(),
    oil: z.enum(["mL", "floz"], { message: "Oil unit is mL or floz." }).optional(),
  })
  .strict();

export const specImportSchema = z
  .object({
    csv: z
      .string()
      .min(1, "Choose a CSV file or paste its text.")
      .max(900_000, "Import at most about 900 kB at a time."),
    units: unitsSchema.optional(),
  })
  .strict();
export type SpecImportInput = z.infer<typeof specImportSchema>;

export const specExportQuerySchema = z.object({
  charge: z.enum(["g", "kg", "oz", "lb"], { message: "Charge unit is g, kg, oz or lb." }).optional(),
  oil: z.enum(["mL", "floz"], { message: "Oil unit is mL or floz." }).optional(),
});

export const specMatchQuerySchema = z.object({
  vehicleId: z.coerce
    .number({ message: "vehicleId is a number." })
    .int("vehicleId is a whole number.")
    .positive("vehicleId is positive."),
});

export const oilAllowancesInputSchema = z.object({ allowancesMl: partOilAllowancesSchema }).strict();
