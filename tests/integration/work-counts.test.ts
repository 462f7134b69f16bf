import { afterAll, describe, expect, it } from "vitest";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { signOffQueue, workCounts } from "@/lib/server/work-counts";
import { getModels } from "@/models";
import { newUserId } from "@/scripts/demo/seed-demo";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

async function person(shopId: number, role: "senior" | "apprentice") {
  return getModels().User.create({
    id: newUserId(),
    shopId,
    email: `${uniqueName(role)}@fixture.test`,
    name: `Fixture ${role}`,
    passwordHash: "not-a-real-hash",
    role,
  });
}

describe("the home screen's counts and the sign-off queue", () => {
  it("counts each person's drafts, sent-back cases and waiting sign-offs, scoped to the shop", async () => {
    const models = getModels();
    const { shop, technician } = await createShopWithCase(models);
    const apprentice = await person(shop.id, "apprentice");
    const senior = await person(shop.id, "senior");
    const add = (technicianId: string, status: string, submittedAt: Date | null = null) =>
      models.Case.create({
        shopId: shop.id,
        technicianId,
        complaint: `${status} case`,
        status: status as never,
        submittedAt,
      });
    const hourAgo = new Date(Date.now() - 3_600_000);
    const dayAgo = new Date(Date.now() - 86_400_000);
    await add(apprentice.id, "draft");
    await add(apprentice.id, "sent_back");
    const newer = await add(apprentice.id, "awaiting_signoff", hourAgo);
    const older = await add(apprentice.id, "awaiting_signoff", dayAgo);
    await add(senior.id, "awaiting_signoff", hourAgo);
    // One the senior helped write: not theirs to sign off either.
    const helped = await add(apprentice.id, "awaiting_signoff", hourAgo);
    await helped.update({ conclusionWriterIds: [apprentice.id, senior.id] });
    await add(technician.id, "closed");
    // Another shop's waiting case never shows here.
    const other = await createShopWithCase(models);
    await other.serviceCase.update({ status: "awaiting_signoff", submittedAt: dayAgo });

    expect(await workCounts({ user: { ...technician.get({ plain: true }), role: "technician" } })).toEqual({
      myDrafts: 1, // the fixture's own draft
      sentBackToMe: 0,
      waitingForMySignOff: null,
      shopOpen: 7,
    });
    expect(await workCounts({ user: { ...apprentice.get({ plain: true }), role: "apprentice" } })).toEqual({
      myDrafts: 1,
      sentBackToMe: 1,
      waitingForMySignOff: null,
      shopOpen: 7,
    });
    // The senior's own submitted case is not theirs to sign off.
    expect(await workCounts({ user: { ...senior.get({ plain: true }), role: "senior" } })).toEqual({
      myDrafts: 0,
      sentBackToMe: 0,
      waitingForMySignOff: 2,
      shopOpen: 7,
    });

    const queue = await signOffQueue({ shopId: shop.id });
    expect(queue.total).toBe(4);
    expect(queue.items.map((c) => c.id).slice(0, 2)).toEqual([older.id, newer.id]);
    expect(queue.items[0]!.submittedAt).toBe(dayAgo.toISOString());
    expect(queue.items[0]!.technician).toBe("Fixture apprentice");
  });
});
