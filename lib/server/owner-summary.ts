import "server-only";
import type { OwnerSummary, SharedPhoto } from "@/lib/contracts/owner-summary";
import { AppError } from "@/lib/errors";
import { ownerFactsFromCase, repairsDoneFromRecord } from "@/lib/owner/case-facts";
import { buildOwnerSummary } from "@/lib/owner/summary";
import { getModels } from "@/models";
import { loadLatestProposal, loadOwnerCase, loadServiceRecordFacts, type OwnerCaseRow } from "./owner-case";
import { LINK_NO_LONGER_VALID, noteShareLinkViewed, resolveShareToken } from "./share-links";

export interface OwnerSummaryBundle {
  summary: OwnerSummary;
  photos: SharedPhoto[];
  caseRow: OwnerCaseRow;
}

/** The owner summary of a case in the shop, with the photos marked shareable. */
export async function ownerSummaryForCase({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<OwnerSummaryBundle> {
  const caseRow = await loadOwnerCase({ shopId, caseId });
  const [record, proposal, photos] = await Promise.all([
    loadServiceRecordFacts({ shopId, caseId }),
    loadLatestProposal({ shopId, caseId }),
    sharedPhotos({ shopId, caseId }),
  ]);
  const facts = ownerFactsFromCase({
    units: caseRow.units,
    answersRecord: caseRow.answers,
    serviceRecord: record,
  });
  const summary = buildOwnerSummary({
    shopName: caseRow.shopName,
    vehicle: caseRow.vehicle,
    complaint: caseRow.complaint,
    status: caseRow.status,
    conclusionCause: caseRow.conclusionCause,
    findings: caseRow.findings,
    facts,
    repairsDone: repairsDoneFromRecord(record),
    proposal,
  });
  return { summary, photos, caseRow };
}

async function sharedPhotos({ shopId, caseId }: { shopId: number; caseId: number }): Promise<SharedPhoto[]> {
  const rows = await getModels().Attachment.findAll({
    where: { shopId, caseId, shareable: true },
    attributes: ["id", "caption", "kind", "widthPx", "heightPx"],
    order: [["createdAt", "ASC"]],
    raw: true,
  });
  return rows.map((r) => ({
    id: r.id,
    caption: r.caption,
    kind: r.kind,
    widthPx: r.widthPx,
    heightPx: r.heightPx,
  }));
}

/** What a public token shows: a live link to a case whose summary is available, else "no longer valid". */
export async function publicOwnerSummary(
  token: string,
  { countView = false }: { countView?: boolean } = {},
): Promise<OwnerSummaryBundle & { linkId: number }> {
  const link = await resolveShareToken(token);
  const bundle = await ownerSummaryForCase({ shopId: link.shopId, caseId: link.caseId }).catch((error) => {
    throw error instanceof AppError && error.status === 404
      ? new AppError("not_found:link", LINK_NO_LONGER_VALID)
      : error;
  });
  if (!bundle.caseRow.available) throw new AppError("not_found:link", LINK_NO_LONGER_VALID);
  if (countView) await noteShareLinkViewed(link.linkId);
  return { ...bundle, linkId: link.linkId };
}
