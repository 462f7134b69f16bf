import { afterAll, describe, expect, it } from "vitest";
import { GET as searchRoute } from "@/app/api/casebook/route";
import { GET as facetsRoute } from "@/app/api/casebook/facets/route";
import { GET as similarRoute } from "@/app/api/cases/[id]/similar/route";
import { DELETE as signOutRoute } from "@/app/api/session/route";
import { GET as meRoute } from "@/app/api/me/route";
import { refreshCasebookEntry } from "@/lib/db/casebook-refresh";
import { casebookVersion } from "@/lib/db/casebook-version";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { updateUser } from "@/lib/server/users";
import { getModels } from "@/models";
import { callRoute, signedInUser } from "./api-client";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

type Page = { rows: { caseId: number; complaint: string }[]; total: number };

describe("remembered casebook answers", () => {
  it("serves a repeated search from memory, per shop, and never past a change to the shop's cases", async () => {
    const models = getModels();
    // An invented word, so only these two shops' cases can match it.
    const word = uniqueName("brindlewort")
      .replace(/[^a-z]/gi, "")
      .toLowerCase();
    const mine = await createShopWithCase(models, `Warm at idle, ${word} smell from the vents`);
    const theirs = await createShopWithCase(models, `Warm at idle, ${word} smell from the vents`);
    await refreshCasebookEntry({ shopId: mine.shop.id, caseId: mine.serviceCase.id });
    await refreshCasebookEntry({ shopId: theirs.shop.id, caseId: theirs.serviceCase.id });
    const me = await signedInUser(models, mine.shop.id, "technician");
    const them = await signedInUser(models, theirs.shop.id, "technician");
    const path = `/api/casebook?q=${word}`;

    const first = await callRoute(searchRoute, path, { sessionId: me.sessionId });
    expect(first.status).toBe(200);
    expect(first.headers.get("x-casebook-cache")).toBe("miss");
    expect((first.json as Page).rows.map((r) => r.caseId)).toEqual([mine.serviceCase.id]);
    const again = await callRoute(searchRoute, path, { sessionId: me.sessionId });
    expect(again.headers.get("x-casebook-cache")).toBe("hit");
    expect(again.json).toEqual(first.json);

    // The same question from another shop is its own question: its own case, never the first shop's.
    const other = await callRoute(searchRoute, path, { sessionId: them.sessionId });
    expect(other.headers.get("x-casebook-cache")).toBe("miss");
    expect((other.json as Page).rows.map((r) => r.caseId)).toEqual([theirs.serviceCase.id]);

    // A change to one of the shop's cases raises its version: the next search is answered afresh.
    const before = Number(await casebookVersion(models.sequelize, mine.shop.id));
    await mine.serviceCase.update({ complaint: "Warm at idle, no smell at all" });
    await refreshCasebookEntry({ shopId: mine.shop.id, caseId: mine.serviceCase.id });
    expect(await casebookVersion(models.sequelize, mine.shop.id)).toBe(String(before + 1));
    const after = await callRoute(searchRoute, path, { sessionId: me.sessionId });
    expect(after.headers.get("x-casebook-cache")).toBe("miss");
    expect((after.json as Page).rows).toEqual([]);
    // The other shop's remembered answer was not touched by this shop's change.
    const otherAgain = await callRoute(searchRoute, path, { sessionId: them.sessionId });
    expect(otherAgain.headers.get("x-casebook-cache")).toBe("hit");
    expect((otherAgain.json as Page).rows.map((r) => r.caseId)).toEqual([theirs.serviceCase.id]);
  });

  it("remembers facet counts until the shop's next change", async () => {
    const models = getModels();
    const mine = await createShopWithCase(models, "Cold on the left, warm on the right");
    await refreshCasebookEntry({ shopId: mine.shop.id, caseId: mine.serviceCase.id });
    const me = await signedInUser(models, mine.shop.id, "technician");
    const first = await callRoute(facetsRoute, "/api/casebook/facets", { sessionId: me.sessionId });
    expect(first.status).toBe(200);
    expect((first.json as { total: number }).total).toBe(1);
    expect(
      (await callRoute(facetsRoute, "/api/casebook/facets", { sessionId: me.sessionId })).headers.get(
        "x-casebook-cache",
      ),
    ).toBe("hit");
    const second = await models.Case.create({
      shopId: mine.shop.id,
      customerId: mine.customer.id,
      vehicleId: mine.vehicle.id,
      technicianId: mine.technician.id,
      complaint: "Blows warm after twenty minutes",
    });
    await refreshCasebookEntry({ shopId: mine.shop.id, caseId: second.id });
    const after = await callRoute(facetsRoute, "/api/casebook/facets", { sessionId: me.sessionId });
    expect(after.headers.get("x-casebook-cache")).toBe("miss");
    expect((after.json as { total: number }).total).toBe(2);
  });
});

describe("remembered similar cases", () => {
  it("asks again once the case itself changed, as an autosave of a draft's readings does", async () => {
    const models = getModels();
    const mine = await createShopWithCase(models);
    await refreshCasebookEntry({ shopId: mine.shop.id, caseId: mine.serviceCase.id });
    const me = await signedInUser(models, mine.shop.id, "technician");
    const path = `/api/cases/${mine.serviceCase.id}/similar`;
    const ask = () =>
      callRoute(similarRoute, path, { sessionId: me.sessionId, params: { id: String(mine.serviceCase.id) } });
    expect((await ask()).headers.get("x-casebook-cache")).toBe("miss");
    expect((await ask()).headers.get("x-casebook-cache")).toBe("hit");
    // An autosave raises the case's row version without a casebook refresh.
    await models.Case.update(
      { version: mine.serviceCase.version + 1 },
      { where: { id: mine.serviceCase.id } },
    );
    expect((await ask()).headers.get("x-casebook-cache")).toBe("miss");
    // Another shop asking for this case id gets a 404, never the remembered panel.
    const stranger = await createShopWithCase(models);
    const them = await signedInUser(models, stranger.shop.id, "technician");
    const theirs = await callRoute(similarRoute, path, {
      sessionId: them.sessionId,
      params: { id: String(mine.serviceCase.id) },
    });
    expect(theirs.status).toBe(404);
  });
});

describe("remembered sessions", () => {
  it("refuses a session at once after signing out, though it was just remembered", async () => {
    const models = getModels();
    const { shop } = await createShopWithCase(models);
    const me = await signedInUser(models, shop.id, "technician");
    expect((await callRoute(meRoute, "/api/me", { sessionId: me.sessionId })).status).toBe(200);
    expect((await callRoute(meRoute, "/api/me", { sessionId: me.sessionId })).status).toBe(200);
    expect(
      (await callRoute(signOutRoute, "/api/session", { method: "DELETE", sessionId: me.sessionId })).status,
    ).toBe(200);
    expect((await callRoute(meRoute, "/api/me", { sessionId: me.sessionId })).status).toBe(401);
  });

  it("refuses a deactivated person's session and reads a changed role at once", async () => {
    const models = getModels();
    const { shop } = await createShopWithCase(models);
    const owner = await signedInUser(models, shop.id, "owner");
    const me = await signedInUser(models, shop.id, "technician");
    const role = async () =>
      (
        (await callRoute(meRoute, "/api/me", { sessionId: me.sessionId })).json as {
          user?: { role?: string };
        } | null
      )?.user?.role;
    expect(await role()).toBe("technician");
    await updateUser({ shopId: shop.id, userId: me.user.id, actorId: owner.user.id, role: "senior" });
    expect(await role()).toBe("senior");
    await updateUser({ shopId: shop.id, userId: me.user.id, actorId: owner.user.id, active: false });
    expect((await callRoute(meRoute, "/api/me", { sessionId: me.sessionId })).status).toBe(401);
  });
});
