import { literal, type Transaction, type WhereOptions } from "sequelize";
import { getModels, type Case, type JsonObject, type JsonValue } from "@/models";

// For writes that arrive with the version the client last saw (interview drafts from two devices):
// the update applies only when that version is still current, and bumps it in the same statement.

export type CaseChanges = Partial<{
  status: Case["status"];
  complaint: string;
  symptomTags: string[];
  interviewStep: string | null;
  answers: JsonObject;
  findings: JsonValue | null;
  engineVersion: string | null;
  conclusionCause: string | null;
  conclusionNotes: string | null;
  confirmedRepair: string | null;
  submittedAt: Date | null;
  conclusionWriterIds: string[];
}>;

export type UpdateCaseAtVersionInput = {
  shopId: number;
  caseId: number;
  expectedVersion: number;
  changes: CaseChanges;
  transaction?: Transaction;
};

/** Returns the new version, or null when the case is missing, in another shop, or was changed since. */
export async function updateCaseAtVersion({
  shopId,
  caseId,
  expectedVersion,
  changes,
  transaction,
}: UpdateCaseAtVersionInput): Promise<number | null> {
  const where: WhereOptions<Case> = { id: caseId, shopId, version: expectedVersion };
  const [affected] = await getModels().Case.update(
    { ...changes, version: literal("version + 1") as unknown as number },
    { where, transaction },
  );
  return affected === 1 ? expectedVersion + 1 : null;
}
