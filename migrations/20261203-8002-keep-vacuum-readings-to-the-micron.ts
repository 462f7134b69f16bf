import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

const COLUMNS = ["deepest_kpa_abs", "hold_start_kpa_abs", "hold_end_kpa_abs"] as const;

// Stored to 1 Pa, a vacuum typed in microns of mercury came back about 7 microns off (1 Pa is 7.5
// microns): 500 microns showed as 503. To 0.01 Pa it comes back as typed. Widening keeps every value.
export async function up({ context: qi }: Params) {
  for (const column of COLUMNS)
    await qi.changeColumn("service_record", column, { type: DataTypes.DECIMAL(9, 5), allowNull: true });
}

// Back to 1 Pa: readings round to the nearest pascal.
export async function down({ context: qi }: Params) {
  for (const column of COLUMNS)
    await qi.changeColumn("service_record", column, { type: DataTypes.DECIMAL(7, 3), allowNull: true });
}
