import { z } from "zod";
import { type RefrigerantId, SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";

export const CYLINDER_KINDS = ["recovery", "virgin", "recycled"] as const;
export type CylinderKind = (typeof CYLINDER_KINDS)[number];

export const cylinderParamsSchema = z.object({
  id: z.coerce
    .number({ message: "A cylinder id is a number." })
    .int("A cylinder id is a whole number.")
    .positive("A cylinder id is positive."),
});

export const createCylinderSchema = z
  .object({
    label: z
      .string()
      .trim()
      .min(1, "Give the cylinder a label the shop can read on it.")
      .max(60, "At most 60 characters."),
    serial: z
      .string()
      .trim()
      .max(60, "At most 60 characters.")
      .optional()
      .or(z.literal("").transform(() => undefined)),
    refrigerant: z.enum(SERVICE_REFRIGERANT_IDS, { message: "Choose the refrigerant this cylinder holds." }),
    kind: z.enum(CYLINDER_KINDS, { message: "Choose recovery, virgin or recycled." }),
    tareG: z
      .number({ message: "Enter the tare weight stamped on the cylinder." })
      .int("Whole grams.")
      .min(500, "A tare under 500 g is not a refrigerant cylinder.")
      .max(60_000, "Over 60 kg: check the unit."),
    capacityG: z
      .number({ message: "Enter the cylinder's refrigerant capacity." })
      .int("Whole grams.")
      .min(500, "At least 500 g.")
      .max(120_000, "Over 120 kg: check the unit."),
    initialNetG: z
      .number({ message: "Enter what it holds now (0 when empty)." })
      .int("Whole grams.")
      .min(0, "Cannot be negative.")
      .max(120_000),
  })
  .strict()
  .refine((c) => c.initialNetG <= c.capacityG, {
    message: "It cannot hold more than its capacity.",
    path: ["initialNetG"],
  });
export type CreateCylinderInput = z.infer<typeof createCylinderSchema>;

export const updateCylinderSchema = z
  .object({ retired: z.boolean({ message: "retired is true or false." }) })
  .strict();

export const cylinderListQuerySchema = z.object({
  retired: z.enum(["include", "exclude"], { message: "retired is include or exclude." }).optional(),
});

/** A cylinder with its contents replayed from the ledger, and what its fill means. */
export interface CylinderDto {
  id: number;
  label: string;
  serial: string | null;
  refrigerant: RefrigerantId;
  kind: CylinderKind;
  tareG: number;
  capacityG: number;
  initialNetG: number;
  retired: boolean;
  netG: number;
  grossG: number;
  fillPct: number;
  limitPct: number;
  fillMessage: string;
  problems: string[];
}

/** GET /api/cylinders. */
export interface CylinderListResponse {
  cylinders: CylinderDto[];
}
