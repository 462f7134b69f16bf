import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import { tableOptions } from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

/**
 * One counter per shop, raised in the same transaction as any change to the shop's casebook rows
 * (lib/db/casebook-refresh.ts). Answers to casebook searches and similar-case panels are remembered
 * under the shop and this number, so a change makes every remembered answer of that shop unreachable, on
 * every app instance, the moment it commits. A shop without a row is at version 0.
 */
export async function up({ context: qi }: Params) {
  await qi.createTable(
    "casebook_version",
    {
      // No foreign key: the counter is raised at the end of a case's transaction and must not wait on
      // the shop row's locks; a row for a shop that no longer exists is harmless.
      shop_id: { type: DataTypes.INTEGER, primaryKey: true, allowNull: false },
      version: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    },
    tableOptions,
  );
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("casebook_version");
}
