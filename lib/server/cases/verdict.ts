import "server-only";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { STATUS_AFTER, VERDICT_ACTION } from "@/lib/cases/rules";
import type { SignOffInput, SignOffResponse } from "@/lib/contracts/cases";
import { updateCaseAtVersion } from "@/lib/db/versioned-update";
import { recordAudit } from "../audit";
import { caseForAction } from "./load";
import { refreshCasebookEntry } from "../casebook/refresh";

/** A second person's verdict on a submitted diagnosis: appended, never edited. */
export async function recordSignOff({
  user,
  caseId,
  verdict,
  comment,
}: {
  user: User;
  caseId: number;
  verdict: SignOffInput["verdict"];
  comment?: string;
}): Promise<SignOffResponse> {
  const { sequelize, SignOff } = getModels();
  const action = VERDICT_ACTION[verdict];
  return sequelize.transaction(async (transaction) => {
    const row = await caseForAction({ user, caseId, action, transaction });
    await SignOff.create(
      { shopId: user.shopId, caseId, reviewerId: user.id, verdict, comment: comment ?? null },
      { transaction },
    );
    const status = STATUS_AFTER[action];
    const version = await updateCaseAtVersion({
      shopId: user.shopId,
      caseId,
      expectedVersion: row.version,
      changes: { status },
      transaction,
    });
    // The row is locked until this transaction ends, so its version cannot have moved.
    if (version === null) throw new AppError("conflict:case");
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: verdict,
      detail: { comment: comment ?? null },
      transaction,
    });
    // The senior's comment is searchable, and the status facet follows the verdict.
    await refreshCasebookEntry({ shopId: user.shopId, caseId, transaction });
    return { status, version };
  });
}
