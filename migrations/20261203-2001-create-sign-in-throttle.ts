import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import { tableOptions } from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

// The counters rate-limiter-flexible keeps for sign-in attempts (lib/server/sign-in-throttle.ts):
// its MySQL store writes (key, points, expire) in this column order. Keys are hex hashes.
export async function up({ context: qi }: Params) {
  await qi.createTable(
    "sign_in_throttle",
    {
      key: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
      points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      // Milliseconds since 1970 when the count lapses; null: never.
      expire: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    },
    tableOptions,
  );
  await qi.addIndex("sign_in_throttle", ["expire"], { name: "sign_in_throttle_expire" });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("sign_in_throttle");
}
