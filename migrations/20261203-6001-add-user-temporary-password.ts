import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// An owner can reset a person's password to a temporary one shown once. Until the person
// chooses their own, every screen asks them to; the temporary one stops working at its expiry.
export async function up({ context: qi }: Params) {
  await qi.addColumn("user", "password_must_change", {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn("user", "password_expires_at", { type: DataTypes.DATE(3), allowNull: true });
}

export async function down({ context: qi }: Params) {
  await qi.removeColumn("user", "password_expires_at");
  await qi.removeColumn("user", "password_must_change");
}
