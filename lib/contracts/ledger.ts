import { z } from "zod";
import { plausibleInstant, singleLineText } from "./text";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { MovementType } from "@/lib/service/ledger";
import type { MonthlyReportRow } from "@/lib/service/ledger-report";

/** The most any cylinder a shop keeps could hold, grams; a mass past it is a typing or unit mistake. */
export const LEDGER_MASS_MAX_G = 120_000;
export const MOVEMENT_PAGE_DEFAULT = 50;
export const MOVEMENT_PAGE_MAX = 200;

/** "<ISO instant>~<id>": the last line of a page; the next page starts just after it. */
const MOVEMENT_CURSOR = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{1,3})?Z~\d{1,10}$/;

export const movementListQuerySchema = z.object({
  cylinderId: z.coerce
    .number({ message: "cylinderId is a number." })
    .int("cylinderId is a whole number.")
    .positive("cylinderId is positive.")
    .optional(),
  limit: z.coerce
    .number({ message: "limit is a number." })
    .int("limit is a whole number.")
    .min(1, "limit is at least 1.")
    .max(MOVEMENT_PAGE_MAX, `At most ${MOVEMENT_PAGE_MAX} lines at a time.`)
    .optional(),
  before: z
    .string()
    .regex(MOVEMENT_CURSOR, "before is the nextCursor of the page you already have.")
    .optional(),
});
export type MovementListQuery = z.infer<typeof movementListQuerySchema>;

export const movementParamsSchema = z.object({
  id: z.coerce
    .number({ message: "A ledger line id is a number." })
    .int("A ledger line id is a whole number.")
    .positive("A ledger line id is positive."),
});

/** Months the ledger page's report shows at first (the rest on request, and always in the CSV). */
export const REPORT_RECENT_MONTHS = 12;

export const reportQuerySchema = z.object({
  format: z.enum(["json", "csv"], { message: "format is json or csv." }).optional(),
  /** The latest this many months only (JSON); the CSV always holds every month. */
  months: z.coerce
    .number({ message: "months is a number." })
    .int("months is a whole number.")
    .min(1, "months is at least 1.")
    .max(1200, "months is at most 1200.")
    .optional(),
});

/** Movements a technician posts by hand; recovery and recharge are posted by the service record. */
export const manualMovementSchema = z
  .object({
    cylinderId: z
      .number({ message: "Choose a cylinder." })
      .int("Choose a cylinder.")
      .positive("Choose a cylinder."),
    type: z.enum(["recycled", "sent_out", "adjustment"], {
      message: "Choose recycled, sent out or a weighed adjustment.",
    }),
    massG: z
      .number({ message: "The mass is missing." })
      .int("The mass is in whole grams.")
      .min(-LEDGER_MASS_MAX_G, "That is more than any cylinder holds: check the figure and its unit.")
      .max(LEDGER_MASS_MAX_G, "That is more than any cylinder holds: check the figure and its unit."),
    occurredAt: plausibleInstant("Give the date and time.").optional(),
    destination: singleLineText().trim().max(120, "The destination is at most 120 characters.").optional(),
    note: singleLineText().trim().max(255, "The note is at most 255 characters.").optional(),
  })
  .strict()
  .refine((m) => (m.type === "adjustment" ? m.massG !== 0 : m.massG > 0), {
    message: "The mass must be more than zero (only a weighed correction may be negative).",
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

/** Cancelling a wrong line: the line stays, a correction that cancels it is posted with the reason. */
export const reversalSchema = z
  .object({
    reason: singleLineText({ message: "Say why this line is wrong." })
      .trim()
      .min(3, "Say why this line is wrong, in a few words.")
      .max(200, "The reason is at most 200 characters."),
  })
  .strict();
export type ReversalInput = z.infer<typeof reversalSchema>;

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

/** GET /api/ledger/movements: the newest lines first; nextCursor fetches the older ones (null: no more). */
export interface MovementListResponse {
  movements: MovementDto[];
  nextCursor: string | null;
}

/** POST /api/ledger/movements. */
export interface MovementResponse {
  movement: MovementDto;
}

/** POST /api/ledger/movements/[id]/reversal: the correction posted, and the line it cancels. */
export interface ReversalResponse {
  correction: MovementDto;
  original: MovementDto;
}

export interface LedgerReportRow extends MonthlyReportRow {
  technician: string;
}

/** GET /api/ledger/report (JSON): the rows and the shop's time zone the months are counted in. */
export interface LedgerReportResponse {
  rows: LedgerReportRow[];
  timeZone: string;
  /** How many months the whole report holds (rows may hold only the latest of them). */
  monthCount: number;
}
