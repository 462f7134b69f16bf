import { QueryTypes, type Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { createSequelize } from "@/lib/db/sequelize";
import { integrationDb, settingsFromUrl } from "./helpers";

// On the schema database (never the seeded one): rows written before the match key existed.
const MIGRATION = "20261203-2002-add-spec-entry-match-key";
let sequelize: Sequelize;

beforeAll(() => {
  sequelize = createSequelize(settingsFromUrl(integrationDb().schemaDatabaseUrl));
});
afterAll(() => sequelize.close());

describe(`migration ${MIGRATION}`, () => {
  it("fills the key of existing rows, keeps rows that already repeat each other, and enforces it", async () => {
    const migrator = createMigrator(sequelize);
    await migrator.up();
    await migrator.down({ to: MIGRATION });
    expect((await migrator.executed()).map((m) => m.name)).not.toContain(MIGRATION);

    await sequelize.query("INSERT INTO shop (name) VALUES ('Backfill shop')");
    const [newest] = await sequelize.query<{ id: number }>("SELECT MAX(id) AS id FROM shop", {
      type: QueryTypes.SELECT,
    });
    const shopId = newest!.id;
    const insert = (model: string, variant = "") =>
      sequelize.query(
        "INSERT INTO spec_entry (shop_id, year_from, year_to, make, model, variant, rear_ac, refrigerant, label_charge_g, oil_type) " +
          "VALUES (?, 2015, 2020, 'Ford', ?, ?, 0, 'R-1234yf', 680, 'PAG 46')",
        { replacements: [shopId, model, variant] },
      );
    // Before: the old index compared the columns as typed, so these two both got in.
    await insert("F-150");
    await insert("F150");
    await insert("Ranger", "2.3L");

    await migrator.up();
    const rows = await sequelize.query<{ id: number; model: string; match_key: string }>(
      "SELECT id, model, match_key FROM spec_entry WHERE shop_id = ? ORDER BY id",
      { replacements: [shopId], type: QueryTypes.SELECT },
    );
    expect(rows.map((r) => r.match_key)).toEqual([
      "ford|f150||2015|2020|front",
      `ford|f150||2015|2020|front#${rows[1]!.id}`,
      "ford|ranger|23l|2015|2020|front",
    ]);

    // Now the database refuses a third spelling outright, whoever writes it.
    await expect(
      sequelize.query(
        "INSERT INTO spec_entry (shop_id, year_from, year_to, make, model, variant, rear_ac, refrigerant, label_charge_g, oil_type, match_key) " +
          "VALUES (?, 2015, 2020, 'Ford', 'F 150', '', 0, 'R-1234yf', 680, 'PAG 46', 'ford|f150||2015|2020|front')",
        { replacements: [shopId] },
      ),
    ).rejects.toMatchObject({ name: "SequelizeUniqueConstraintError" });

    await sequelize.query("DELETE FROM spec_entry WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM shop WHERE id = ?", { replacements: [shopId] });
  });
});
