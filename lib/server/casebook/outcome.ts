import "server-only";
import type { User } from "lucia";
import { Op } from "sequelize";
import { jsonColumn } from "@/lib/db/json-column";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { caseRefusal, STATUS_AFTER } from "@/lib/cases/rules";
import type { CaseOutcomeInput, ConfirmedCauseId } from "@/lib/contracts/casebook";
import type {
  CaseOutcomeEvent,
  CaseOutcomeResponse,
  CaseOutcomeView,
  CaseReopenResponse,
} from "@/lib/contracts/case-outcome";
import type { RepairId } from "@/lib/repairs/catalog";
import { recordAudit } from "../audit";
import { conclusionWritersOf } from "../cases/load";
import { refreshCasebookEntry } from "./refresh";

// A diagnosis is confirmed only after the repair: a case closes by the case rules (lib/cases/rules.ts: once
// signed off). Recording the outcome of a case already closed replaces it, for whoever may work on the case.
//
// Two closes of one case at once: the first locks the case's row; the second waits, finds the case closed
// and records its outcome over the first (an "outcome_corrected" audit row). Both answer 200, and the same
// outcome sent twice leaves the same rows: closing is idempotent, the closing moment is the first one.

/**
 * Records what the repair confirmed and what was done, and closes the case: the confirmed causes and the
 * repairs as rows (what the casebook and the shop's statistics learn from), the note on the case, the
 * audit row and the casebook's rows, all in one transaction.
 */
export async function recordCaseOutcome({
  user,
  caseId,
  causes,
  repairIds,
  note,
}: {
  user: User;
  caseId: number;
} & CaseOutcomeInput): Promise<CaseOutcomeResponse> {
  const { sequelize, Case, CaseConfirmedCause, CaseRepair } = getModels();
  const shopId = user.shopId;
  return sequelize.transaction(async (transaction) => {
    const row = await Case.findOne({
      where: { id: caseId, shopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("not_found:case", "No such case in this shop.");
    const alreadyClosed = row.status === "closed";
    const refusal = caseRefusal(alreadyClosed ? "work_on" : "close", user, {
      status: row.status,
      technicianId: row.technicianId,
      conclusionWriterIds: conclusionWritersOf(row),
    });
    if (refusal) throw new AppError(refusal.code, refusal.message);
    const uniqueCauses = [...new Set(causes)];
    const uniqueRepairs = [...new Set(repairIds)];
    await CaseConfirmedCause.destroy({ where: { shopId, caseId }, transaction });
    await CaseRepair.destroy({ where: { shopId, caseId }, transaction });
    await CaseConfirmedCause.bulkCreate(
      uniqueCauses.map((cause) => ({ shopId, caseId, cause })),
      { transaction },
    );
    if (uniqueRepairs.length > 0)
      await CaseRepair.bulkCreate(
        uniqueRepairs.map((repairId) => ({ shopId, caseId, repairId })),
        { transaction },
      );
    const closedAt = row.closedAt ?? new Date();
    row.set({ status: STATUS_AFTER.close, closedAt, repairNote: note ? note : null });
    await row.save({ transaction });
    await recordAudit({
      shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: alreadyClosed ? "outcome_corrected" : "close",
      detail: { causes: uniqueCauses, repairIds: uniqueRepairs, note: note ? note : null },
      transaction,
    });
    await refreshCasebookEntry({ shopId, caseId, transaction });
    return { caseId, status: "closed", closedAt: closedAt.toISOString(), version: row.version };
  });
}

/**
 * A senior or the owner reopens a closed case with a reason. The case goes back to signed off
 * (STATUS_AFTER.reopen), not to the technician's draft: the diagnosis was already checked by a second
 * person, and what a reopen questions is the outcome (the repair did not hold, or the wrong cause was
 * recorded). From signed off the technician records the outcome again and closes the case; a diagnosis
 * that was wrong from the start is a new case, which the casebook links as a comeback. Until it closes
 * again the case teaches the casebook nothing: its confirmed causes and repairs are removed, and the audit
 * row keeps them, with the reason, so nothing is lost.
 */
export async function reopenCase({
  user,
  caseId,
  reason,
}: {
  user: User;
  caseId: number;
  reason: string;
}): Promise<CaseReopenResponse> {
  const { sequelize, Case, CaseConfirmedCause, CaseRepair } = getModels();
  const shopId = user.shopId;
  return sequelize.transaction(async (transaction) => {
    const row = await Case.findOne({
      where: { id: caseId, shopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("not_found:case", "No such case in this shop.");
    const refusal = caseRefusal("reopen", user, {
      status: row.status,
      technicianId: row.technicianId,
      conclusionWriterIds: conclusionWritersOf(row),
    });
    if (refusal) throw new AppError(refusal.code, refusal.message);
    const [causeRows, repairRows] = await Promise.all([
      CaseConfirmedCause.findAll({ where: { shopId, caseId }, transaction, raw: true }),
      CaseRepair.findAll({ where: { shopId, caseId }, transaction, raw: true }),
    ]);
    const previous = {
      causes: causeRows.map((r) => r.cause),
      repairIds: repairRows.map((r) => r.repairId),
      note: row.repairNote,
      closedAt: row.closedAt ? row.closedAt.toISOString() : null,
    };
    await CaseConfirmedCause.destroy({ where: { shopId, caseId }, transaction });
    await CaseRepair.destroy({ where: { shopId, caseId }, transaction });
    const status = STATUS_AFTER.reopen;
    row.set({ status, closedAt: null });
    await row.save({ transaction });
    await recordAudit({
      shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: "reopen",
      detail: { reason, previous },
      transaction,
    });
    await refreshCasebookEntry({ shopId, caseId, transaction });
    return { caseId, status, version: row.version };
  });
}

const HISTORY_ACTIONS = ["close", "outcome_corrected", "reopen"] as const;

/** The case's outcome as stored, and every close and reopen from its audit trail, oldest first. */
export async function caseOutcome({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<CaseOutcomeView> {
  const { Case, CaseConfirmedCause, CaseRepair, AuditEvent, User: UserModel } = getModels();
  const [row, causeRows, repairRows, events] = await Promise.all([
    Case.findOne({ where: { id: caseId, shopId }, attributes: ["closedAt", "repairNote"], raw: true }),
    CaseConfirmedCause.findAll({ where: { shopId, caseId }, order: [["id", "ASC"]], raw: true }),
    CaseRepair.findAll({ where: { shopId, caseId }, order: [["id", "ASC"]], raw: true }),
    AuditEvent.findAll({
      where: {
        shopId,
        entity: "case",
        entityId: String(caseId),
        action: { [Op.in]: [...HISTORY_ACTIONS] },
      },
      include: [{ model: UserModel, as: "actor", attributes: ["name"] }],
      order: [
        ["createdAt", "ASC"],
        ["id", "ASC"],
      ],
    }),
  ]);
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const history: CaseOutcomeEvent[] = events.map((event) => {
    const e = event.get({ plain: true }) as unknown as {
      action: CaseOutcomeEvent["action"];
      createdAt: Date;
      detail: unknown;
      actor: { name: string } | null;
    };
    const detail = jsonColumn(e.detail) as {
      reason?: unknown;
    } | null;
    return {
      action: e.action,
      by: e.actor?.name ?? null,
      at: new Date(e.createdAt).toISOString(),
      reason: typeof detail?.reason === "string" ? detail.reason : null,
    };
  });
  return {
    closedAt: row.closedAt ? new Date(row.closedAt).toISOString() : null,
    causes: causeRows.map((r) => r.cause as ConfirmedCauseId),
    repairIds: repairRows.map((r) => r.repairId as RepairId),
    note: row.repairNote ?? null,
    history,
  };
}
