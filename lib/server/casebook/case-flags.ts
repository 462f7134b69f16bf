import "server-only";
import { getModels } from "@/models";

/** A case's comeback links from the casebook's row: the earlier case it came back after, and the later one. */
export async function caseComebackLinks({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<{ comebackOfCaseId: number | null; cameBackCaseId: number | null }> {
  const row = await getModels().CasebookEntry.findOne({
    where: { shopId, caseId },
    attributes: ["comebackOfCaseId", "cameBackCaseId"],
    raw: true,
  });
  return { comebackOfCaseId: row?.comebackOfCaseId ?? null, cameBackCaseId: row?.cameBackCaseId ?? null };
}
