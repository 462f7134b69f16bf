import "server-only";
import { createHash, randomBytes } from "node:crypto";
import type { User } from "lucia";
import type { Transaction } from "sequelize";
import type { ShareLinkView } from "@/lib/contracts/owner-summary";
import { AppError } from "@/lib/errors";
import { getModels } from "@/models";
import { recordAudit } from "./audit";
import { loadCaseForOwner } from "./owner-case";

const DAY_MS = 24 * 60 * 60 * 1000;
export const LINK_NO_LONGER_VALID = "This link is no longer valid. Ask the shop for a new one.";

/** 32 random bytes (256 bits) in base64url; only its SHA-256 is stored. */
export function newShareToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashShareToken(token) };
}

export function hashShareToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function ownerPagePath(token: string): string {
  return `/s/${token}`;
}

/** A new link to the case's owner page. The token is returned once and never stored. */
export async function createShareLink({
  user,
  caseId,
  expiresInDays,
  transaction,
}: {
  user: User;
  caseId: number;
  expiresInDays: number;
  transaction?: Transaction;
}): Promise<{ id: number; token: string; expiresAt: Date }> {
  await loadCaseForOwner({ user, caseId, forChange: true });
  const { ShareLink } = getModels();
  const { token, tokenHash } = newShareToken();
  const expiresAt = new Date(Date.now() + expiresInDays * DAY_MS);
  const link = await ShareLink.create(
    { shopId: user.shopId, caseId, tokenHash, createdBy: user.id, expiresAt },
    { transaction },
  );
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "case",
    entityId: caseId,
    action: "share_link_created",
    detail: { linkId: link.id, expiresAt: expiresAt.toISOString() },
    transaction,
  });
  return { id: link.id, token, expiresAt };
}

/** Gives an unsent e-mail's link a fresh token (the old one was never delivered), for the next attempt. */
export async function rotateShareToken({
  shopId,
  linkId,
}: {
  shopId: number;
  linkId: number;
}): Promise<string> {
  const { token, tokenHash } = newShareToken();
  const [changed] = await getModels().ShareLink.update(
    { tokenHash },
    { where: { id: linkId, shopId, revokedAt: null } },
  );
  if (changed !== 1) throw new AppError("conflict:link", "That link was revoked; send a new one.");
  return token;
}

export async function revokeShareLink({
  user,
  caseId,
  linkId,
}: {
  user: User;
  caseId: number;
  linkId: number;
}) {
  await loadCaseForOwner({ user, caseId, forChange: true });
  const { ShareLink } = getModels();
  const link = await ShareLink.findOne({ where: { id: linkId, caseId, shopId: user.shopId } });
  if (!link) throw new AppError("not_found:link", "No such link on this case.");
  if (!link.revokedAt) {
    await link.update({ revokedAt: new Date(), revokedBy: user.id });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: "share_link_revoked",
      detail: { linkId },
    });
  }
  return { revoked: true };
}

export async function listShareLinks({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<ShareLinkView[]> {
  const { ShareLink, User } = getModels();
  const rows = await ShareLink.findAll({
    where: { shopId, caseId },
    include: [{ model: User, as: "creator", attributes: ["name"] }],
    order: [["createdAt", "DESC"]],
  });
  const now = Date.now();
  return rows.map((row) => {
    const l = row.get({ plain: true }) as unknown as ShareLinkRow;
    return {
      id: l.id,
      createdAt: l.createdAt.toISOString(),
      expiresAt: l.expiresAt.toISOString(),
      revokedAt: l.revokedAt?.toISOString() ?? null,
      lastViewedAt: l.lastViewedAt?.toISOString() ?? null,
      viewCount: l.viewCount,
      createdBy: l.creator?.name ?? "",
      state: l.revokedAt ? "revoked" : l.expiresAt.getTime() <= now ? "expired" : "active",
    };
  });
}

type ShareLinkRow = {
  id: number;
  createdAt: Date;
  expiresAt: Date;
  revokedAt: Date | null;
  lastViewedAt: Date | null;
  viewCount: number;
  creator: { name: string } | null;
};

/** The live link a public token names, or a 404 that says the link is no longer valid. */
export async function resolveShareToken(
  token: string,
): Promise<{ linkId: number; shopId: number; caseId: number }> {
  const link = await getModels().ShareLink.findOne({
    where: { tokenHash: hashShareToken(token) },
    raw: true,
  });
  if (!link || link.revokedAt || link.expiresAt.getTime() <= Date.now())
    throw new AppError("not_found:link", LINK_NO_LONGER_VALID);
  return { linkId: link.id, shopId: link.shopId, caseId: link.caseId };
}

export async function noteShareLinkViewed(linkId: number): Promise<void> {
  const { ShareLink, sequelize } = getModels();
  await ShareLink.update(
    { lastViewedAt: new Date(), viewCount: sequelize.literal("view_count + 1") as unknown as number },
    { where: { id: linkId } },
  );
}
