import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// Each person reads numbers in their own units and writes them their own way: the units they chose
// (a system and any quantity read differently) and their locale. Both empty means the shop's.
export async function up({ context: qi }: Params) {
  await qi.addColumn("user", "unit_choice", { type: DataTypes.JSON, allowNull: true });
  await qi.addColumn("user", "locale", { type: DataTypes.STRING(35), allowNull: true });
}

// Everyone reads the shop's units again.
export async function down({ context: qi }: Params) {
  await qi.removeColumn("user", "locale");
  await qi.removeColumn("user", "unit_choice");
}
