import { z } from "zod";
import { singleLineText } from "./text";
import { type RefrigerantId, SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { RECOVERY_CYLINDER_FILL_LIMIT_PCT } from "@/lib/service/ledger";
import { quantityMarker } from "@/lib/units/quantity";

// Limits carry their masses as quantity markers: the form says them in the reader's unit.
const massLimit = (g: number) => quantityMarker({ kind: "mass", value: g });

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
    label: singleLineText()
      .trim()
      .min(1, "The label is missing: use the one written on the cylinder.")
      .max(60, "The label is at most 60 characters."),
    serial: singleLineText()
      .trim()
      .max(60, "The serial number is at most 60 characters.")
      .optional()
      .or(z.literal("").transform(() => undefined)),
    refrigerant: z.enum(SERVICE_REFRIGERANT_IDS, { message: "Choose the refrigerant this cylinder holds." }),
    kind: z.enum(CYLINDER_KINDS, { message: "Choose recovery, virgin or recycled." }),
    tareG: z
      .number({ message: "The tare is missing: it is stamped on the cylinder's collar." })
      .int("The tare is in whole grams.")
      .min(500, `A tare under ${massLimit(500)} is not a refrigerant cylinder.`)
      .max(60_000, `A tare over ${massLimit(60_000)} is not a refrigerant cylinder: check the unit.`),
    capacityG: z
      .number({ message: "The refrigerant capacity is missing." })
      .int("The capacity is in whole grams.")
      .min(500, `A capacity under ${massLimit(500)} is not a refrigerant cylinder: check the unit.`)
      .max(120_000, "That is more than any cylinder holds: check the figure and its unit."),
    initialNetG: z
      .number({ message: "Say what it holds now (0 when empty)." })
      .int("The contents are in whole grams.")
      .min(0, "A cylinder cannot hold less than nothing.")
      .max(120_000, "That is more than any cylinder holds: check the figure and its unit."),
  })
  .strict()
  .refine((c) => c.initialNetG <= c.capacityG, {
    message: "It cannot hold more than its capacity.",
    path: ["initialNetG"],
  })
  .refine(
    (c) =>
      c.kind !== "recovery" ||
      c.initialNetG > c.capacityG ||
      c.initialNetG <= (c.capacityG * RECOVERY_CYLINDER_FILL_LIMIT_PCT) / 100,
    {
      message: `A recovery cylinder is filled to ${RECOVERY_CYLINDER_FILL_LIMIT_PCT} % of its capacity at most; this one is past it.`,
      path: ["initialNetG"],
    },
  );
export type CreateCylinderInput = z.infer<typeof createCylinderSchema>;

export const updateCylinderSchema = z
  .object({ retired: z.boolean({ message: "retired is true or false." }) })
  .strict();

export const CYLINDER_PAGE_DEFAULT = 100;
export const CYLINDER_PAGE_MAX = 200;

export const cylinderListQuerySchema = z.object({
  retired: z.enum(["include", "exclude"], { message: "retired is include or exclude." }).optional(),
  limit: z.coerce
    .number({ message: "limit is a number." })
    .int("limit is a whole number.")
    .min(1, "limit is at least 1.")
    .max(CYLINDER_PAGE_MAX, `At most ${CYLINDER_PAGE_MAX} cylinders at a time.`)
    .optional(),
  /** the label of the last cylinder of the page you have (labels are unique in a shop) */
  after: z.string().min(1).max(60, "after is the nextCursor of the page you already have.").optional(),
});
export type CylinderListQuery = z.infer<typeof cylinderListQuerySchema>;

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
  /** the most it may hold: 80 % of capacity for a recovery cylinder (common practice), else its capacity */
  safeFillG: number;
  /** room left before safeFillG (negative when past it) */
  roomG: number;
  fillMessage: string;
  problems: string[];
}

/** GET /api/cylinders: ordered by label; nextCursor fetches the next page (null: no more). */
export interface CylinderListResponse {
  cylinders: CylinderDto[];
  nextCursor: string | null;
}

/** POST /api/cylinders and PATCH /api/cylinders/[id]. */
export interface CylinderResponse {
  cylinder: CylinderDto;
}
