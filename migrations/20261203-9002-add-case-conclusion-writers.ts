import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// Who saved a case's interview or submitted its conclusion, so nobody signs off a conclusion they
// wrote or changed (lib/cases/rules.ts). Earlier cases take their submitters from the audit trail.
export async function up({ context: qi }: Params) {
  await qi.addColumn("service_case", "conclusion_writer_ids", { type: DataTypes.JSON, allowNull: true });
  await qi.sequelize.query(
    `UPDATE service_case c
        SET conclusion_writer_ids = (
          SELECT JSON_ARRAYAGG(DISTINCT a.actor_id)
            FROM audit_event a
           WHERE a.shop_id = c.shop_id AND a.entity = 'case' AND a.entity_id = CAST(c.id AS CHAR)
             AND a.action = 'submit' AND a.actor_id IS NOT NULL)`,
  );
}

export async function down({ context: qi }: Params) {
  await qi.removeColumn("service_case", "conclusion_writer_ids");
}
