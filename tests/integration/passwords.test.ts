import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { PUT as changePassword } from "@/app/api/me/password/route";
import { POST as resetPasswordRoute } from "@/app/api/users/[id]/password-reset/route";
import { getLucia } from "@/lib/auth/lucia";
import { hashPassword } from "@/lib/auth/password";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { signInWithPassword } from "@/lib/server/sign-in";
import type { PasswordChangedResponse, PasswordResetResponse } from "@/lib/contracts/passwords";
import { getModels } from "@/models";
import { newUserId } from "@/scripts/demo/seed-demo";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";
const FIRST_PASSWORD = "copper-valve-lantern";

function request(path: string, method: string, sessionId: string, body?: unknown) {
  return new NextRequest(`${ORIGIN}${path}`, {
    method,
    headers: {
      origin: ORIGIN,
      host: "127.0.0.1:3000",
      "content-type": "application/json",
      cookie: `cw_session=${sessionId}`,
    },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
}

const change = (sessionId: string, body: unknown) =>
  changePassword(request("/api/me/password", "PUT", sessionId, body), { params: Promise.resolve({}) });
const reset = (sessionId: string, userId: string) =>
  resetPasswordRoute(request(`/api/users/${userId}/password-reset`, "POST", sessionId), {
    params: Promise.resolve({ id: userId }),
  });

/** A shop with an owner and a technician who has a real password and two signed-in devices. */
async function shopWithPeople() {
  const models = getModels();
  const { shop, technician } = await createShopWithCase(models);
  await technician.update({ passwordHash: await hashPassword(FIRST_PASSWORD) });
  const owner = await models.User.create({
    id: newUserId(),
    shopId: shop.id,
    email: `${uniqueName("owner")}@fixture.test`,
    name: "Fixture Owner",
    passwordHash: await hashPassword("owner-password-long"),
    role: "owner",
  });
  const lucia = getLucia();
  const phone = await lucia.createSession(technician.id, {});
  const bench = await lucia.createSession(technician.id, {});
  const ownerSession = await lucia.createSession(owner.id, {});
  return { shop, technician, owner, phone: phone.id, bench: bench.id, ownerSession: ownerSession.id };
}

async function sessionsOf(userId: string) {
  return (await getModels().Session.findAll({ where: { userId }, raw: true })).map((s) => s.id);
}

const signIn = (email: string, password: string) =>
  signInWithPassword({ email, password, clientAddress: null });

describe("a person changes their own password", () => {
  it("with the current one: the other devices are signed out, this one stays, and an audit row says so", async () => {
    const { shop, technician, phone, bench } = await shopWithPeople();
    const response = await change(phone, {
      currentPassword: FIRST_PASSWORD,
      newPassword: "granite-hose-clamp-9",
    });
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toBe("no-store");
    expect((await response.json()) as PasswordChangedResponse).toEqual({ otherSessionsEnded: 1 });
    expect(await sessionsOf(technician.id)).toEqual([phone]);
    expect(await sessionsOf(technician.id)).not.toContain(bench);
    await expect(signIn(technician.email, FIRST_PASSWORD)).rejects.toMatchObject({ status: 401 });
    await expect(signIn(technician.email, "granite-hose-clamp-9")).resolves.toEqual({
      userId: technician.id,
    });
    const audit = await getModels().AuditEvent.findOne({
      where: { shopId: shop.id, entityId: technician.id, action: "password_changed" },
      raw: true,
    });
    expect(audit?.detail).toEqual({ otherSessionsEnded: 1 });
  });

  it("refuses a wrong current password, a short one and one built from the e-mail, with field messages", async () => {
    const { technician, phone } = await shopWithPeople();
    const wrong = await change(phone, {
      currentPassword: "not-my-password",
      newPassword: "granite-hose-clamp-9",
    });
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.fieldErrors.currentPassword).toEqual([
      "That is not your current password.",
    ]);
    const short = await change(phone, { currentPassword: FIRST_PASSWORD, newPassword: "short" });
    expect((await short.json()).error.fieldErrors.newPassword).toEqual(["Use at least 12 characters."]);
    const local = technician.email.split("@")[0]!;
    const fromEmail = await change(phone, { currentPassword: FIRST_PASSWORD, newPassword: `${local}-2026` });
    expect(fromEmail.status).toBe(400);
    expect((await fromEmail.json()).error.fieldErrors.newPassword[0]).toMatch(/e-mail address/);
    await expect(signIn(technician.email, FIRST_PASSWORD)).resolves.toEqual({ userId: technician.id });
  });

  it("pauses after five wrong current passwords, even sent in parallel, and then refuses the right one too", async () => {
    const { technician, phone } = await shopWithPeople();
    const statuses = (
      await Promise.all(
        Array.from({ length: 8 }, (_, i) =>
          change(phone, { currentPassword: `wrong-guess-${i}`, newPassword: "granite-hose-clamp-9" }),
        ),
      )
    ).map((r) => r.status);
    expect(statuses.filter((s) => s === 400)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(3);
    const right = await change(phone, {
      currentPassword: FIRST_PASSWORD,
      newPassword: "granite-hose-clamp-9",
    });
    expect(right.status).toBe(429);
    expect(Number(right.headers.get("retry-after"))).toBeGreaterThan(0);
    await expect(signIn(technician.email, FIRST_PASSWORD)).resolves.toEqual({ userId: technician.id });
  });
});

describe("the owner resets a person's password", () => {
  it("shows a temporary password once, signs the person out everywhere, and makes them choose their own", async () => {
    const models = getModels();
    const { shop, technician, ownerSession } = await shopWithPeople();
    const response = await reset(ownerSession, technician.id);
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toBe("no-store");
    const body = (await response.json()) as PasswordResetResponse;
    expect(body.temporaryPassword).toMatch(/^[a-z2-9]{4}(-[a-z2-9]{4}){3}$/);
    expect(body.sessionsEnded).toBe(2);
    expect(await sessionsOf(technician.id)).toEqual([]);
    const stored = await models.User.findByPk(technician.id, { raw: true });
    expect(stored?.passwordMustChange).toBeTruthy();

    const audit = await models.AuditEvent.findOne({
      where: { shopId: shop.id, entityId: technician.id, action: "password_reset" },
      raw: true,
    });
    expect(audit?.detail).toMatchObject({ sessionsEnded: 2 });
    expect(JSON.stringify(audit)).not.toContain(body.temporaryPassword);

    await expect(signIn(technician.email, FIRST_PASSWORD)).rejects.toMatchObject({ status: 401 });
    const { userId } = await signIn(technician.email, body.temporaryPassword);
    const session = await getLucia().createSession(userId, {});
    const chosen = await change(session.id, {
      currentPassword: body.temporaryPassword,
      newPassword: "granite-hose-clamp-9",
    });
    expect(chosen.status).toBe(200);
    const after = await models.User.findByPk(technician.id, { raw: true });
    expect(after?.passwordMustChange).toBeFalsy();
    expect(after?.passwordExpiresAt).toBeNull();
  });

  it("a temporary password stops working once it expires", async () => {
    const models = getModels();
    const { technician, ownerSession } = await shopWithPeople();
    const body = (await (await reset(ownerSession, technician.id)).json()) as PasswordResetResponse;
    await models.User.update(
      { passwordExpiresAt: new Date(Date.now() - 60_000) },
      { where: { id: technician.id } },
    );
    await expect(signIn(technician.email, body.temporaryPassword)).rejects.toMatchObject({
      status: 401,
      message: "That temporary password has expired. Ask the shop owner for a new one.",
    });
  });

  it("is the owner's alone, for their own shop's people, and not for themselves", async () => {
    const { technician, owner, phone, ownerSession } = await shopWithPeople();
    const other = await shopWithPeople();
    expect((await reset(phone, owner.id)).status).toBe(403);
    expect((await reset(ownerSession, other.technician.id)).status).toBe(404);
    expect((await reset(ownerSession, owner.id)).status).toBe(409);
    expect(await sessionsOf(other.technician.id)).toHaveLength(2);
    await expect(signIn(technician.email, FIRST_PASSWORD)).resolves.toEqual({ userId: technician.id });
  });
});
