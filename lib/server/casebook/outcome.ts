import "server-only";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { caseRefusal } from "@/lib/cases/rules";
import type { CaseOutcomeInput } from "@/lib/contracts/casebook";
import { recordAudit } from "../audit";
import { refreshCasebookEntry } from "./refresh";

// A diagnosis is confirmed only after the repair: a case closes by the case rules (lib/cases/rules.ts: once
// signed off). Recording the outcome of a case already closed replaces it, for whoever may work on the case.

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
} & CaseOutcomeInput): Promise<{ caseId: number; closedAt: string; version: number }> {
  const { sequelize, Case, CaseConfirmedCause, CaseRepair } = getModels();
  const shopId = user.shopId;
  return sequelize.transaction(async (transaction) => {
    const row = await Case.findOne({
      where: { id: caseId, shopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("not_found:case", "No such case in this shop.");
    const refusal = caseRefusal(row.status === "closed" ? "work_on" : "close", user, row);
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
    row.set({ status: "closed", closedAt, repairNote: note ? note : null });
    await row.save({ transaction });
    await recordAudit({
      shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: "close",
      detail: { causes: uniqueCauses, repairIds: uniqueRepairs },
      transaction,
    });
    await refreshCasebookEntry({ shopId, caseId, transaction });
    return { caseId, closedAt: closedAt.toISOString(), version: row.version };
  });
}
