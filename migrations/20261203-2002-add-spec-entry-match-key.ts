import { QueryTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import { specMatchKey } from "@/lib/specs/schema";

type Params = MigrationParams<QueryInterface>;

type Row = {
  id: number;
  shop_id: number;
  make: string;
  model: string;
  variant: string;
  year_from: number;
  year_to: number;
  rear_ac: number | boolean;
};

// One vehicle variant, one row: the same key the app compares ("F-150", "f150 " and "F 150" are
// one model), kept in a column with a unique index so parallel writes cannot both get in.
// Compared byte for byte (utf8mb4_bin): the key is already folded by specRowKey.
export async function up({ context: qi }: Params) {
  await qi.sequelize.query(
    "ALTER TABLE spec_entry ADD COLUMN match_key VARCHAR(720) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NULL",
  );

  const rows = await qi.sequelize.query<Row>(
    "SELECT id, shop_id, make, model, variant, year_from, year_to, rear_ac FROM spec_entry ORDER BY shop_id, id",
    { type: QueryTypes.SELECT },
  );
  const taken = new Set<string>();
  for (const r of rows) {
    const key = specMatchKey({
      make: r.make,
      model: r.model,
      variant: r.variant,
      yearFrom: r.year_from,
      yearTo: r.year_to,
      rearAc: Boolean(r.rear_ac),
    });
    // A row that already repeats an earlier one keeps its data and a key of its own; the next
    // edit of it is refused as a duplicate, so a person decides which of the two stays.
    const stored = taken.has(`${r.shop_id}|${key}`) ? `${key}#${r.id}` : key;
    taken.add(`${r.shop_id}|${stored}`);
    await qi.sequelize.query("UPDATE spec_entry SET match_key = ? WHERE id = ?", {
      replacements: [stored, r.id],
    });
  }

  await qi.sequelize.query(
    "ALTER TABLE spec_entry MODIFY match_key VARCHAR(720) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL",
  );
  await qi.addIndex("spec_entry", ["shop_id", "match_key"], {
    unique: true,
    name: "spec_entry_shop_match_key",
  });
  // The old index compared the columns as typed; the match key is the one rule now.
  await qi.removeIndex("spec_entry", "spec_entry_shop_vehicle_unique");
}

export async function down({ context: qi }: Params) {
  await qi.addIndex(
    "spec_entry",
    ["shop_id", "make", "model", "variant", "year_from", "year_to", "rear_ac"],
    { unique: true, name: "spec_entry_shop_vehicle_unique" },
  );
  await qi.removeIndex("spec_entry", "spec_entry_shop_match_key");
  await qi.removeColumn("spec_entry", "match_key");
}
