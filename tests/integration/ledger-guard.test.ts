import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { POST as postMovement } from "@/app/api/ledger/movements/route";
import { POST as postReversal } from "@/app/api/ledger/movements/[id]/reversal/route";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { listCylinders, listMovements } from "@/lib/server/ledger";
import { saveServiceRecord } from "@/lib/server/service-records";
import type { MovementResponse, ReversalResponse } from "@/lib/contracts/ledger";
import { newUserId } from "@/scripts/demo/seed-demo";
import { addCase, createShopWithCylinders, recordInput } from "./service-fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";

function request(path: string, sessionId: string, body: unknown) {
  return new NextRequest(`${ORIGIN}${path}`, {
    method: "POST",
    headers: {
      origin: ORIGIN,
      host: "127.0.0.1:3000",
      "content-type": "application/json",
      cookie: `cw_session=${sessionId}`,
    },
    body: JSON.stringify(body),
  });
}

const post = (sessionId: string, body: unknown) =>
  postMovement(request("/api/ledger/movements", sessionId, body), { params: Promise.resolve({}) });

const reverse = (sessionId: string, id: number, reason: string) =>
  postReversal(request(`/api/ledger/movements/${id}/reversal`, sessionId, { reason }), {
    params: Promise.resolve({ id: String(id) }),
  });

async function netOf(shopId: number, cylinderId: number) {
  const [c] = await listCylinders({ shopId, ids: [cylinderId] });
  return c!.netG;
}

/** A shop whose recovery cylinder holds 4,660 g, and a signed-in session for its technician. */
async function shopWith4660g() {
  const fixture = await createShopWithCylinders(getModels());
  await fixture.recovery.update({ initialNetG: 4_660 });
  const session = await getLucia().createSession(fixture.technician.id, {});
  return { ...fixture, sessionId: session.id };
}

describe("the ledger cannot go wrong", () => {
  it("refuses 5 kg and 99 kg sent out of a cylinder holding 4,660 g, with the numbers, and posts nothing", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    for (const massG of [5_000, 99_000]) {
      const response = await post(sessionId, {
        cylinderId: recovery.id,
        type: "sent_out",
        massG,
        destination: "Regional reclaimer",
      });
      expect(response.status).toBe(409);
      const { error } = await response.json();
      expect(error.message).toContain("below empty");
      expect(error.message).toContain("It holds 4,660 g and this takes out");
      expect(error.fieldErrors.massG[0]).toBe(error.message);
    }
    expect(await netOf(shop.id, recovery.id)).toBe(4_660);
    expect(await listMovements({ shopId: shop.id })).toHaveLength(0);
  });

  it("says the refusal in pounds to an imperial shop", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    await shop.update({ units: "imperial" });
    const response = await post(sessionId, {
      cylinderId: recovery.id,
      type: "sent_out",
      massG: 5_000,
      destination: "Regional reclaimer",
    });
    // 4,660 g = 10.27 lb and 5,000 g = 11.02 lb (NIST SP 811: 1 lb = 453.59237 g).
    expect((await response.json()).error.message).toContain("It holds 10.27 lb and this takes out 11.02 lb");
  });

  it("answers 400 with a plain message for a mass past any cylinder", async () => {
    const { recovery, sessionId } = await shopWith4660g();
    const response = await post(sessionId, {
      cylinderId: recovery.id,
      type: "sent_out",
      massG: 999_000,
      destination: "Regional reclaimer",
    });
    expect(response.status).toBe(400);
    const { error } = await response.json();
    expect(error.fieldErrors.massG[0]).toBe(
      "That is more than any cylinder holds: check the figure and its unit.",
    );
  });

  it("twenty parallel posts never take the cylinder below empty: exactly the ones that fit are posted", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    const started = performance.now();
    const responses = await Promise.all(
      Array.from({ length: 20 }, () =>
        post(sessionId, { cylinderId: recovery.id, type: "sent_out", massG: 500, destination: "Reclaimer" }),
      ),
    );
    const elapsedMs = performance.now() - started;
    const statuses = responses.map((r) => r.status);
    // 9 × 500 g = 4,500 g fit in 4,660 g; the tenth would leave −340 g.
    expect(statuses.filter((s) => s === 201)).toHaveLength(9);
    expect(statuses.filter((s) => s === 409)).toHaveLength(11);
    expect(await netOf(shop.id, recovery.id)).toBe(160);
    expect(await getModels().RefrigerantMovement.count({ where: { shopId: shop.id } })).toBe(9);
    console.log(
      `ledger: 20 parallel posts of 500 g against 4,660 g — 9 accepted, 11 refused, ${elapsedMs.toFixed(0)} ms in all`,
    );
  });

  it("twenty parallel posts of different masses: whatever was refused would not have fitted", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    const masses = [
      900, 250, 1_300, 75, 640, 2_000, 410, 180, 990, 333, 1_200, 55, 720, 88, 1_500, 260, 45, 610, 1_100,
      150,
    ];
    const responses = await Promise.all(
      masses.map((massG) =>
        post(sessionId, { cylinderId: recovery.id, type: "sent_out", massG, destination: "Reclaimer" }),
      ),
    );
    const statuses = responses.map((r) => r.status);
    expect(statuses.every((s) => s === 201 || s === 409)).toBe(true);
    const netG = await netOf(shop.id, recovery.id);
    const acceptedG = masses.filter((_, i) => statuses[i] === 201).reduce((a, b) => a + b, 0);
    expect(netG).toBeGreaterThanOrEqual(0);
    expect(netG).toBe(4_660 - acceptedG);
    // The cylinder only emptied as posts went in, so each refused mass was more than the final contents.
    for (const [i, massG] of masses.entries()) if (statuses[i] === 409) expect(massG).toBeGreaterThan(netG);
    expect(statuses.filter((s) => s === 409).length).toBeGreaterThan(0);
  });

  it("refuses a recovery past the 80 % safe fill (common practice) and accepts it up to the limit", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    // 22,000 g capacity: 17,600 g safe fill; 4,660 g held leaves 12,940 g of room.
    const over = await post(sessionId, {
      cylinderId: recovery.id,
      type: "adjustment",
      massG: 12_941,
      note: "Weighed on the bench scale",
    });
    expect(over.status).toBe(409);
    expect((await over.json()).error.message).toContain("safe fill of 17,600 g (80 % of 22,000 g)");
    const fits = await post(sessionId, {
      cylinderId: recovery.id,
      type: "adjustment",
      massG: 12_940,
      note: "Weighed on the bench scale",
    });
    expect(fits.status).toBe(201);
    expect(await netOf(shop.id, recovery.id)).toBe(17_600);
  });

  it("cancels a wrong line with a reason; the line stays, and a second cancellation is refused", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    const posted = (await (
      await post(sessionId, {
        cylinderId: recovery.id,
        type: "sent_out",
        massG: 4_000,
        destination: "Reclaimer",
      })
    ).json()) as MovementResponse;
    expect(await netOf(shop.id, recovery.id)).toBe(660);

    const [first, second] = await Promise.all([
      reverse(sessionId, posted.movement.id, "Typed 4 kg; it was 400 g"),
      reverse(sessionId, posted.movement.id, "Typed 4 kg; it was 400 g"),
    ]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    const done = (await (first.status === 201 ? first : second).json()) as ReversalResponse;
    expect(done.correction).toMatchObject({
      reversesId: posted.movement.id,
      type: "sent_out",
      massG: 4_000,
      note: "Typed 4 kg; it was 400 g",
    });
    expect(done.original.reversedById).toBe(done.correction.id);
    expect(await netOf(shop.id, recovery.id)).toBe(4_660);
    expect(await listMovements({ shopId: shop.id })).toHaveLength(2);
    const audit = await getModels().AuditEvent.findOne({
      where: { shopId: shop.id, entity: "refrigerant_movement", entityId: String(posted.movement.id) },
      raw: true,
    });
    expect(audit).toMatchObject({ action: "reversed" });
    expect(audit?.detail).toMatchObject({ reason: "Typed 4 kg; it was 400 g" });

    const cancelCorrection = await reverse(sessionId, done.correction.id, "Changed my mind");
    expect(cancelCorrection.status).toBe(409);
    const noReason = await reverse(sessionId, posted.movement.id, " ");
    expect(noReason.status).toBe(400);
  });

  it("refuses cancelling a recovery whose refrigerant has since gone out of the cylinder", async () => {
    const { shop, recovery, sessionId } = await shopWith4660g();
    const added = (await (
      await post(sessionId, { cylinderId: recovery.id, type: "adjustment", massG: 3_000, note: "Weighed" })
    ).json()) as MovementResponse;
    await post(sessionId, {
      cylinderId: recovery.id,
      type: "sent_out",
      massG: 7_000,
      destination: "Reclaimer",
    });
    const response = await reverse(sessionId, added.movement.id, "Scale was not zeroed");
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/would go below empty/);
    expect(await netOf(shop.id, recovery.id)).toBe(660);
  });

  it("sends a service record's line back to its record, and keeps a technician off another's lines", async () => {
    const models = getModels();
    const fixture = await shopWith4660g();
    const saved = await saveServiceRecord({
      user: fixture.user,
      caseId: fixture.serviceCase.id,
      input: recordInput({ recoveredChargeG: 700, recoveryCylinderId: fixture.recovery.id }),
    });
    expect(saved.posted).toBe(1);
    const [line] = await listMovements({ shopId: fixture.shop.id });
    const fromRecord = await reverse(fixture.sessionId, line!.id, "Wrong cylinder");
    expect(fromRecord.status).toBe(409);
    expect((await fromRecord.json()).error.message).toMatch(/service record of case/);

    const other = await models.User.create({
      id: newUserId(),
      shopId: fixture.shop.id,
      email: `other-${fixture.shop.id}-${Date.now()}@fixture.test`,
      name: "Other Technician",
      passwordHash: "not-a-real-hash",
      role: "technician",
    });
    const otherSession = await getLucia().createSession(other.id, {});
    const mine = (await (
      await post(fixture.sessionId, { cylinderId: fixture.recovery.id, type: "recycled", massG: 500 })
    ).json()) as MovementResponse;
    expect((await reverse(otherSession.id, mine.movement.id, "Not mine to keep")).status).toBe(403);
  });

  it("puts service-record saves through the same guard, also in parallel", async () => {
    const models = getModels();
    const { shop, serviceCase, vehicle, customer, technician, supply, user } =
      await createShopWithCylinders(models);
    await supply.update({ initialNetG: 1_000 });
    const second = await addCase(models, shop.id, vehicle.id, customer.id, technician.id);
    // Two recharges of 650 g from a cylinder holding 1,000 g: only one fits.
    const results = await Promise.allSettled(
      [serviceCase.id, second.id].map((caseId) =>
        saveServiceRecord({
          user,
          caseId,
          input: recordInput({ chargedG: 650, chargeCylinderId: supply.id }),
        }),
      ),
    );
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const refused = results.find((r) => r.status === "rejected") as PromiseRejectedResult;
    expect(refused.reason).toMatchObject({ status: 409 });
    expect(refused.reason.fieldErrors.chargedG[0]).toContain("It holds 350 g and this takes out 650 g");
    expect(await netOf(shop.id, supply.id)).toBe(350);
    // The refused save left no record behind: the whole transaction rolled back.
    expect(await models.ServiceRecord.count({ where: { shopId: shop.id } })).toBe(1);
  });
});
