import { z } from "zod";
import { multiLineText, singleLineText } from "./text";
import type { Role } from "@/lib/auth/roles";
import { CASE_STATUSES, type CaseStatus } from "@/lib/cases/statuses";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";
import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";
import { pageQuery, type PageInfo } from "./paging";
import { normalisePlate, plateError } from "@/lib/vehicles/plate";

export { CASE_STATUSES, type CaseStatus };

export const caseListQuerySchema = z
  .object({ status: z.enum(CASE_STATUSES, { message: "Unknown case status." }).optional() })
  .and(pageQuery({ defaultLimit: 50, maxLimit: 100 }));

export const caseParamsSchema = z.object({
  id: z.coerce
    .number({ message: "A case id is a number." })
    .int("A case id is a whole number.")
    .positive("A case id is positive."),
});

const thisYear = new Date().getUTCFullYear();

export const newCustomerSchema = z.object({
  name: singleLineText().trim().min(1, "Enter the customer's name.").max(120),
  phone: singleLineText()
    .trim()
    .max(40)
    .optional()
    .or(z.literal("").transform(() => undefined)),
  email: z
    .string()
    .trim()
    .toLowerCase()
    .email("Enter a valid e-mail address or leave it blank.")
    .max(255)
    .optional()
    .or(z.literal("").transform(() => undefined)),
});

export const newVehicleSchema = z.object({
  year: z.coerce
    .number({ message: "Enter the model year." })
    .int("The model year is a whole number.")
    .min(1980, "From 1980 on.")
    .max(thisYear + 1, `Up to ${thisYear + 1}.`),
  make: singleLineText().trim().min(1, "Enter the make.").max(60),
  model: singleLineText().trim().min(1, "Enter the model.").max(80),
  engine: singleLineText()
    .trim()
    .max(80)
    .optional()
    .or(z.literal("").transform(() => undefined)),
  vin: z
    .string()
    .transform((v) => v.replace(/[\s-]/g, "").toUpperCase())
    .refine(
      (v) => v === "" || /^[A-HJ-NPR-Z0-9]{17}$/.test(v),
      "A VIN has 17 letters and digits, never I, O or Q.",
    )
    .optional()
    .transform((v) => (v ? v : undefined)),
  plate: z
    .string()
    .max(40)
    .transform(normalisePlate)
    .superRefine((v, ctx) => {
      const problem = plateError(v);
      if (problem) ctx.addIssue({ code: "custom", message: problem });
    })
    .optional()
    .transform((v) => (v ? v : undefined)),
  refrigerant: z.enum(SERVICE_REFRIGERANT_IDS, {
    message: "Choose the refrigerant on the under-hood label.",
  }),
  expansionDevice: z.enum(EXPANSION_DEVICE_IDS, { message: "Choose orifice tube or TXV." }),
  electricCompressor: z.boolean().default(false),
  /** how the compressor is driven; when given it decides electricCompressor */
  compressorType: z
    .enum(COMPRESSOR_TYPES, { message: "Choose the compressor type or leave it unknown." })
    .optional(),
  labelChargeG: z
    .number()
    .int()
    .min(50, "Under 50 g is not a vehicle charge.")
    .max(5000, "Over 5 kg is not a light-vehicle charge.")
    .optional(),
});

export const createCaseSchema = z
  .object({
    customerId: z.number().int().positive().optional(),
    newCustomer: newCustomerSchema.optional(),
    vehicleId: z.number().int().positive().optional(),
    newVehicle: newVehicleSchema.optional(),
    complaint: multiLineText()
      .trim()
      .min(1, "Write down the complaint in the owner's words.")
      .max(2000, "Keep it under 2000 characters."),
  })
  .refine((v) => v.vehicleId !== undefined || v.newVehicle !== undefined, {
    message: "Pick a vehicle or add one.",
    path: ["vehicleId"],
  })
  .refine((v) => v.vehicleId !== undefined || v.customerId !== undefined || v.newCustomer !== undefined, {
    message: "Pick the customer or add one.",
    path: ["customerId"],
  });
export type CreateCaseInput = z.infer<typeof createCaseSchema>;
export type NewVehicleInput = z.infer<typeof newVehicleSchema>;

/** POST /api/cases answers 201 with the new case's id. */
export interface CreateCaseResponse {
  case: { id: number };
}

/** One row of the case list (GET /api/cases). */
export interface CaseListItem {
  id: number;
  status: CaseStatus;
  complaint: string;
  vehicle: string | null;
  customer: string | null;
  technician: string;
  updatedAt: string;
}

/** GET /api/cases: one page, most recently changed first. */
export interface CaseListResponse extends PageInfo {
  cases: CaseListItem[];
}

/** One case with its interview record, findings and sign-offs (GET /api/cases/[id]). */
export interface CaseDetail extends CaseListItem {
  technicianId: string;
  technicianRole: Role;
  /** Who saved the interview or submitted the conclusion: none of them may sign it off. */
  conclusionWriterIds: string[];
  vehicleId: number | null;
  refrigerant: string | null;
  expansionDevice: string | null;
  interviewStep: string | null;
  answers: unknown;
  findings: unknown;
  engineVersion: string | null;
  conclusionCause: string | null;
  conclusionNotes: string | null;
  confirmedRepair: string | null;
  version: number;
  signOffs: { verdict: string; comment: string | null; reviewer: string; createdAt: string }[];
}

export const signOffSchema = z
  .object({
    verdict: z.enum(["signed_off", "sent_back"], { message: "Sign off or send back." }),
    comment: multiLineText().trim().max(4000, "Keep the comment under 4000 characters.").optional(),
  })
  .refine((v) => v.verdict === "signed_off" || (v.comment?.length ?? 0) > 0, {
    message: "Say what to look at again when you send a case back.",
    path: ["comment"],
  });
export type SignOffInput = z.infer<typeof signOffSchema>;

/** POST /api/cases/[id]/signoff: the case's new status and version. */
export interface SignOffResponse {
  status: "signed_off" | "sent_back";
  version: number;
}
