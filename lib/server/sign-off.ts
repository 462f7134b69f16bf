import "server-only";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { SignOffInput, SignOffResponse } from "@/lib/contracts/cases";
import { recordAudit } from "./audit";

/** A senior's verdict on an apprentice's diagnosis: appended, never edited. */
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
  const { sequelize, Case, SignOff } = getModels();
  return sequelize.transaction(async (transaction) => {
    const row = await Case.findOne({
      where: { id: caseId, shopId: user.shopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("not_found:case", "No such case in this shop.");
    if (row.status !== "awaiting_signoff")
      throw new AppError("conflict:case", "This case is not waiting for sign-off.");
    if (row.technicianId === user.id)
      throw new AppError("forbidden:case", "A second person signs off: you cannot sign off your own case.");
    await SignOff.create(
      { shopId: user.shopId, caseId, reviewerId: user.id, verdict, comment: comment ?? null },
      { transaction },
    );
    row.set("status", verdict);
    await row.save({ transaction });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: verdict,
      detail: { comment: comment ?? null },
      transaction,
    });
    return { status: verdict, version: row.version };
  });
}
