import "server-only";
import { literal, type Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels, type JsonObject } from "@/models";
import { AppError } from "@/lib/errors";
import { FIGURE_IDS, type CaseFigures } from "@/lib/contracts/case-figures";
import { answersWithoutFigures, roundFigure } from "@/lib/interview/figures";
import { auditChanges, writeLabelCharge } from "./changes";
import { caseFigures, homeOf, homesOf, jsonObject, RECORD_FIGURES, storedAnswers } from "./homes";

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
