import "server-only";
import type { User } from "lucia";
import {
  repairProposalSchema,
  type OwnerAnswerInput,
  type RepairProposalInput,
  type ShopProposalView,
} from "@/lib/contracts/owner-summary";
import { ownerAnswerSchema } from "@/lib/contracts/owner-summary";
import { AppError } from "@/lib/errors";
import { proposalView } from "@/lib/owner/summary";
import { getModels } from "@/models";
import { recordAudit } from "./audit";
import { loadCaseForOwner, loadLatestProposal } from "./owner-case";
import { resolveShareToken } from "./share-links";

/** A new proposal replaces the case's current one; earlier ones and their answers stay on record. */
export async function proposeRepair({
  user,
  caseId,
  input,
}: {
  user: User;
  caseId: number;
  input: RepairProposalInput;
}): Promise<{ id: number }> {
  const data = repairProposalSchema.parse(input);
  await loadCaseForOwner({ user, caseId, forChange: true });
  const { sequelize, RepairProposal } = getModels();
  return sequelize.transaction(async (transaction) => {
    const row = await RepairProposal.create(
      {
        shopId: user.shopId,
        caseId,
        repairIds: data.repairIds,
        priceMinor: data.priceMinor,
        currency: data.currency,
        note: data.note || null,
        proposedBy: user.id,
      },
      { transaction },
    );
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: "repair_proposed",
      detail: {
        proposalId: row.id,
        repairIds: data.repairIds,
        priceMinor: data.priceMinor,
        currency: data.currency,
      },
      transaction,
    });
    return { id: row.id };
  });
}

export async function currentProposalForShop({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<ShopProposalView | null> {
  const proposal = await loadLatestProposal({ shopId, caseId });
  if (!proposal) return null;
  return {
    ...proposalView(proposal, { units: "metric" }),
    proposedBy: proposal.proposedBy,
    answeredViaLinkId: proposal.answeredViaLinkId,
  };
}

/**
 * The owner's yes or no, through a live link, to the case's current proposal. Recorded once: a
 * second answer, or an answer to a proposal the shop has since replaced, is refused (409).
 */
export async function answerProposal({ token, input }: { token: string; input: OwnerAnswerInput }) {
  const data = ownerAnswerSchema.parse(input);
  const link = await resolveShareToken(token);
  const { sequelize, RepairProposal } = getModels();
  return sequelize.transaction(async (transaction) => {
    const latest = await RepairProposal.findOne({
      where: { shopId: link.shopId, caseId: link.caseId },
      order: [
        ["createdAt", "DESC"],
        ["id", "DESC"],
      ],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!latest || latest.id !== data.proposalId)
      throw new AppError(
        "conflict:proposal",
        "The shop has changed its proposal. Reload the page to see the new one.",
      );
    if (latest.answer) throw new AppError("conflict:proposal", "This proposal has already been answered.");
    const answeredAt = new Date();
    await latest.update(
      { answer: data.answer, answerNote: data.note || null, answeredAt, answeredViaLinkId: link.linkId },
      { transaction },
    );
    await recordAudit({
      shopId: link.shopId,
      actorId: null,
      entity: "case",
      entityId: link.caseId,
      action: data.answer === "approved" ? "owner_approved" : "owner_declined",
      detail: { proposalId: latest.id, linkId: link.linkId, note: data.note || null },
      transaction,
    });
    return { answer: data.answer, answeredAt: answeredAt.toISOString() };
  });
}
