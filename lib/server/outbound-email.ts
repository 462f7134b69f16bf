import "server-only";
import type { User } from "lucia";
import { Op } from "sequelize";
import type { OutboundEmailView, SendOwnerEmailInput } from "@/lib/contracts/emails";
import { sendOwnerEmailSchema } from "@/lib/contracts/emails";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { ownerSummaryEmail } from "@/lib/mail/owner-email";
import { sendMail } from "@/lib/mail/transport";
import { OWNER_SUMMARY_UNAVAILABLE } from "@/lib/owner/availability";
import { getModels, type OutboundEmail } from "@/models";
import { recordAudit } from "./audit";
import { loadCaseForOwner } from "./owner-case";
import { ownerSummaryForCase } from "./owner-summary";
import { createShareLink, ownerPagePath, rotateShareToken } from "./share-links";

// A send in progress holds its row this long; a crashed attempt frees it for a retry afterwards.
const CLAIM_MS = 60_000;

function toView(e: OutboundEmail): OutboundEmailView {
  return {
    id: e.id,
    to: e.toAddress,
    subject: e.subject,
    status: e.status,
    attempts: e.attempts,
    lastError: e.lastError ?? null,
    createdAt: new Date(e.createdAt).toISOString(),
    sentAt: e.sentAt ? new Date(e.sentAt).toISOString() : null,
    shareLinkId: e.shareLinkId ?? null,
  };
}

export function formatDay(date: Date, timeZone: string): string {
  try {
    return new Intl.DateTimeFormat("en", { dateStyle: "long", timeZone }).format(date);
  } catch {
    return new Intl.DateTimeFormat("en", { dateStyle: "long", timeZone: "UTC" }).format(date);
  }
}

/**
 * Records the message (queued) with a link of its own, then tries to send it. A failure is kept
 * on the row and shown on the case; nothing is lost while the mail server is down.
 */
export async function sendOwnerSummaryEmail({
  user,
  caseId,
  input,
}: {
  user: User;
  caseId: number;
  input: SendOwnerEmailInput;
}): Promise<OutboundEmailView> {
  const data = sendOwnerEmailSchema.parse(input);
  const caseRow = await loadCaseForOwner({ user, caseId, forChange: true });
  if (!caseRow.available) throw new AppError("conflict:case", OWNER_SUMMARY_UNAVAILABLE);
  const { sequelize, OutboundEmail } = getModels();
  const { email, token } = await sequelize.transaction(async (transaction) => {
    const link = await createShareLink({ user, caseId, expiresInDays: data.expiresInDays, transaction });
    const row = await OutboundEmail.create(
      {
        shopId: user.shopId,
        caseId,
        shareLinkId: link.id,
        kind: "owner_summary",
        toAddress: data.to,
        subject:
          `${caseRow.shopName}: what we found on ${caseRow.vehicle ? `your ${caseRow.vehicle}` : "your vehicle"}`.slice(
            0,
            200,
          ),
        createdBy: user.id,
      },
      { transaction },
    );
    return { email: row, token: link.token };
  });
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "case",
    entityId: caseId,
    action: "owner_email_queued",
    detail: { emailId: email.id, to: data.to },
  });
  return deliver({ shopId: user.shopId, emailId: email.id, token });
}

export async function retryEmail({ user, caseId, emailId }: { user: User; caseId: number; emailId: number }) {
  await loadCaseForOwner({ user, caseId, forChange: true });
  const row = await getModels().OutboundEmail.findOne({
    where: { id: emailId, caseId, shopId: user.shopId },
  });
  if (!row) throw new AppError("not_found:email", "No such e-mail on this case.");
  if (row.status === "sent") throw new AppError("conflict:email", "This e-mail was already sent.");
  return deliver({ shopId: user.shopId, emailId });
}

/** One attempt. The link's token is renewed for it unless the caller has the fresh one. */
async function deliver({ shopId, emailId, token }: { shopId: number; emailId: number; token?: string }) {
  const { OutboundEmail, sequelize } = getModels();
  const now = new Date();
  const [claimed] = await OutboundEmail.update(
    {
      claimedUntil: new Date(now.getTime() + CLAIM_MS),
      attempts: sequelize.literal("attempts + 1") as unknown as number,
    },
    {
      where: {
        id: emailId,
        shopId,
        status: { [Op.in]: ["queued", "failed"] },
        [Op.or]: [{ claimedUntil: null }, { claimedUntil: { [Op.lt]: now } }],
      },
    },
  );
  if (claimed !== 1) throw new AppError("conflict:email", "This e-mail is being sent or was already sent.");
  const row = (await OutboundEmail.findOne({ where: { id: emailId, shopId } }))!;
  try {
    if (!row.caseId || !row.shareLinkId) throw new Error("the e-mail has no case or link");
    const linkToken = token ?? (await rotateShareToken({ shopId, linkId: row.shareLinkId }));
    const link = await getModels().ShareLink.findOne({ where: { id: row.shareLinkId, shopId }, raw: true });
    const { summary, caseRow } = await ownerSummaryForCase({ shopId, caseId: row.caseId });
    const message = ownerSummaryEmail({
      summary,
      link: `${env().APP_ORIGIN}${ownerPagePath(linkToken)}`,
      expiresOn: formatDay(link?.expiresAt ?? now, caseRow.timeZone),
    });
    const { messageId } = await sendMail({ to: row.toAddress, ...message });
    await row.update({ status: "sent", sentAt: new Date(), messageId, lastError: null, claimedUntil: null });
  } catch (error) {
    const reason = error instanceof AppError ? error.message : describeMailError(error);
    await row.update({ status: "failed", lastError: reason.slice(0, 500), claimedUntil: null });
  }
  return toView(row);
}

function describeMailError(error: unknown): string {
  const e = error as { code?: string; message?: string } | null;
  const detail = [e?.code, e?.message].filter(Boolean).join(": ") || "unknown error";
  return `The mail server did not take the message (${detail}). It is kept here; retry when the server is back.`;
}

export async function listEmails({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<OutboundEmailView[]> {
  const rows = await getModels().OutboundEmail.findAll({
    where: { shopId, caseId },
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
  });
  return rows.map(toView);
}
