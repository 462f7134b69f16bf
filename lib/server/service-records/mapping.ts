import "server-only";
import type { CreationAttributes } from "sequelize";
import type { PartReplacedJson, ServiceRecord } from "@/models";
import {
  SERVICE_RECORD_CHOICES,
  SERVICE_RECORD_ENTRIES,
  type ServiceEntryField,
  type ServiceRecordDto,
  type ServiceRecordInput,
} from "@/lib/contracts/service-records";
import { vacuumHoldTest } from "@/lib/service/vacuum";

// Between the contract and the stored rows. Field names are the contract's everywhere; the only
// fields stored elsewhere are the final reading's, which live in a reading set of kind "final".

/** The final reading's fields and the reading-set columns they are stored in. */
export const FINAL_READING_COLUMNS = {
  finalAmbientC: "ambientC",
  finalHighKpaGauge: "highKpaGauge",
  finalLowKpaGauge: "lowKpaGauge",
  finalVentC: "ventC",
} as const satisfies Partial<Record<ServiceEntryField, string>>;
type FinalField = keyof typeof FINAL_READING_COLUMNS;

/** The typed fields stored in the record's own row, with the same name as in the contract. */
const RECORD_ENTRIES = (Object.keys(SERVICE_RECORD_ENTRIES) as ServiceEntryField[]).filter(
  (f): f is Exclude<ServiceEntryField, FinalField> => !(f in FINAL_READING_COLUMNS),
);
type RecordEntry = (typeof RECORD_ENTRIES)[number];
type Choice = (typeof SERVICE_RECORD_CHOICES)[number];

/** The columns a save writes; Pick fails to compile when the model lacks a column the contract names. */
export type RecordColumns = Pick<
  CreationAttributes<ServiceRecord>,
  RecordEntry | Choice | "step" | "oilPulled" | "holdPassed" | "partsReplaced"
>;

/** Every contract field has a home: typed, picked, or one of these. A new field that has none fails to compile. */
type Unplaced = Exclude<
  keyof ServiceRecordInput,
  ServiceEntryField | Choice | "baseVersion" | "step" | "oilPulled" | "partsReplaced"
>;
const everyFieldPlaced: [Unplaced] extends [never] ? true : Unplaced = true;
void everyFieldPlaced;

function holdPassed(input: ServiceRecordInput): boolean | null {
  const { holdStartKpaAbs: start, holdEndKpaAbs: end, holdMinutes: minutes } = input;
  if (start == null || end == null || minutes == null) return null;
  return vacuumHoldTest({ startKpaAbs: start, endKpaAbs: end, minutes }).verdict === "pass";
}

/** The record row's columns for a save, empty fields as null. */
export function recordColumns(input: ServiceRecordInput): RecordColumns {
  const columns: Record<string, unknown> = {};
  for (const field of RECORD_ENTRIES) {
    const value = input[field];
    const kind = SERVICE_RECORD_ENTRIES[field];
    columns[field] =
      kind === "instant"
        ? value
          ? new Date(value as string)
          : null
        : kind === "text"
          ? value || null
          : (value ?? null);
  }
  for (const field of SERVICE_RECORD_CHOICES) columns[field] = input[field] ?? null;
  return {
    ...(columns as Pick<RecordColumns, RecordEntry | Choice>),
    step: input.step,
    oilPulled: input.oilPulled,
    holdPassed: holdPassed(input),
    partsReplaced: input.partsReplaced.map((p): PartReplacedJson => ({
      part: p.part,
      count: p.count,
      measuredMl: p.measuredMl ?? null,
    })),
  };
}

/** The final reading set's columns, or null when none of its fields was entered. */
export function finalReadingColumns(input: ServiceRecordInput) {
  const fields = Object.keys(FINAL_READING_COLUMNS) as FinalField[];
  if (fields.every((f) => input[f] == null)) return null;
  return Object.fromEntries(fields.map((f) => [FINAL_READING_COLUMNS[f], input[f] ?? null])) as Record<
    (typeof FINAL_READING_COLUMNS)[FinalField],
    number | null
  >;
}

type StoredRecord = Record<string, unknown> & {
  id: number;
  version: number;
  step: string;
  technicianId: string;
  refrigerant: ServiceRecordDto["refrigerant"];
  holdPassed: boolean | null;
  oilPulled: boolean;
  finalReadingSetId: number | null;
  partsReplaced: PartReplacedJson[] | null;
  updatedAt: Date;
};

/** The record as the client reads it. */
export function recordDto(
  r: StoredRecord,
  technicianName: string,
  finalReadingSet: object | null,
): ServiceRecordDto {
  const finalReading = finalReadingSet as Record<string, unknown> | null;
  const n = (v: unknown) => (v === null || v === undefined ? null : Number(v));
  const entries: Record<string, unknown> = {};
  for (const field of RECORD_ENTRIES) {
    const value = r[field] ?? null;
    entries[field] =
      SERVICE_RECORD_ENTRIES[field] === "instant" && value ? new Date(value as Date).toISOString() : value;
  }
  for (const field of Object.keys(FINAL_READING_COLUMNS) as FinalField[])
    entries[field] = n(finalReading?.[FINAL_READING_COLUMNS[field]]);
  for (const field of SERVICE_RECORD_CHOICES) entries[field] = r[field] ?? null;
  return {
    ...(entries as Pick<ServiceRecordDto, ServiceEntryField | Choice>),
    id: r.id,
    version: r.version,
    step: r.step as ServiceRecordDto["step"],
    technicianId: r.technicianId,
    technician: technicianName,
    refrigerant: r.refrigerant,
    holdPassed: r.holdPassed === null ? null : Boolean(r.holdPassed),
    finalReadingSetId: r.finalReadingSetId ?? null,
    updatedAt: new Date(r.updatedAt).toISOString(),
    oilPulled: Boolean(r.oilPulled),
    partsReplaced: (r.partsReplaced ?? []).map((p) => ({
      part: p.part as ServiceRecordDto["partsReplaced"][number]["part"],
      count: p.count,
      measuredMl: p.measuredMl,
    })),
  };
}
