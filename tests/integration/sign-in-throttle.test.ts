import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { hashPassword } from "@/lib/auth/password";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { newUserId } from "@/scripts/demo/seed-demo";
import { isAppError } from "@/lib/errors";
import { signInWithPassword } from "@/lib/server/sign-in";
import { ACCOUNT_FREE_ATTEMPTS, CLIENT_FREE_ATTEMPTS, PAUSE_SCHEDULE_S } from "@/lib/server/sign-in-throttle";
import { getModels } from "@/models";
import { uniqueName } from "./helpers";

// Every attempt here is made through signInWithPassword, the function POST /api/session calls,
// with the client address a trusted proxy would report (or null: no proxy trusted).
const PASSWORD = "frosty-hoses-2026";
const FREE = 5; // SIGN_IN_MAX_FAILURES's default
let passwordHash = "";
let shopId = 0;
let addressCounter = 0;

/** A client address no other test uses (TEST-NET-3 and 2001:db8::/32 are reserved for documentation). */
function newAddress(): string {
  addressCounter += 1;
  return `203.0.${Math.floor(addressCounter / 250) + 113}.${(addressCounter % 250) + 1}`;
}

async function newAccount(): Promise<string> {
  const email = `${uniqueName("owner")}@throttle.test`;
  await getModels().User.create({
    id: newUserId(),
    shopId,
    email,
    name: "Throttle Owner",
    passwordHash,
    role: "owner",
  });
  return email;
}

type Outcome = { kind: "in" } | { kind: "wrong" } | { kind: "slowed"; retryAfterS: number };

async function attempt(email: string, password: string, clientAddress: string | null): Promise<Outcome> {
  try {
    await signInWithPassword({ email, password, clientAddress });
    return { kind: "in" };
  } catch (error) {
    if (!isAppError(error)) throw error;
    if (error.status === 401) return { kind: "wrong" };
    expect(error.status).toBe(429);
    const retryAfterS = Number(error.headers?.["Retry-After"]);
    expect(retryAfterS).toBeGreaterThan(0);
    return { kind: "slowed", retryAfterS };
  }
}

const count = (outcomes: Outcome[], kind: Outcome["kind"]) => outcomes.filter((o) => o.kind === kind).length;

async function checkedPasswords(email: string): Promise<number> {
  return getModels().SignInAttempt.count({ where: { email } });
}

/** Lets the clock run past every pause now in force (the counters store their expiry in ms). */
async function letPausesRunOut() {
  const { sequelize } = getModels();
  await sequelize.query(
    "UPDATE sign_in_throttle SET expire = expire - 3600000 WHERE expire IS NOT NULL AND `key` NOT LIKE '%-pauses:%'",
  );
}

beforeAll(async () => {
  passwordHash = await hashPassword(PASSWORD);
  shopId = (await getModels().Shop.create({ name: uniqueName("Throttle shop") })).id;
});

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

describe("sign-in throttling under parallel requests", () => {
  it("checks at most the allowed number of 20 parallel wrong passwords; the rest get 429 with Retry-After", async () => {
    const email = await newAccount();
    const address = newAddress();
    const outcomes = await Promise.all(
      Array.from({ length: 20 }, (_, i) => attempt(email, `wrong-${i}`, address)),
    );
    console.log(
      `20 parallel wrong passwords: ${count(outcomes, "wrong")} checked, ${count(outcomes, "slowed")} answered 429`,
    );
    expect(count(outcomes, "wrong")).toBe(FREE);
    expect(count(outcomes, "slowed")).toBe(20 - FREE);
    expect(await checkedPasswords(email)).toBe(FREE);
  });

  it("counts an e-mail nobody has exactly like a real account, so the answers reveal nothing", async () => {
    const email = `${uniqueName("nobody")}@throttle.test`;
    const address = newAddress();
    const outcomes = await Promise.all(Array.from({ length: 12 }, () => attempt(email, "guess", address)));
    expect(count(outcomes, "wrong")).toBe(FREE);
    expect(count(outcomes, "slowed")).toBe(12 - FREE);
  });

  it("refuses a correct password sent among parallel wrong ones once the limit is reached", async () => {
    const email = await newAccount();
    const address = newAddress();
    const first = await Promise.all(Array.from({ length: FREE }, () => attempt(email, "wrong", address)));
    expect(count(first, "wrong")).toBe(FREE);

    const batch = await Promise.all([
      ...Array.from({ length: 9 }, () => attempt(email, "wrong", address)),
      attempt(email, PASSWORD, address),
      ...Array.from({ length: 10 }, () => attempt(email, "wrong", address)),
    ]);
    expect(count(batch, "in")).toBe(0);
    expect(count(batch, "slowed")).toBe(20);
    expect(await checkedPasswords(email)).toBe(FREE);
  });

  it("slows one client trying forty accounts once each", async () => {
    const address = newAddress();
    const emails = Array.from({ length: 40 }, () => `${uniqueName("sprayed")}@throttle.test`);
    const outcomes = await Promise.all(emails.map((email) => attempt(email, "Summer2026!", address)));
    console.log(
      `40 accounts once each from one client: ${count(outcomes, "wrong")} checked, ${count(outcomes, "slowed")} answered 429`,
    );
    expect(count(outcomes, "wrong")).toBe(CLIENT_FREE_ATTEMPTS);
    expect(count(outcomes, "slowed")).toBe(40 - CLIENT_FREE_ATTEMPTS);
    // Another client is not held up by that one.
    expect((await attempt(`${uniqueName("other")}@throttle.test`, "x", newAddress())).kind).toBe("wrong");
  });

  it("lets the owner in from another address while a guesser is paused", async () => {
    const email = await newAccount();
    const guesser = newAddress();
    const outcomes = await Promise.all(Array.from({ length: 20 }, () => attempt(email, "wrong", guesser)));
    expect(count(outcomes, "slowed")).toBe(20 - FREE);

    expect((await attempt(email, PASSWORD, guesser)).kind).toBe("slowed");
    expect((await attempt(email, PASSWORD, newAddress())).kind).toBe("in");
  });

  it("keeps the owner's known address open when guesses come from many addresses", async () => {
    const email = await newAccount();
    const ownersAddress = newAddress();
    expect((await attempt(email, PASSWORD, ownersAddress)).kind).toBe("in");

    // More wrong guesses than the account allows in an hour, two from each of many addresses.
    const guessers = Array.from({ length: ACCOUNT_FREE_ATTEMPTS / 2 + 5 }, newAddress);
    const outcomes = await Promise.all(
      guessers.flatMap((address) => [attempt(email, "wrong-a", address), attempt(email, "wrong-b", address)]),
    );
    expect(count(outcomes, "wrong")).toBe(ACCOUNT_FREE_ATTEMPTS);

    // A new address, even with the right password, waits; the owner's own address gets straight in.
    const stranger = await attempt(email, PASSWORD, newAddress());
    expect(stranger.kind).toBe("slowed");
    expect((await attempt(email, PASSWORD, ownersAddress)).kind).toBe("in");
  });

  it("pauses longer each time: after a pause one try, then the next pause", async () => {
    const email = await newAccount();
    const address = newAddress();
    for (let i = 0; i < FREE; i += 1) expect((await attempt(email, "wrong", address)).kind).toBe("wrong");
    expect(await attempt(email, "wrong", address)).toEqual({
      kind: "slowed",
      retryAfterS: PAUSE_SCHEDULE_S[0],
    });

    await letPausesRunOut();
    expect((await attempt(email, "wrong", address)).kind).toBe("wrong");
    expect(await attempt(email, "wrong", address)).toEqual({
      kind: "slowed",
      retryAfterS: PAUSE_SCHEDULE_S[1],
    });

    await letPausesRunOut();
    const afterSecondPause = await Promise.all(
      Array.from({ length: 6 }, () => attempt(email, "wrong", address)),
    );
    expect(count(afterSecondPause, "wrong")).toBe(1);
    expect(afterSecondPause.filter((o) => o.kind === "slowed").map((o) => o.retryAfterS)).toContain(
      PAUSE_SCHEDULE_S[2],
    );

    // The right password after a pause lets the owner in and forgives the mistakes made from here.
    await letPausesRunOut();
    expect((await attempt(email, PASSWORD, address)).kind).toBe("in");
    for (let i = 0; i < FREE; i += 1) expect((await attempt(email, "wrong", address)).kind).toBe("wrong");
    expect(await attempt(email, "wrong", address)).toEqual({
      kind: "slowed",
      retryAfterS: PAUSE_SCHEDULE_S[0],
    });
  });

  it("without a trusted proxy still limits each account, and the owner gets in once the pause is over", async () => {
    const email = await newAccount();
    const outcomes = await Promise.all(Array.from({ length: 10 }, () => attempt(email, "wrong", null)));
    expect(count(outcomes, "wrong")).toBe(FREE);
    expect((await attempt(email, PASSWORD, null)).kind).toBe("slowed");
    await letPausesRunOut();
    expect((await attempt(email, PASSWORD, null)).kind).toBe("in");
  });
});
