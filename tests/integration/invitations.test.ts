import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { newUserId } from "@/scripts/demo/seed-demo";
import { isAppError, type AppError } from "@/lib/errors";
import { acceptInvitation, inviteUser, viewInvitation, withdrawInvitation } from "@/lib/server/invitations";
import { signInWithPassword } from "@/lib/server/sign-in";
import { getModels } from "@/models";
import { readCaught, type CaughtMessage } from "@/scripts/fakes/mail-catcher";
import { uniqueName } from "./helpers";

// The mail reaches the integration run's SMTP catcher and is read here as the invited person would.
function mailsTo(address: string): CaughtMessage[] {
  return readCaught(inject("mailDir")).filter((m) => m.to.includes(address));
}

function linkTokenIn(mail: CaughtMessage): string {
  const token = /\/invitation\/([A-Za-z0-9_-]{43})\b/.exec(mail.text)?.[1];
  if (!token) throw new Error(`no invitation link in: ${mail.text}`);
  return token;
}

async function settle<T>(
  promise: Promise<T>,
): Promise<{ ok: true; value: T } | { ok: false; error: AppError }> {
  try {
    return { ok: true, value: await promise };
  } catch (error) {
    if (!isAppError(error)) throw error;
    return { ok: false, error };
  }
}

let shopId = 0;
let ownerId = "";
let otherShopId = 0;
const PASSWORD = "evaporator-frost-2026";

async function newPerson(inShop: number, role: "owner" | "technician" = "technician") {
  const email = `${uniqueName("person")}@invite.test`;
  const user = await getModels().User.create({
    id: newUserId(),
    shopId: inShop,
    email,
    name: "Existing Person",
    passwordHash: "not-a-real-hash",
    role,
  });
  return { id: user.id, email };
}

beforeAll(async () => {
  const { Shop } = getModels();
  shopId = (await Shop.create({ name: uniqueName("Inviting shop") })).id;
  otherShopId = (await Shop.create({ name: uniqueName("Other shop") })).id;
  ownerId = (await newPerson(shopId, "owner")).id;
});

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

describe("adding a person by invitation", () => {
  it("answers the owner the same way whether the address is new or already used at another shop", async () => {
    const fresh = `${uniqueName("fresh")}@invite.test`;
    const elsewhere = (await newPerson(otherShopId)).email;
    const answers = await Promise.all(
      [fresh, elsewhere].map((email) =>
        inviteUser({ shopId, actorId: ownerId, email, name: "New Hand", role: "technician" }),
      ),
    );
    const shape = (a: (typeof answers)[number], email: string) => ({
      ...a,
      message: a.message.replace(email, "<address>"),
      invitation: { ...a.invitation, id: 0, email: "<address>", expiresAt: "<date>" },
    });
    expect(shape(answers[0]!, fresh)).toEqual(shape(answers[1]!, elsewhere));
    expect(answers[1]!.message).toBe(`Invitation sent to ${elsewhere}.`);
    // Both addresses got a mail; only the holder of the second learns, from the link, that it has an account.
    expect(mailsTo(fresh)).toHaveLength(1);
    expect(mailsTo(elsewhere)).toHaveLength(1);
    const token = linkTokenIn(mailsTo(elsewhere)[0]!);
    expect((await viewInvitation({ token })).state).toBe("address_taken");
    const accepted = await settle(acceptInvitation({ token, name: "Taken", password: PASSWORD }));
    expect(accepted.ok ? 0 : accepted.error.status).toBe(409);
    expect(await getModels().User.count({ where: { email: elsewhere } })).toBe(1);
  });

  it("says so when the address is already one of this shop's people (the owner sees them anyway)", async () => {
    const member = await newPerson(shopId);
    await expect(
      inviteUser({
        shopId,
        actorId: ownerId,
        email: member.email.toUpperCase(),
        name: "Again",
        role: "senior",
      }),
    ).rejects.toMatchObject({ status: 409, code: "conflict:user" });
  });

  it("keeps one invitation when the same address is invited five times in parallel; only the newest link works", async () => {
    const email = `${uniqueName("parallel")}@invite.test`;
    const answers = await Promise.all(
      Array.from({ length: 5 }, () =>
        settle(inviteUser({ shopId, actorId: ownerId, email, name: "Parallel Person", role: "apprentice" })),
      ),
    );
    expect(answers.every((a) => a.ok)).toBe(true);
    expect(await getModels().UserInvitation.count({ where: { shopId, email } })).toBe(1);
    const tokens = mailsTo(email).map(linkTokenIn);
    expect(tokens).toHaveLength(5);
    const states = await Promise.all(tokens.map((token) => viewInvitation({ token })));
    expect(states.filter((s) => s.state === "open")).toHaveLength(1);
  });

  it("makes exactly one account when the link is used five times in parallel, and the password then signs in", async () => {
    const email = `${uniqueName("joiner")}@invite.test`;
    await inviteUser({ shopId, actorId: ownerId, email, name: "Joiner", role: "senior" });
    const token = linkTokenIn(mailsTo(email)[0]!);
    expect(await viewInvitation({ token })).toMatchObject({
      state: "open",
      email,
      name: "Joiner",
      role: "senior",
    });

    const results = await Promise.all(
      Array.from({ length: 5 }, (_, i) =>
        settle(acceptInvitation({ token, name: `Joiner ${i}`, password: PASSWORD })),
      ),
    );
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.filter((r) => !r.ok).map((r) => (r.ok ? 0 : r.error.status))).toEqual([
      404, 404, 404, 404,
    ]);
    const users = await getModels().User.findAll({ where: { email }, raw: true });
    expect(users).toHaveLength(1);
    expect(users[0]).toMatchObject({ shopId, role: "senior", active: 1 });

    expect((await viewInvitation({ token })).state).toBe("invalid");
    const signedIn = await signInWithPassword({ email, password: PASSWORD, clientAddress: null });
    expect(signedIn.userId).toBe(users[0]!.id);
  });

  it("stops a withdrawn or expired link, and a token that was never issued", async () => {
    const withdrawn = `${uniqueName("withdrawn")}@invite.test`;
    const { invitation } = await inviteUser({
      shopId,
      actorId: ownerId,
      email: withdrawn,
      name: "W",
      role: "technician",
    });
    const withdrawnToken = linkTokenIn(mailsTo(withdrawn)[0]!);
    await withdrawInvitation({ shopId, actorId: ownerId, id: invitation.id });
    expect((await viewInvitation({ token: withdrawnToken })).state).toBe("invalid");
    await expect(
      withdrawInvitation({ shopId: otherShopId, actorId: ownerId, id: invitation.id }),
    ).rejects.toMatchObject({ status: 404 });

    const late = `${uniqueName("late")}@invite.test`;
    await inviteUser({ shopId, actorId: ownerId, email: late, name: "L", role: "technician" });
    await getModels().UserInvitation.update(
      { expiresAt: new Date(Date.now() - 1000) },
      { where: { email: late } },
    );
    const lateToken = linkTokenIn(mailsTo(late)[0]!);
    await expect(acceptInvitation({ token: lateToken, name: "L", password: PASSWORD })).rejects.toMatchObject(
      {
        status: 404,
      },
    );

    const forged = "A".repeat(43);
    expect((await viewInvitation({ token: forged })).state).toBe("invalid");
  });
});
