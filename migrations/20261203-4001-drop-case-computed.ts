import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// The computed values were written on every autosave and at submit, and read by nothing: a submitted
// case keeps them in its findings snapshot (findings.computed), and the screens compute them from the
// answers where they are shown (lib/refrigerants/readings.ts).
export async function up({ context: qi }: Params) {
  await qi.removeColumn("service_case", "computed");
}

// The column comes back empty: what it held is in each submitted case's findings, or follows from its answers.
export async function down({ context: qi }: Params) {
  await qi.addColumn("service_case", "computed", { type: DataTypes.JSON, allowNull: true });
}
