import { z } from "zod";
import { multiLineText, PLAUSIBLE_DATE_FROM, singleLineText } from "./text";
import { CAUSE_IDS } from "@/lib/diagnosis/causes";
import { SYMPTOM_IDS } from "@/lib/diagnosis/symptoms";
import { REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";
import { REPAIR_IDS } from "@/lib/repairs/catalog";
import { CASE_STATUSES, type CaseStatus } from "./cases";
import { COMPRESSOR_TYPES, type CompressorType } from "@/lib/vehicles/compressor-types";

/** What a repair can confirm: a cause the findings rank, or that no fault was found. */
export const CONFIRMED_CAUSE_IDS = [...CAUSE_IDS, "none_found"] as const;
export type ConfirmedCauseId = (typeof CONFIRMED_CAUSE_IDS)[number];

// Every refrigerant a vehicle record can hold: a search finds past cases, it offers no refrigerant for
// service (the facet lists only the values the shop's cases have).
export const CASEBOOK_REFRIGERANTS = REFRIGERANT_IDS;
export const CASEBOOK_METERING_DEVICES = EXPANSION_DEVICE_IDS;
// How the compressor is driven: the vehicle's type, or the one the case's findings input names.
export const CASEBOOK_COMPRESSOR_TYPES = COMPRESSOR_TYPES;
export type CasebookCompressorType = CompressorType;

export const CASEBOOK_SORTS = ["relevance", "opened_at", "closed_at", "vehicle", "status"] as const;
export type CasebookSort = (typeof CASEBOOK_SORTS)[number];
export const CASEBOOK_PAGE_SIZES = [10, 25, 50, 100] as const;
export const CASEBOOK_MAX_PAGE = 400;
/** An export never carries more rows than this; the file says so when a search has more. */
export const CASEBOOK_EXPORT_MAX_ROWS = 5000;

const optionalText = (max: number, message: string) =>
  singleLineText()
    .trim()
    .max(max, message)
    .optional()
    .transform((v) => (v ? v : undefined));

/** A comma-separated list in the address (`symptoms=a,b`), each item one of `ids`. */
function idList<const T extends readonly [string, ...string[]]>(ids: T, what: string) {
  const allowed = new Set<string>(ids);
  return z
    .string()
    .max(2000)
    .optional()
    .transform((v, ctx) => {
      const items = [...new Set((v ?? "").split(",").filter((s) => s.length > 0))];
      const unknown = items.filter((s) => !allowed.has(s));
      if (unknown.length > 0) {
        ctx.addIssue({ code: "custom", message: `Unknown ${what}: ${unknown.join(", ")}.` });
        return z.NEVER;
      }
      return items as T[number][];
    });
}

// A filter may reach past today (a search kept for next month), but a year like 0000 or 9999 is a slip.
const LATEST_FILTER_DATE = "2100-12-31";

/** A YYYY-MM-DD that names a day on the calendar (Date.parse alone takes 2026-02-31 as 3 March). */
function isCalendarDate(v: string): boolean {
  const ms = Date.parse(`${v}T00:00:00Z`);
  return !Number.isNaN(ms) && new Date(ms).toISOString().slice(0, 10) === v;
}

const isoDate = (what: string) =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Give the ${what} as a date (YYYY-MM-DD).`)
    .refine(isCalendarDate, `The ${what} is not a real date.`)
    .refine(
      (v) => v >= PLAUSIBLE_DATE_FROM.slice(0, 10) && v <= LATEST_FILTER_DATE,
      `Give the ${what} between ${PLAUSIBLE_DATE_FROM.slice(0, 4)} and ${LATEST_FILTER_DATE.slice(0, 4)}; check the year.`,
    )
    .optional()
    .or(z.literal("").transform(() => undefined));

const year = (what: string) =>
  z.coerce
    .number({ message: `The ${what} is a year.` })
    .int(`The ${what} is a whole year.`)
    .min(1950, `The ${what} is 1950 or later.`)
    .max(2100, `The ${what} is 2100 or earlier.`)
    .optional()
    .or(z.literal("").transform(() => undefined));

/**
 * A casebook search as it travels in the address bar and the API's query string: every field optional,
 * lists comma-separated, so a search can be bookmarked and shared.
 */
export const casebookFiltersSchema = z
  .object({
    q: optionalText(200, "Search with fewer than 200 characters."),
    symptoms: idList(SYMPTOM_IDS, "symptom"),
    refrigerant: z.enum(CASEBOOK_REFRIGERANTS, { message: "Unknown refrigerant." }).optional(),
    device: z.enum(CASEBOOK_METERING_DEVICES, { message: "Unknown metering device." }).optional(),
    compressor: z.enum(CASEBOOK_COMPRESSOR_TYPES, { message: "Unknown compressor type." }).optional(),
    suspect: z.enum(CAUSE_IDS, { message: "Unknown cause." }).optional(),
    cause: z.enum(CONFIRMED_CAUSE_IDS, { message: "Unknown confirmed cause." }).optional(),
    make: optionalText(60, "A make has at most 60 characters."),
    model: optionalText(80, "A model has at most 80 characters."),
    yearFrom: year("first model year"),
    yearTo: year("last model year"),
    technician: optionalText(40, "Unknown technician."),
    status: z.enum(CASE_STATUSES, { message: "Unknown case status." }).optional(),
    from: isoDate("first date"),
    to: isoDate("last date"),
    comeback: z
      .enum(["1", "true"], { message: "Comeback is on or absent." })
      .optional()
      .transform((v) => (v ? true : undefined)),
  })
  .refine((v) => v.yearFrom === undefined || v.yearTo === undefined || v.yearFrom <= v.yearTo, {
    message: "The first model year comes before the last.",
    path: ["yearTo"],
  })
  .refine((v) => v.from === undefined || v.to === undefined || v.from <= v.to, {
    message: "The first date comes before the last.",
    path: ["to"],
  });
export type CasebookFilters = z.infer<typeof casebookFiltersSchema>;

export const casebookSearchQuerySchema = z
  .object({
    sort: z.enum(CASEBOOK_SORTS, { message: "Unknown sort." }).optional(),
    dir: z.enum(["asc", "desc"], { message: "Sort up or down." }).optional(),
    page: z.coerce
      .number({ message: "A page is a number." })
      .int("A page is a whole number.")
      .min(1, "Pages start at 1.")
      .max(CASEBOOK_MAX_PAGE, `Narrow the search to see past page ${CASEBOOK_MAX_PAGE}.`)
      .default(1),
    pageSize: z.coerce
      .number({ message: "A page size is a number." })
      .int()
      .refine((n) => (CASEBOOK_PAGE_SIZES as readonly number[]).includes(n), {
        message: `A page holds ${CASEBOOK_PAGE_SIZES.join(", ")} rows.`,
      })
      .default(25),
  })
  .and(casebookFiltersSchema);
export type CasebookSearchQuery = z.infer<typeof casebookSearchQuerySchema>;

/** One case in the casebook's results. */
export interface CasebookRow {
  caseId: number;
  openedAt: string;
  closedAt: string | null;
  status: CaseStatus;
  vehicle: string | null;
  refrigerant: string | null;
  meteringDevice: string | null;
  /** The complaint, cut to a line or two. */
  complaint: string;
  leadingSuspect: string | null;
  confirmedCauses: ConfirmedCauseId[];
  technician: string;
  comebackOfCaseId: number | null;
  cameBackCaseId: number | null;
}

/** How the words were matched: the full-text index, a word pattern for words it skips, or no words. */
export type CasebookTextMode = "fulltext" | "pattern" | "fulltext+pattern" | "none";

/** GET /api/casebook. */
export interface CasebookSearchResponse {
  rows: CasebookRow[];
  total: number;
  page: number;
  pageSize: number;
  sort: CasebookSort;
  dir: "asc" | "desc";
  textMode: CasebookTextMode;
}

export const CASEBOOK_FACETS = [
  "symptoms",
  "refrigerant",
  "device",
  "compressor",
  "suspect",
  "cause",
  "make",
  "model",
  "technician",
  "status",
  "comeback",
] as const;
export type CasebookFacet = (typeof CASEBOOK_FACETS)[number];

export interface FacetCount {
  value: string;
  /** For values that are not ids (a technician's name). */
  label?: string;
  count: number;
}

/** GET /api/casebook/facets: how many of the search's cases carry each value. */
export interface CasebookFacetsResponse {
  total: number;
  facets: Record<CasebookFacet, FacetCount[]>;
}

/** The readings a similar-case search compares, in °C, K and %. */
export interface CaseFeatureValues {
  condensingC: number | null;
  evaporatingC: number | null;
  subcoolingK: number | null;
  superheatK: number | null;
  approachK: number | null;
  ambientC: number | null;
  chargeDeviationPct: number | null;
}

export interface SimilarCase {
  caseId: number;
  /** Normalised distance: 0 is the same readings; about 1 is one typical spread away on every reading. */
  distance: number;
  vehicle: string | null;
  openedAt: string;
  closedAt: string | null;
  confirmedCauses: ConfirmedCauseId[];
  repairIds: string[];
  features: CaseFeatureValues;
}

/** GET /api/cases/[id]/similar. */
export interface SimilarCasesResponse {
  /** Why no comparison could be made (no refrigerant, no readings), or null. */
  unavailable: string | null;
  refrigerant: string | null;
  meteringDevice: string | null;
  features: CaseFeatureValues | null;
  neighbours: SimilarCase[];
  /** The confirmed cause most of the neighbours share. */
  summary: { cause: ConfirmedCauseId; count: number; of: number } | null;
}

export const similarCasesQuerySchema = z.object({
  k: z.coerce.number().int().min(1).max(25).default(10),
});

/** The outcome a case is closed with: what the repair confirmed and what was done. */
export const caseOutcomeSchema = z
  .object({
    causes: z
      .array(z.enum(CONFIRMED_CAUSE_IDS, { message: "Pick causes from the list." }))
      .min(1, "Pick at least one confirmed cause, or none found.")
      .max(5, "Pick at most five causes."),
    repairIds: z
      .array(z.enum(REPAIR_IDS, { message: "Pick repairs from the list." }))
      .max(10, "Pick at most ten repairs."),
    note: multiLineText().trim().max(2000, "Keep the note under 2000 characters.").optional(),
  })
  .refine((v) => !v.causes.includes("none_found") || v.causes.length === 1, {
    message: "None found stands alone.",
    path: ["causes"],
  });
export type CaseOutcomeInput = z.infer<typeof caseOutcomeSchema>;
