import "server-only";
import type { Transaction } from "sequelize";
import { jsonColumn } from "@/lib/db/json-column";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { caseRefusal, type CaseAction } from "@/lib/cases/rules";

/**
 * The case, scoped to the user's shop (404 otherwise), once the case's rules allow this user to do
 * this to it now (403 or 409 with the rule's message). Inside a transaction the row stays locked
 * until the change commits, so the rule still holds when the change is written.
 */
export async function caseForAction({
  user,
  caseId,
  action,
  transaction,
}: {
  user: User;
  caseId: number;
  action: CaseAction;
  transaction?: Transaction;
}) {
  const row = await getModels().Case.findOne({
    where: { id: caseId, shopId: user.shopId },
    raw: true,
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const refusal = caseRefusal(action, user, { ...row, conclusionWriterIds: conclusionWritersOf(row) });
  if (refusal) throw new AppError(refusal.code, refusal.message);
  return row;
}

/** The stored writers of the conclusion (a JSON column, which a raw read may hand back as text). */
export function conclusionWritersOf(row: { conclusionWriterIds?: unknown }): string[] {
  const raw = jsonColumn(row.conclusionWriterIds);
  return Array.isArray(raw) ? raw.filter((id): id is string => typeof id === "string") : [];
}
