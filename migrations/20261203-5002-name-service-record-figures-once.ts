import type { QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// One name per figure: the service record takes the interview's names for the mass that came out
// of the system and the oil that came out with it. RENAME COLUMN keeps type, nullability and data.
const RENAMES = [
  ["recovered_g", "recovered_charge_g"],
  ["oil_drained_ml", "oil_removed_ml"],
] as const;

export async function up({ context: qi }: Params) {
  for (const [from, to] of RENAMES)
    await qi.sequelize.query(`ALTER TABLE service_record RENAME COLUMN ${from} TO ${to}`);
}

export async function down({ context: qi }: Params) {
  for (const [from, to] of RENAMES)
    await qi.sequelize.query(`ALTER TABLE service_record RENAME COLUMN ${to} TO ${from}`);
}
