import "server-only";
import { Op } from "sequelize";
import { getModels } from "@/models";
import { verifyPassword, hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import { admitSignInAttempt, waitText, type Refusal } from "./sign-in-throttle";

// An address an account signed in from within this many days still counts as the owner's own.
const KNOWN_ADDRESS_DAYS = 30;
// Verifying against a real hash keeps the timing the same whether or not the e-mail exists.
let dummyHash: Promise<string> | undefined;

function refusalError({ retryAfterS, reason }: Refusal): AppError {
  const wait = waitText(retryAfterS);
  const message =
    reason === "account"
      ? `Too many sign-in attempts for this account from new places. Sign in from a device you have used before, or wait ${wait}.`
      : `Too many sign-in attempts. Wait ${wait} and try again; the shop owner can reset a forgotten password.`;
  return new AppError("rate_limited:sign-in", message, {
    headers: { "Retry-After": String(Math.max(1, retryAfterS)) },
  });
}

/**
 * Checks an e-mail and password. The attempt is counted (atomically, in MariaDB) before the
 * password is checked; past the limits it is refused with 429 and Retry-After, even when the
 * password is right.
 */
export async function signInWithPassword({
  email,
  password,
  clientAddress,
}: {
  email: string;
  password: string;
  /** The client's address as a trusted proxy reported it; null when no proxy is trusted. */
  clientAddress: string | null;
}) {
  const { User, SignInAttempt } = getModels();
  const normalisedEmail = email.trim().toLowerCase();

  const admission = await admitSignInAttempt({
    email: normalisedEmail,
    clientAddress,
    isKnownAddress: async () =>
      clientAddress !== null &&
      (await SignInAttempt.count({
        where: {
          email: normalisedEmail,
          ip: clientAddress,
          succeeded: true,
          attemptedAt: { [Op.gte]: new Date(Date.now() - KNOWN_ADDRESS_DAYS * 86_400_000) },
        },
      })) > 0,
  });
  if ("refusal" in admission) throw refusalError(admission.refusal);

  const user = await User.unscoped().findOne({ where: { email: normalisedEmail }, raw: true });
  dummyHash ??= hashPassword("not-a-real-password");
  const valid = await verifyPassword(user?.passwordHash ?? (await dummyHash), password);
  // A temporary password an owner set stops working at its expiry (lib/server/passwords.ts).
  const expired = Boolean(user?.passwordExpiresAt && new Date(user.passwordExpiresAt).getTime() < Date.now());
  const succeeded = Boolean(user && user.active && valid && !expired);
  // One row per checked password: the trail of who tried what, and the addresses an account knows.
  await SignInAttempt.create({
    email: normalisedEmail,
    ip: clientAddress ?? "unknown",
    succeeded,
    attemptedAt: new Date(),
  });

  if (user && user.active && valid && expired) {
    // Only someone holding the temporary password learns this.
    throw new AppError(
      "unauthorized:sign-in",
      "That temporary password has expired. Ask the shop owner for a new one.",
    );
  }
  if (!succeeded || !user) {
    throw new AppError("unauthorized:sign-in", "That e-mail and password do not match an active account.");
  }
  await admission.pass.succeeded();
  return { userId: user.id };
}
