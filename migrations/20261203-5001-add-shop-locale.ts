import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// The shop's locale (a BCP 47 tag such as en-CA), beside its time zone: together they say how a
// time reads on the shop's clock ("changed on another screen at 10:05").
export async function up({ context: qi }: Params) {
  await qi.addColumn("shop", "locale", { type: DataTypes.STRING(35), allowNull: false, defaultValue: "en" });
}

export async function down({ context: qi }: Params) {
  await qi.removeColumn("shop", "locale");
}
