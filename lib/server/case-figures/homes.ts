import "server-only";
import type { Transaction } from "sequelize";
import { getModels, type JsonObject, type ServiceRecord } from "@/models";
import { FIGURE_IDS, type CaseFigures, type FigureHome, type FigureId } from "@/lib/contracts/case-figures";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { jsonColumn } from "@/lib/db/json-column";
import { answersWithFigures, figuresInAnswers } from "@/lib/interview/figures";

/*
 * One stored value per figure (lib/contracts/case-figures.ts), shown and edited from the interview
 * and the service record alike. Homes: the label charge is the vehicle's; the other five are the
 * service record's once it exists, and the interview answers' until then (the first save of the
 * record moves them into it).
 *
 * When both screens change a figure, the newer write wins and an audit row keeps old → new, who and
 * where; no conflict message. Both screens already save at the version they loaded (the case's and the
 * record's), and a figure change through one bumps the other's version, so a write that reaches this
 * code was made by someone looking at the current value: it is a correction, not a stale overwrite. A
 * stale screen gets its own version conflict. The one refusal is the record's own rule: a figure kept
 * on a record only its starter or a senior may change is refused to others from the interview too.
 */

export const RECORD_FIGURES = FIGURE_IDS.filter((id) => id !== "labelChargeG");
export type RecordFigure = Exclude<FigureId, "labelChargeG">;

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

export interface Homes {
  record: ServiceRecord | null;
  vehicle: { id: number; labelChargeG: number | null } | null;
  /** the figures kept outside the answers, by their homes */
  kept: Partial<CaseFigures>;
}

export async function homesOf(opts: {
  shopId: number;
  caseId: number;
  vehicleId: number | null;
  transaction?: Transaction;
  lock?: boolean;
}): Promise<Homes> {
  const { ServiceRecord: Record, Vehicle } = getModels();
  const { shopId, caseId, vehicleId, transaction } = opts;
  const lock = opts.lock && transaction ? transaction.LOCK.UPDATE : undefined;
  const [record, vehicle] = await Promise.all([
    Record.findOne({ where: { shopId, caseId }, transaction, lock }),
    vehicleId
      ? Vehicle.findOne({
          where: { id: vehicleId, shopId },
          attributes: ["id", "labelChargeG"],
          raw: true,
          transaction,
          lock,
        })
      : null,
  ]);
  const kept: Partial<CaseFigures> = {};
  if (vehicle) kept.labelChargeG = num(vehicle.labelChargeG);
  if (record) for (const id of RECORD_FIGURES) kept[id] = num(record[id]);
  return {
    record,
    vehicle: vehicle ? { id: vehicle.id, labelChargeG: num(vehicle.labelChargeG) } : null,
    kept,
  };
}

export const homeOf = (id: FigureId, homes: Homes): FigureHome =>
  id === "labelChargeG"
    ? homes.vehicle
      ? "vehicle"
      : "interview"
    : homes.record
      ? "service_record"
      : "interview";

/** A JSON column as read: an object, or its text when a raw read hands it back unparsed. */
export function jsonObject(value: unknown): Json {
  const parsed = jsonColumn(value);
  return isObject(parsed) ? parsed : {};
}

/** The interview record's stored `answers` part. */
export const storedAnswers = (interviewRecord: unknown): Json =>
  jsonObject(jsonObject(interviewRecord).answers);

/** Every figure of the case, wherever it is kept (the service record's prefill before it exists). */
export async function caseFigures(opts: {
  shopId: number;
  caseId: number;
  vehicleId: number | null;
  interviewRecord: unknown;
  transaction?: Transaction;
}): Promise<CaseFigures> {
  const homes = await homesOf(opts);
  const inAnswers = figuresInAnswers(storedAnswers(opts.interviewRecord) as InterviewAnswers);
  const all = {} as CaseFigures;
  // A home holding none shows a copy the answers still hold from before the move (as the interview does).
  for (const id of FIGURE_IDS) all[id] = homes.kept[id] ?? inAnswers[id] ?? null;
  return all;
}

/** The interview record as stored, with each figure kept elsewhere written into its answers. */
export async function interviewRecordWithFigures(opts: {
  shopId: number;
  caseId: number;
  vehicleId: number | null;
  interviewRecord: unknown;
  transaction?: Transaction;
}): Promise<JsonObject> {
  const { kept } = await homesOf(opts);
  return interviewRecordWithKept(opts.interviewRecord, kept);
}

/** The same, from the figures kept outside the answers as a caller read them (one join instead of homesOf). */
export function interviewRecordWithKept(interviewRecord: unknown, kept: Partial<CaseFigures>): JsonObject {
  const record = jsonObject(interviewRecord);
  return { ...record, answers: answersWithFigures(storedAnswers(record), kept) } as JsonObject;
}
