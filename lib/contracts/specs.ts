import { z } from "zod";
import { pageQuery, type PageInfo } from "./paging";
import { singleLineText } from "./text";
import { specRowSchema, type SpecCsvParse, type SpecMatch, type SpecRow } from "@/lib/specs";
import { partOilAllowancesSchema, type ReplacedPartId } from "@/lib/service/oil";

export const specParamsSchema = z.object({
  id: z.coerce
    .number({ message: "A spec row id is a number." })
    .int("A spec row id is a whole number.")
    .positive("A spec row id is positive."),
});

export const specListQuerySchema = z
  .object({ q: singleLineText().trim().max(80, "Search with at most 80 characters.").optional() })
  .and(pageQuery({ defaultLimit: 500, maxLimit: 1000 }));

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

export const specImportQuerySchema = z.object({
  step: z.enum(["preview", "commit"], { message: "step is preview or commit." }),
});

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

/** A row of the shop's spec table as the server returns it. */
export interface SpecEntryDto extends SpecRow {
  id: number;
  updatedAt: string;
}

/** GET /api/specs. */
export interface SpecListResponse extends PageInfo {
  specs: SpecEntryDto[];
}

/** POST /api/specs and PUT /api/specs/[id]. */
export interface SpecSaveResponse {
  spec: SpecEntryDto;
}

/** POST /api/specs/import?step=preview: every row's values and problems; nothing saved. */
export interface SpecImportPreviewResponse {
  preview: SpecCsvParse;
}

/** POST /api/specs/import?step=commit: rows saved and rows left out for their problems. */
export type SpecImportCommitResponse = { created: number; leftOut: number };

export type SpecMatchDto = SpecMatch<SpecEntryDto>;

/** GET /api/specs/matches: the vehicle and the rows that could apply to it, best first. */
export interface SpecMatchesResponse {
  vehicle: { id: number; year: number; make: string; model: string; engine: string | null };
  matches: SpecMatchDto[];
}

/** The oil each replaced part carries out, per part; null means "drain and measure". */
export type AllowancesMl = Record<ReplacedPartId, number | null>;

/** GET and PUT /api/specs/oil-allowances. */
export interface OilAllowancesResponse {
  allowancesMl: AllowancesMl;
}
