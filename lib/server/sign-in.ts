import "server-only";
import { Op } from "sequelize";
import { getModels } from "@/models";
import { env } from "@/lib/env";
import { verifyPassword, hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";

// Failed sign-ins are counted in the database, so every app instance sees the same count.
const IP_FAILURE_FACTOR = 4;
// Verifying against a real hash keeps the timing the same whether or not the e-mail exists.
let dummyHash: Promise<string> | undefined;

export async function signInWithPassword({
  email,
  password,
  ip,
}: {
  email: string;
  password: string;
  ip: string | null;
}) {
  const { User, SignInAttempt } = getModels();
  const { SIGN_IN_MAX_FAILURES, SIGN_IN_WINDOW_MINUTES } = env();
  const normalisedEmail = email.trim().toLowerCase();
  const since = new Date(Date.now() - SIGN_IN_WINDOW_MINUTES * 60_000);

  const [emailFailures, ipFailures] = await Promise.all([
    SignInAttempt.count({
      where: { email: normalisedEmail, succeeded: false, attemptedAt: { [Op.gte]: since } },
    }),
    ip ? SignInAttempt.count({ where: { ip, succeeded: false, attemptedAt: { [Op.gte]: since } } }) : 0,
  ]);
  if (emailFailures >= SIGN_IN_MAX_FAILURES || ipFailures >= SIGN_IN_MAX_FAILURES * IP_FAILURE_FACTOR) {
    throw new AppError(
      "rate_limited:sign-in",
      `Too many failed sign-ins. Wait ${SIGN_IN_WINDOW_MINUTES} minutes, or ask the shop owner to check the account.`,
      { headers: { "Retry-After": String(SIGN_IN_WINDOW_MINUTES * 60) } },
    );
  }

  const user = await User.unscoped().findOne({ where: { email: normalisedEmail }, raw: true });
  dummyHash ??= hashPassword("not-a-real-password");
  const valid = await verifyPassword(user?.passwordHash ?? (await dummyHash), password);
  const succeeded = Boolean(user && user.active && valid);
  await SignInAttempt.create({
    email: normalisedEmail,
    ip: ip ?? "unknown",
    succeeded,
    attemptedAt: new Date(),
  });

  if (!succeeded || !user) {
    throw new AppError("unauthorized:sign-in", "That e-mail and password do not match an active account.");
  }
  return { userId: user.id };
}
