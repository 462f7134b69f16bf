import "server-only";
import type { Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels, type ServiceRecord } from "@/models";
import { AppError } from "@/lib/errors";
import { CASE_FIGURES, FIGURE_IDS, type FigureId } from "@/lib/contracts/case-figures";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { answersWithoutFigures, figuresInAnswers } from "@/lib/interview/figures";
import { serviceRecordRefusal } from "@/lib/service/record-rules";
import { postLedger } from "../service-records/ledger-posting";
import { auditChanges, writeLabelCharge, type Change } from "./changes";
import { homeOf, homesOf, RECORD_FIGURES, storedAnswers, type RecordFigure } from "./homes";

const LEDGER_FIGURES: readonly FigureId[] = ["recoveredChargeG", "chargedG"];

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
