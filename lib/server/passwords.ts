import "server-only";
import { randomInt } from "node:crypto";
import { Op } from "sequelize";
import type { User } from "lucia";
import { getModels } from "@/models";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import {
  TEMPORARY_PASSWORD_LIFETIME_HOURS,
  passwordEmailProblem,
  type ChangePasswordInput,
  type PasswordChangedResponse,
  type PasswordResetResponse,
} from "@/lib/contracts/passwords";
import { recordAudit } from "./audit";
import { forgetUserSessions } from "@/lib/auth/session-cache";
import { readerRow } from "./profile";

/** Wrong current passwords allowed per person in the window before the check pauses. */
const CURRENT_PASSWORD_TRIES = 5;
const CURRENT_PASSWORD_WINDOW_MIN = 15;

// No 0/o, 1/l/i: read aloud or copied from a screen, a temporary password must survive a glance.
const TEMPORARY_ALPHABET = "abcdefghjkmnpqrstuvwxyz23456789";

/** Four groups of four from 31 letters and digits: about 79 bits, easy to read out. */
export function temporaryPassword(): string {
  const group = () => Array.from({ length: 4 }, () => TEMPORARY_ALPHABET[randomInt(31)]).join("");
  return [group(), group(), group(), group()].join("-");
}

/** Whether this person signed in with a temporary password and must choose their own first. */
export async function passwordMustChange({
  userId,
  shopId,
}: {
  userId: string;
  shopId: number;
}): Promise<boolean> {
  // The same read as the person's units (./profile.ts): the shell asks for both while one page renders.
  const row = await readerRow(userId, shopId);
  return Boolean(row?.passwordMustChange);
}

type CheckOutcome = { ended: number } | { refused: "wrong" } | { refused: "paused"; retryAfterS: number };

/**
 * A person changes their own password: the current one is checked (a few wrong tries, then a
 * pause, counted under a lock on their row so parallel tries cannot slip past), the new one is
 * stored as an argon2id hash, and their other sessions end; this one stays.
 */
export async function changeOwnPassword({
  user,
  sessionId,
  input,
}: {
  user: User;
  sessionId: string;
  input: ChangePasswordInput;
}): Promise<PasswordChangedResponse> {
  const emailProblem = passwordEmailProblem(input.newPassword, user.email);
  if (emailProblem)
    throw new AppError("bad_request:password", emailProblem, {
      fieldErrors: { newPassword: [emailProblem] },
    });
  const { sequelize, User: Users, AuditEvent, Session } = getModels();
  // Hashed before the lock is taken: argon2id is deliberately slow.
  const newHash = await hashPassword(input.newPassword);
  const outcome = await sequelize.transaction(async (transaction): Promise<CheckOutcome> => {
    const row = await Users.scope("withPasswordHash").findOne({
      where: { id: user.id, shopId: user.shopId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!row) throw new AppError("not_found:user", "No such person in this shop.");
    // The locking read above is this transaction's first, so the count below sees every failed
    // try committed before the lock was granted, not an older snapshot.
    const since = new Date(Date.now() - CURRENT_PASSWORD_WINDOW_MIN * 60_000);
    const failures = await AuditEvent.findAll({
      where: {
        shopId: user.shopId,
        entity: "user",
        entityId: user.id,
        action: "password_check_failed",
        createdAt: { [Op.gte]: since },
      },
      attributes: ["createdAt"],
      order: [["createdAt", "ASC"]],
      raw: true,
      transaction,
    });
    if (failures.length >= CURRENT_PASSWORD_TRIES) {
      const oldest = new Date(failures[0]!.createdAt).getTime();
      const retryAfterS = Math.max(
        1,
        Math.ceil((oldest + CURRENT_PASSWORD_WINDOW_MIN * 60_000 - Date.now()) / 1000),
      );
      return { refused: "paused", retryAfterS };
    }
    if (!(await verifyPassword(row.passwordHash, input.currentPassword))) {
      await recordAudit({
        shopId: user.shopId,
        actorId: user.id,
        entity: "user",
        entityId: user.id,
        action: "password_check_failed",
        transaction,
      });
      return { refused: "wrong" };
    }
    await row.update(
      { passwordHash: newHash, passwordMustChange: false, passwordExpiresAt: null },
      { transaction },
    );
    const ended = await Session.destroy({
      where: { userId: user.id, id: { [Op.ne]: sessionId } },
      transaction,
    });
    // The ended sessions must not live on in this process's short session memory (lib/auth/session-cache.ts);
    // this one is read again too, so the "must change" flag is not remembered past the change.
    forgetUserSessions(user.id);
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "user",
      entityId: user.id,
      action: "password_changed",
      detail: { otherSessionsEnded: ended },
      transaction,
    });
    return { ended };
  });
  if ("ended" in outcome) return { otherSessionsEnded: outcome.ended };
  if (outcome.refused === "paused")
    throw new AppError(
      "rate_limited:password",
      `Too many wrong current passwords. Wait ${Math.ceil(outcome.retryAfterS / 60)} min, or ask the shop owner to reset it.`,
      { headers: { "Retry-After": String(outcome.retryAfterS) } },
    );
  throw new AppError("bad_request:password", "That is not your current password.", {
    fieldErrors: { currentPassword: ["That is not your current password."] },
  });
}

/**
 * An owner resets a person's password: a temporary one is made, shown to the owner this once and
 * stored only as a hash; every session of that person ends, and they must choose their own
 * password when they next sign in, within TEMPORARY_PASSWORD_LIFETIME_HOURS.
 */
export async function resetPassword({
  actor,
  userId,
}: {
  actor: User;
  userId: string;
}): Promise<PasswordResetResponse> {
  if (userId === actor.id)
    throw new AppError(
      "conflict:user",
      "Change your own password from your account page; a reset is for someone else.",
    );
  const { sequelize, User: Users, Session } = getModels();
  const password = temporaryPassword();
  const passwordHash = await hashPassword(password);
  const expiresAt = new Date(Date.now() + TEMPORARY_PASSWORD_LIFETIME_HOURS * 3_600_000);
  return sequelize.transaction(async (transaction) => {
    const row = await Users.findOne({
      where: { id: userId, shopId: actor.shopId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!row) throw new AppError("not_found:user", "No such person in this shop.");
    if (!row.active)
      throw new AppError(
        "conflict:user",
        `${row.name} is inactive. Reactivate them before resetting their password.`,
      );
    await Users.update(
      { passwordHash, passwordMustChange: true, passwordExpiresAt: expiresAt },
      { where: { id: row.id, shopId: actor.shopId }, transaction },
    );
    const sessionsEnded = await Session.destroy({ where: { userId: row.id }, transaction });
    forgetUserSessions(row.id);
    // The temporary password itself is never written anywhere but the answer to the owner.
    await recordAudit({
      shopId: actor.shopId,
      actorId: actor.id,
      entity: "user",
      entityId: row.id,
      action: "password_reset",
      detail: { sessionsEnded, expiresAt: expiresAt.toISOString() },
      transaction,
    });
    return {
      user: { id: row.id, email: row.email, name: row.name, role: row.role, active: Boolean(row.active) },
      temporaryPassword: password,
      expiresAt: expiresAt.toISOString(),
      sessionsEnded,
    };
  });
}
