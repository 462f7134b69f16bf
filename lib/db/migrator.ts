import type { Sequelize, QueryInterface } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";
import { migrations } from "@/migrations";

export type Migrator = Umzug<QueryInterface>;

/** Umzug over migrations/, recording what ran in the `schema_migration` table. */
export function createMigrator(sequelize: Sequelize, logger: Console | undefined = undefined): Migrator {
  return new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migration" }),
    logger,
  });
}
