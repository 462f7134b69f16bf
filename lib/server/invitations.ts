import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { generateIdFromEntropySize } from "lucia";
import { Op, Transaction } from "sequelize";
import { getModels } from "@/models";
import { hashPassword } from "@/lib/auth/password";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import {
  INVITATION_LIFETIME_DAYS,
  type InvitationSentDto,
  type PendingInvitationDto,
} from "@/lib/contracts/invitations";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { invitationEmail } from "@/lib/mail/invitation-email";
import { sendMail } from "@/lib/mail/transport";
import { recordAudit } from "./audit";

// An owner adds a person by inviting an e-mail address. The owner's answer is the same whether or
// not that address has an account at another shop: the shop learns nothing about who uses the
// product elsewhere. Only the person who reads the mail learns it, when the link says so.

const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

function toDto(row: {
  id: number;
  email: string;
  name: string;
  role: Role;
  expiresAt: Date;
}): PendingInvitationDto {
  const expiresAt = new Date(row.expiresAt);
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    expiresAt: expiresAt.toISOString(),
    expired: expiresAt.getTime() <= Date.now(),
  };
}

export async function inviteUser({
  shopId,
  actorId,
  email,
  name,
  role,
}: {
  shopId: number;
  actorId: string;
  email: string;
  name: string;
  role: Role;
}): Promise<InvitationSentDto> {
  const { User, UserInvitation, Shop, sequelize } = getModels();
  const normalisedEmail = email.trim().toLowerCase();
  // Only this shop's own people are looked up: the owner sees them on the same page anyway.
  const member = await User.findOne({ where: { shopId, email: normalisedEmail }, attributes: ["id"] });
  if (member) {
    throw new AppError("conflict:user", `${normalisedEmail} is already one of this shop's people.`, {
      fieldErrors: { email: ["Already one of this shop's people."] },
    });
  }

  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_DAYS * 86_400_000);
  // Inviting the same address again (even in parallel) keeps one row and replaces its link.
  await sequelize.query(
    "INSERT INTO user_invitation (shop_id, email, name, role, token_hash, invited_by, expires_at) " +
      "VALUES (?, ?, ?, ?, ?, ?, ?) ON DUPLICATE KEY UPDATE name = VALUES(name), role = VALUES(role), " +
      "token_hash = VALUES(token_hash), invited_by = VALUES(invited_by), expires_at = VALUES(expires_at), " +
      "accepted_at = NULL, updated_at = CURRENT_TIMESTAMP(3)",
    { replacements: [shopId, normalisedEmail, name.trim(), role, hashToken(token), actorId, expiresAt] },
  );
  const row = await UserInvitation.findOne({ where: { shopId, email: normalisedEmail }, raw: true });
  if (!row) throw new Error("invitation row missing right after it was written");
  const shop = await Shop.findByPk(shopId, { attributes: ["name"], raw: true });

  const link = new URL(`/invitation/${token}`, env().APP_ORIGIN).toString();
  // Whether the mail server takes the message has nothing to do with who the address belongs to,
  // so saying so tells the owner nothing about other shops.
  let mailed = true;
  try {
    await sendMail({
      to: normalisedEmail,
      ...invitationEmail({
        shopName: shop?.name ?? "A shop",
        name: name.trim(),
        roleLabel: ROLE_LABELS[role],
        link,
        validDays: INVITATION_LIFETIME_DAYS,
      }),
    });
  } catch (error) {
    mailed = false;
    console.error("invitation mail not sent", (error as Error).message);
  }
  await recordAudit({
    shopId,
    actorId,
    entity: "invitation",
    entityId: row.id,
    action: "invite",
    detail: { role, mailed },
  });
  return {
    invitation: toDto(row),
    mailed,
    message: mailed
      ? `Invitation sent to ${normalisedEmail}.`
      : `The invitation to ${normalisedEmail} is saved, but the mail server did not take it. Send it again in a moment.`,
  };
}

export async function listInvitations({ shopId }: { shopId: number }): Promise<PendingInvitationDto[]> {
  const rows = await getModels().UserInvitation.findAll({
    where: { shopId, acceptedAt: null },
    order: [["createdAt", "DESC"]],
    raw: true,
  });
  return rows.map(toDto);
}

export async function withdrawInvitation({
  shopId,
  actorId,
  id,
}: {
  shopId: number;
  actorId: string;
  id: number;
}): Promise<void> {
  const removed = await getModels().UserInvitation.destroy({ where: { id, shopId, acceptedAt: null } });
  if (removed === 0) throw new AppError("not_found:invitation", "No such open invitation in this shop.");
  await recordAudit({ shopId, actorId, entity: "invitation", entityId: id, action: "withdraw" });
}

export type InvitationView =
  | { state: "open"; shopName: string; email: string; name: string; role: Role }
  | { state: "address_taken"; shopName: string; email: string }
  | { state: "invalid" };

/** What the link's page shows; the token itself is checked against its hash only. */
export async function viewInvitation({ token }: { token: string }): Promise<InvitationView> {
  const { UserInvitation, User, Shop } = getModels();
  const row = await UserInvitation.findOne({
    where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
    raw: true,
  });
  if (!row) return { state: "invalid" };
  const shop = await Shop.findByPk(row.shopId, { attributes: ["name"], raw: true });
  const shopName = shop?.name ?? "the shop";
  const taken = await User.findOne({ where: { email: row.email }, attributes: ["id"], raw: true });
  if (taken) return { state: "address_taken", shopName, email: row.email };
  return { state: "open", shopName, email: row.email, name: row.name, role: row.role };
}

const INVALID_LINK =
  "This invitation link is no longer valid: it was used, withdrawn, replaced by a newer one or is over " +
  `${INVITATION_LIFETIME_DAYS} days old. Ask the shop owner to invite you again.`;

/**
 * Sets the password and creates the account, once: the invitation row is locked while it is read
 * and marked accepted in the same transaction, so parallel clicks on the link make one account.
 */
export async function acceptInvitation({
  token,
  name,
  password,
}: {
  token: string;
  name: string;
  password: string;
}): Promise<{ userId: string; shopId: number }> {
  const { UserInvitation, User, sequelize } = getModels();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(
    { isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED },
    async (transaction) => {
      const row = await UserInvitation.findOne({
        where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
        lock: transaction.LOCK.UPDATE,
        transaction,
      });
      if (!row) throw new AppError("not_found:invitation", INVALID_LINK);
      const taken = await User.findOne({ where: { email: row.email }, attributes: ["id"], transaction });
      if (taken) {
        throw new AppError(
          "conflict:invitation",
          "This e-mail address already has a Chillwright account, and an address belongs to one shop at a time. " +
            "Ask the shop owner to invite another address.",
        );
      }
      const user = await User.create(
        {
          id: generateIdFromEntropySize(10),
          shopId: row.shopId,
          email: row.email,
          name: name.trim(),
          role: row.role,
          passwordHash,
          active: true,
        },
        { transaction },
      );
      row.acceptedAt = new Date();
      await row.save({ transaction });
      await recordAudit({
        shopId: row.shopId,
        actorId: user.id,
        entity: "invitation",
        entityId: row.id,
        action: "accept",
        transaction,
      });
      return { userId: user.id, shopId: row.shopId };
    },
  );
}
