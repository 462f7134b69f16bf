import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(() => closeSequelize());

const searchSql = `SELECT id, MATCH(complaint, conclusion_notes, confirmed_repair) AGAINST (:query IN %MODE%) AS score
  FROM service_case
 WHERE shop_id = :shopId AND MATCH(complaint, conclusion_notes, confirmed_repair) AGAINST (:query IN %MODE%)
 ORDER BY score DESC, id`;

async function search(
  shopId: number,
  query: string,
  mode: "NATURAL LANGUAGE MODE" | "BOOLEAN MODE" = "NATURAL LANGUAGE MODE",
) {
  const rows = await getModels().sequelize.query<{ id: number; score: number }>(
    searchSql.replaceAll("%MODE%", mode),
    {
      replacements: { shopId, query },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => r.id);
}

describe("casebook full-text search on service_case", () => {
  it("finds words in the complaint, the conclusion notes and the confirmed repair", async () => {
    const models = getModels();
    const {
      shop,
      technician,
      serviceCase: unrelated,
    } = await createShopWithCase(models, "Blower noise from the dash");
    const base = { shopId: shop.id, technicianId: technician.id };
    const whistle = await models.Case.create({
      ...base,
      complaint: "Quillwort whistle from the evaporator area at idle",
    });
    const notes = await models.Case.create({
      ...base,
      complaint: "Warm at idle",
      conclusionNotes: "Quillwort residue on the orifice tube screen",
    });
    const repair = await models.Case.create({
      ...base,
      complaint: "No cooling",
      confirmedRepair: "Replaced the accumulator; quillwort debris in the line",
    });

    expect(new Set(await search(shop.id, "quillwort"))).toEqual(new Set([whistle.id, notes.id, repair.id]));
    expect(await search(shop.id, "quillwort")).not.toContain(unrelated.id);
    expect(await search(shop.id, "+quillwort +accumulator", "BOOLEAN MODE")).toEqual([repair.id]);
    expect(new Set(await search(shop.id, "+quillwort -accumulator", "BOOLEAN MODE"))).toEqual(
      new Set([whistle.id, notes.id]),
    );
  });

  it("sees a case's new text as soon as it is saved", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models, "Intermittent cooling");
    expect(await search(shop.id, "marramgrass")).toEqual([]);
    await serviceCase.update({ conclusionNotes: "Marramgrass packed between condenser and radiator" });
    expect(await search(shop.id, "marramgrass")).toEqual([serviceCase.id]);
  });

  it("stays inside the shop it is asked about", async () => {
    const models = getModels();
    const a = await createShopWithCase(models, "Sandpiper rattle behind the glovebox");
    const b = await createShopWithCase(models, "Sandpiper rattle at the compressor");
    expect(await search(a.shop.id, "sandpiper")).toEqual([a.serviceCase.id]);
    expect(await search(b.shop.id, "sandpiper")).toEqual([b.serviceCase.id]);
  });

  it("finds the seeded demo cases by their complaint", async () => {
    const models = getModels();
    const shop = await models.Shop.findOne({ where: { name: "Harbourline Auto Climate" } });
    if (!shop) throw new Error("demo shop missing");
    const hits = await search(shop.id, "highway");
    const cases = await models.Case.findAll({ where: { id: hits } });
    expect(cases.length).toBeGreaterThanOrEqual(2);
    for (const c of cases)
      expect(`${c.complaint} ${c.conclusionNotes} ${c.confirmedRepair}`.toLowerCase()).toContain("highway");
  });
});
