import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// The findings engine reads clutch behaviour by compressor type (lib/diagnosis/schema.ts COMPRESSOR_TYPES).
const COMPRESSOR_TYPES = ["cycling_clutch", "variable_displacement", "electric"] as const;

/**
 * How each vehicle's compressor is driven and controlled, and what a spec-table row says about it.
 * Null when not known. Vehicles already marked electric start out as electric.
 */
export async function up({ context: qi }: Params) {
  await qi.addColumn("vehicle", "compressor_type", {
    type: DataTypes.ENUM(...COMPRESSOR_TYPES),
    allowNull: true,
  });
  await qi.sequelize.query("UPDATE vehicle SET compressor_type = 'electric' WHERE electric_compressor = 1");
  await qi.addColumn("spec_entry", "compressor_type", {
    type: DataTypes.ENUM(...COMPRESSOR_TYPES),
    allowNull: true,
  });
}

export async function down({ context: qi }: Params) {
  await qi.removeColumn("spec_entry", "compressor_type");
  await qi.removeColumn("vehicle", "compressor_type");
}
