import "server-only";
import { literal, type Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels, type JsonObject, type ServiceRecord } from "@/models";
import { AppError } from "@/lib/errors";
import {
  CASE_FIGURES,
  FIGURE_IDS,
  type CaseFigures,
  type FigureChangeDetail,
  type FigureHome,
  type FigureId,
  type FigureSource,
} from "@/lib/contracts/case-figures";
import type { InterviewAnswers } from "@/lib/interview/answers";
import {
  answersWithFigures,
  answersWithoutFigures,
  figuresInAnswers,
  roundFigure,
} from "@/lib/interview/figures";
import { serviceRecordRefusal } from "@/lib/service/record-rules";
import { recordAudit } from "./audit";
import { postLedger } from "./service-records/ledger-posting";

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

const RECORD_FIGURES = FIGURE_IDS.filter((id) => id !== "labelChargeG");
type RecordFigure = Exclude<FigureId, "labelChargeG">;
const LEDGER_FIGURES: readonly FigureId[] = ["recoveredChargeG", "chargedG"];

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

interface Homes {
  record: ServiceRecord | null;
  vehicle: { id: number; labelChargeG: number | null } | null;
  /** the figures kept outside the answers, by their homes */
  kept: Partial<CaseFigures>;
}

async function homesOf(opts: {
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

const homeOf = (id: FigureId, homes: Homes): FigureHome =>
  id === "labelChargeG"
    ? homes.vehicle
      ? "vehicle"
      : "interview"
    : homes.record
      ? "service_record"
      : "interview";

/** A JSON column as read: an object, or its text when a raw read hands it back unparsed. */
function jsonObject(value: unknown): Json {
  if (typeof value === "string")
    try {
      value = JSON.parse(value);
    } catch {
      return {};
    }
  return isObject(value) ? value : {};
}

/** The interview record's stored `answers` part. */
const storedAnswers = (interviewRecord: unknown): Json => jsonObject(jsonObject(interviewRecord).answers);

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
  const record = jsonObject(opts.interviewRecord);
  return { ...record, answers: answersWithFigures(storedAnswers(record), kept) } as JsonObject;
}

interface Change {
  figure: FigureId;
  from: number | null;
  to: number | null;
  keptIn: FigureHome;
}

async function auditChanges(opts: {
  user: User;
  caseId: number;
  typedIn: FigureSource;
  changes: Change[];
  transaction: Transaction;
}) {
  for (const c of opts.changes) {
    const detail: FigureChangeDetail = { ...c, typedIn: opts.typedIn };
    await recordAudit({
      shopId: opts.user.shopId,
      actorId: opts.user.id,
      entity: "case",
      entityId: opts.caseId,
      action: "figure_changed",
      detail,
      transaction: opts.transaction,
    });
  }
}

/**
 * The label charge on the vehicle, when a number was entered that differs from it. An emptied field
 * never clears it: the label is the vehicle's, read by each of its cases.
 */
async function writeLabelCharge(homes: Homes, said: number | null | undefined, transaction: Transaction) {
  if (!homes.vehicle || said === undefined || said === null || said === homes.vehicle.labelChargeG) return [];
  await getModels().Vehicle.update({ labelChargeG: said }, { where: { id: homes.vehicle.id }, transaction });
  return [
    { figure: "labelChargeG", from: homes.vehicle.labelChargeG, to: said, keptIn: "vehicle" } as Change,
  ];
}

/**
 * Autosave's part: the figures the interview's valid answers give are written where they live, in the
 * save's transaction, with an audit row each. Returns the answers to store: without the figures kept
 * elsewhere. Drafts never get here (sortSavedAnswers keeps them apart).
 */
export async function saveInterviewFigures(opts: {
  user: User;
  caseRow: { id: number; vehicleId: number | null; status: string; answers: unknown };
  answers: InterviewAnswers;
  transaction: Transaction;
}): Promise<InterviewAnswers> {
  const { user, caseRow, answers, transaction } = opts;
  const homes = await homesOf({
    shopId: user.shopId,
    caseId: caseRow.id,
    vehicleId: caseRow.vehicleId,
    transaction,
    lock: true,
  });
  const said = figuresInAnswers(answers);
  const before = figuresInAnswers(storedAnswers(caseRow.answers) as InterviewAnswers);
  const changes: Change[] = await writeLabelCharge(homes, said.labelChargeG, transaction);
  if (
    !homes.vehicle &&
    said.labelChargeG !== undefined &&
    said.labelChargeG !== (before.labelChargeG ?? null)
  )
    changes.push({
      figure: "labelChargeG",
      from: before.labelChargeG ?? null,
      to: said.labelChargeG,
      keptIn: "interview",
    });

  const record = homes.record;
  const recordChanges: Partial<Record<RecordFigure, number | null>> = {};
  for (const id of RECORD_FIGURES) {
    const to = said[id];
    if (to === undefined) continue;
    const from = record ? (homes.kept[id] ?? null) : (before[id] ?? null);
    if (to === from) continue;
    changes.push({ figure: id, from, to, keptIn: homeOf(id, homes) });
    if (record) recordChanges[id] = to;
  }
  if (record && Object.keys(recordChanges).length > 0)
    await writeRecordFigures({ user, caseRow, record, values: recordChanges, transaction });
  await auditChanges({ user, caseId: caseRow.id, typedIn: "interview", changes, transaction });
  const keptElsewhere = FIGURE_IDS.filter((id) => homeOf(id, homes) !== "interview");
  return answersWithoutFigures(answers, keptElsewhere) as InterviewAnswers;
}

/** Figures typed in the interview onto a started record: its rules, its version, its ledger. */
async function writeRecordFigures(opts: {
  user: User;
  caseRow: { id: number; status: string };
  record: ServiceRecord;
  values: Partial<Record<RecordFigure, number | null>>;
  transaction: Transaction;
}) {
  const { user, caseRow, record, values, transaction } = opts;
  const refusal = serviceRecordRefusal("save", user, {
    caseStatus: caseRow.status,
    refrigerant: record.refrigerant,
    startedBy: { id: record.technicianId },
  });
  if (refusal) {
    const names = Object.keys(values).map((id) => CASE_FIGURES[id as RecordFigure].label.toLowerCase());
    throw new AppError(
      refusal.code,
      `The ${names.join(" and ")} ${names.length > 1 ? "are" : "is"} kept on the service record: ${refusal.message}`,
    );
  }
  const { ServiceRecord: Record } = getModels();
  const [affected] = await Record.update(
    { ...values, version: record.version + 1 },
    { where: { id: record.id, shopId: user.shopId, version: record.version }, transaction },
  );
  if (affected !== 1)
    throw new AppError("conflict:service_record", "The service record changed meanwhile; reload.");
  if (!LEDGER_FIGURES.some((id) => id in values)) return;
  // The ledger follows the record: a changed mass cancels its posting and posts the new one.
  const recoveredChargeG = "recoveredChargeG" in values ? values.recoveredChargeG : record.recoveredChargeG;
  const chargedG = "chargedG" in values ? values.chargedG : record.chargedG;
  await postLedger({
    shopId: user.shopId,
    caseId: caseRow.id,
    recordId: record.id,
    technicianId: record.technicianId,
    refrigerant: record.refrigerant,
    input: {
      recoveryCylinderId: record.recoveryCylinderId ?? null,
      recoveredChargeG: recoveredChargeG ?? null,
      chargeCylinderId: record.chargeCylinderId ?? null,
      chargedG: chargedG ?? null,
      recoveryEndedAt: record.recoveryEndedAt ? new Date(record.recoveryEndedAt).toISOString() : null,
    },
    transaction,
  });
}

/** The figures as a service-record save found them: the record's, or the answers' before it existed. */
export async function figuresBeforeRecordSave(opts: {
  shopId: number;
  caseId: number;
  transaction: Transaction;
}): Promise<{ caseRow: { id: number; vehicleId: number | null; answers: unknown }; before: CaseFigures }> {
  const { Case } = getModels();
  // The case row first, as the interview's save locks it first: the two never wait on each other crosswise.
  const caseRow = await Case.findOne({
    where: { id: opts.caseId, shopId: opts.shopId },
    attributes: ["id", "vehicleId", "answers"],
    raw: true,
    transaction: opts.transaction,
    lock: opts.transaction.LOCK.UPDATE,
  });
  if (!caseRow) throw new AppError("not_found:case", "No such case in this shop.");
  const vehicleId = caseRow.vehicleId ?? null;
  const before = await caseFigures({ ...opts, vehicleId, interviewRecord: caseRow.answers });
  return { caseRow: { id: caseRow.id, vehicleId, answers: caseRow.answers }, before };
}

/**
 * A service-record save's part, after the record row is written: the label charge onto the vehicle,
 * an audit row for each figure that changed, and the case's answers without the figures the record
 * now keeps, at a new case version so an interview open elsewhere reloads before it saves over them.
 */
export async function saveRecordFigures(opts: {
  user: User;
  caseRow: { id: number; vehicleId: number | null; answers: unknown };
  before: CaseFigures;
  entered: Partial<CaseFigures>;
  transaction: Transaction;
}): Promise<void> {
  const { user, caseRow, before, entered, transaction } = opts;
  const homes = await homesOf({
    shopId: user.shopId,
    caseId: caseRow.id,
    vehicleId: caseRow.vehicleId,
    transaction,
  });
  const label = entered.labelChargeG;
  const changes = await writeLabelCharge(
    homes,
    label === undefined || label === null ? label : roundFigure("labelChargeG", label),
    transaction,
  );
  for (const id of RECORD_FIGURES) {
    const to = homes.kept[id] ?? null;
    if (to !== before[id]) changes.push({ figure: id, from: before[id], to, keptIn: "service_record" });
  }
  await auditChanges({ user, caseId: caseRow.id, typedIn: "service_record", changes, transaction });
  const stored = storedAnswers(caseRow.answers);
  const moved = FIGURE_IDS.filter((id) => homeOf(id, homes) !== "interview");
  const answers = answersWithoutFigures(stored, moved);
  if (changes.length === 0 && JSON.stringify(answers) === JSON.stringify(stored)) return;
  const record = jsonObject(caseRow.answers);
  await getModels().Case.update(
    { answers: { ...record, answers } as JsonObject, version: literal("version + 1") as unknown as number },
    { where: { id: caseRow.id, shopId: user.shopId }, transaction },
  );
}
