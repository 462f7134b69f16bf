import type { QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// The new-case vehicle list shows a shop's vehicles most recently seen first (lib/server/vehicles.ts):
// an index in that order lets MariaDB read one page instead of sorting the shop's whole fleet.
export async function up({ context: qi }: Params) {
  await qi.addIndex("vehicle", ["shop_id", "updated_at", "id"], { name: "vehicle_shop_updated" });
}

export async function down({ context: qi }: Params) {
  await qi.removeIndex("vehicle", "vehicle_shop_updated");
}
