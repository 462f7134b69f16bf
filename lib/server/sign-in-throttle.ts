import "server-only";
import { createHash } from "node:crypto";
import { RateLimiterMySQL, RateLimiterRes } from "rate-limiter-flexible";
import { getMysqlPool } from "@/lib/db/pool";
import { databaseConfig, env } from "@/lib/env";

// Sign-in attempts are counted in MariaDB before any password is checked: each count is one atomic
// INSERT … ON DUPLICATE KEY UPDATE, so parallel requests and several app instances share one
// count and no more than the allowed number of passwords is ever checked.
//
// Three counts, each slowing down rather than locking out:
// - one account from one client address: a few free attempts, then a pause that grows each time
//   (a success clears it), so a person who mistypes waits a minute, and a guesser waits longer;
// - one client address over all accounts (only when a trusted proxy names the address): stops one
//   machine from trying many accounts once each;
// - one account from every address: past its limit only addresses that signed in to that account
//   before get through, so guessing from many machines cannot shut the owner out.

export const THROTTLE_TABLE = "sign_in_throttle";
/** Seconds of each successive pause: 1, 2, 5, 10, 15, 30, then 60 minutes (common practice). */
export const PAUSE_SCHEDULE_S = [60, 120, 300, 600, 900, 1800, 3600] as const;
const PAUSE_MEMORY_S = 24 * 3600;
export const CLIENT_FREE_ATTEMPTS = 20;
export const ACCOUNT_FREE_ATTEMPTS = 30;
const ACCOUNT_WINDOW_S = 3600;
const MAX_STORE_TRIES = 5;

export type Refusal = { retryAfterS: number; reason: "account_client" | "client" | "account" };

function sha256(text: string): string {
  return createHash("sha256").update(text).digest("hex");
}

function isLockConflict(error: unknown): boolean {
  const errno = (error as { errno?: number } | null)?.errno;
  return errno === 1213 || errno === 1205; // deadlock, lock wait timeout: InnoDB rolled back, try again
}

/** A store operation, tried again when InnoDB resolves a lock conflict between parallel first inserts. */
async function stored<T>(operation: () => Promise<T>): Promise<T> {
  for (let tries = 1; ; tries += 1) {
    try {
      return await operation();
    } catch (error) {
      if (error instanceof RateLimiterRes || tries >= MAX_STORE_TRIES || !isLockConflict(error)) throw error;
      await new Promise((resolve) => setTimeout(resolve, 5 + Math.random() * 20 * tries));
    }
  }
}

function limiter(keyPrefix: string, points: number, durationS: number, clearExpired = false) {
  return new RateLimiterMySQL({
    storeClient: getMysqlPool().pool,
    storeType: "pool",
    dbName: databaseConfig().database,
    tableName: THROTTLE_TABLE,
    // The table comes from a migration; the library would otherwise try CREATE DATABASE.
    tableCreated: true,
    clearExpiredByTimeout: clearExpired,
    keyPrefix,
    points,
    duration: durationS,
  });
}

type Admission = { admitted: true; cost: number } | { admitted: false; retryAfterS: number };

/** Free attempts within a window; the attempt past them starts a pause, each pause longer than the last. */
class PausingLimiter {
  private readonly attempts: RateLimiterMySQL;
  private readonly pauses: RateLimiterMySQL;

  constructor(
    name: string,
    private readonly freeAttempts: number,
    windowS: number,
    clearExpired = false,
  ) {
    this.attempts = limiter(name, freeAttempts, windowS, clearExpired);
    this.pauses = limiter(`${name}-pauses`, 1_000_000, PAUSE_MEMORY_S);
  }

  async admit(key: string): Promise<Admission> {
    // After a pause, one attempt costs the whole allowance: one try, then the next, longer pause.
    const pausesSoFar = (await stored(() => this.pauses.get(key)))?.consumedPoints ?? 0;
    const cost = pausesSoFar > 0 ? this.freeAttempts : 1;
    try {
      await stored(() => this.attempts.consume(key, cost));
      return { admitted: true, cost };
    } catch (rejection) {
      if (!(rejection instanceof RateLimiterRes)) throw rejection;
      const crossed = rejection.consumedPoints - cost <= this.freeAttempts;
      if (!crossed) return { admitted: false, retryAfterS: Math.ceil(rejection.msBeforeNext / 1000) };
      // Exactly one attempt crosses the allowance (the count is atomic): it starts the next pause.
      const pauseNumber = (await stored(() => this.pauses.penalty(key))).consumedPoints;
      const pauseS = PAUSE_SCHEDULE_S[Math.min(pauseNumber, PAUSE_SCHEDULE_S.length) - 1] ?? 60;
      await stored(() => this.attempts.block(key, pauseS));
      return { admitted: false, retryAfterS: pauseS };
    }
  }

  /** A success: the attempt does not count against the allowance. */
  async giveBack(key: string, cost: number) {
    await stored(() => this.attempts.reward(key, cost));
  }

  /** A success for this account from this address: its mistakes and pauses are forgiven. */
  async forget(key: string) {
    await stored(() => this.attempts.delete(key));
    await stored(() => this.pauses.delete(key));
  }
}

type Limiters = { accountClient: PausingLimiter; client: PausingLimiter; account: RateLimiterMySQL };
const cache = globalThis as typeof globalThis & { chillwrightSignInLimiters?: Limiters };

function limiters(): Limiters {
  const { SIGN_IN_MAX_FAILURES, SIGN_IN_WINDOW_MINUTES } = env();
  cache.chillwrightSignInLimiters ??= {
    accountClient: new PausingLimiter("ac", SIGN_IN_MAX_FAILURES, SIGN_IN_WINDOW_MINUTES * 60, true),
    client: new PausingLimiter("c", CLIENT_FREE_ATTEMPTS, SIGN_IN_WINDOW_MINUTES * 60),
    account: limiter("a", ACCOUNT_FREE_ATTEMPTS, ACCOUNT_WINDOW_S),
  };
  return cache.chillwrightSignInLimiters;
}

export interface SignInPass {
  /** Call after a correct password: clears this account's count at this address, returns the rest. */
  succeeded(): Promise<void>;
}

/**
 * Counts one sign-in attempt for `email` (already normalised) from `clientAddress` (null when no
 * trusted proxy names it) and says whether its password may be checked. Attempts for e-mails no
 * account has are counted the same way, so the answer tells nothing about who has an account.
 */
export async function admitSignInAttempt({
  email,
  clientAddress,
  isKnownAddress,
}: {
  email: string;
  clientAddress: string | null;
  /** Has this account signed in from this address before? Asked only past the account-wide limit. */
  isKnownAddress: () => Promise<boolean>;
}): Promise<{ pass: SignInPass } | { refusal: Refusal }> {
  const { accountClient, client, account } = limiters();
  // Keys are hashes: the throttle table holds no e-mail address or client address in clear.
  const accountClientKey = sha256(`${email}\n${clientAddress ?? "unknown client"}`);

  const first = await accountClient.admit(accountClientKey);
  if (!first.admitted) return { refusal: { retryAfterS: first.retryAfterS, reason: "account_client" } };

  // Without a trusted proxy every request is "unknown client": the per-account count above is all there is.
  if (!clientAddress) return { pass: { succeeded: () => accountClient.forget(accountClientKey) } };

  const clientKey = sha256(clientAddress);
  const accountKey = sha256(email);
  const second = await client.admit(clientKey);
  if (!second.admitted) return { refusal: { retryAfterS: second.retryAfterS, reason: "client" } };

  let accountCost = 0;
  try {
    await stored(() => account.consume(accountKey, 1));
    accountCost = 1;
  } catch (rejection) {
    if (!(rejection instanceof RateLimiterRes)) throw rejection;
    if (!(await isKnownAddress()))
      return {
        refusal: { retryAfterS: Math.ceil(rejection.msBeforeNext / 1000), reason: "account" },
      };
  }

  return {
    pass: {
      async succeeded() {
        await accountClient.forget(accountClientKey);
        await client.giveBack(clientKey, second.cost);
        if (accountCost) await stored(() => account.reward(accountKey, accountCost));
      },
    },
  };
}

/** "45 seconds", "1 minute", "15 minutes": how long to wait, for the message beside Retry-After. */
export function waitText(seconds: number): string {
  if (seconds < 60) return `${Math.max(1, seconds)} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}
