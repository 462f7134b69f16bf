import { z } from "zod";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { MovementType } from "@/lib/service/ledger";
import type { MonthlyReportRow } from "@/lib/service/ledger-report";

export const movementListQuerySchema = z.object({
  cylinderId: z.coerce.number({ message: "cylinderId is a number." }).int().positive().optional(),
  limit: z.coerce
    .number({ message: "limit is a number." })
    .int()
    .min(1)
    .max(500, "At most 500 at a time.")
    .optional(),
});

export const reportQuerySchema = z.object({
  format: z.enum(["json", "csv"], { message: "format is json or csv." }).optional(),
});

/** Movements a technician posts by hand; recovery and recharge are posted by the service record. */
export const manualMovementSchema = z
  .object({
    cylinderId: z.number({ message: "Choose a cylinder." }).int().positive(),
    type: z.enum(["recycled", "sent_out", "adjustment"], {
      message: "Choose recycled, sent out or a weighed adjustment.",
    }),
    massG: z.number({ message: "Enter the mass." }).int("Whole grams.").min(-120_000).max(120_000),
    occurredAt: z.iso.datetime({ offset: true, message: "Give the date and time." }).optional(),
    destination: z.string().trim().max(120).optional(),
    note: z.string().trim().max(255).optional(),
  })
  .strict()
  .refine((m) => (m.type === "adjustment" ? m.massG !== 0 : m.massG > 0), {
    message: "Enter a positive mass (an adjustment may be negative, never zero).",
    path: ["massG"],
  })
  .refine((m) => m.type !== "sent_out" || (m.destination ?? "") !== "", {
    message: "Say where the refrigerant was sent.",
    path: ["destination"],
  })
  .refine((m) => m.type !== "adjustment" || (m.note ?? "") !== "", {
    message: "Say why the weighed mass differs.",
    path: ["note"],
  });
export type ManualMovementInput = z.infer<typeof manualMovementSchema>;

/** One ledger row as the client shows it. */
export interface MovementDto {
  id: number;
  cylinderId: number;
  cylinderLabel: string;
  caseId: number | null;
  serviceRecordId: number | null;
  technicianId: string;
  technician: string;
  type: MovementType;
  refrigerant: RefrigerantId;
  massG: number;
  occurredAt: string;
  reversesId: number | null;
  reversedById: number | null;
  destination: string | null;
  note: string | null;
}

/** GET /api/ledger/movements. */
export interface MovementListResponse {
  movements: MovementDto[];
}

export interface LedgerReportRow extends MonthlyReportRow {
  technician: string;
}

/** GET /api/ledger/report (JSON): the rows and the shop's time zone the months are counted in. */
export interface LedgerReportResponse {
  rows: LedgerReportRow[];
  timeZone: string;
}
