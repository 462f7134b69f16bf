import { afterAll, describe, expect, it } from "vitest";
import { closeMysqlPool, getMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

// Four-byte characters (emoji) are what utf8mb3 would lose; the rest is common accented text.
const samples = ["Ø 24 °C — 😀", "Ærøskøbing Kühlung ❄️ 🚗💨", "Ñandú · ½ oz · 3 °F", "冷却 ✓ 𝄞"];

describe("utf8mb4 round trip", () => {
  it("keeps every character through Sequelize, in text, JSON and short columns", async () => {
    const models = getModels();
    const { shop, technician } = await createShopWithCase(models);
    for (const text of samples) {
      const saved = await models.Case.create({
        shopId: shop.id,
        technicianId: technician.id,
        complaint: text,
        answers: { note: text },
        symptomTags: [text],
      });
      const customer = await models.Customer.create({ shopId: shop.id, name: text });
      const again = await models.Case.findByPk(saved.id);
      expect(again?.complaint).toBe(text);
      expect(again?.answers).toEqual({ note: text });
      expect(again?.symptomTags).toEqual([text]);
      expect((await models.Customer.findByPk(customer.id))?.name).toBe(text);
    }
  });

  it("reads the same characters through the mysql2 pool Lucia uses", async () => {
    const models = getModels();
    const { shop } = await createShopWithCase(models);
    const text = samples[0] ?? "";
    await shop.update({ name: text });
    const [rows] = await getMysqlPool().query("SELECT name FROM shop WHERE id = ?", [shop.id]);
    expect(rows).toEqual([{ name: text }]);
  });

  it("runs connections in utf8mb4", async () => {
    const [rows] = await getModels().sequelize.query(
      "SELECT @@character_set_connection AS connection, @@character_set_results AS results, @@character_set_database AS db",
    );
    expect(rows).toEqual([{ connection: "utf8mb4", results: "utf8mb4", db: "utf8mb4" }]);
  });
});
