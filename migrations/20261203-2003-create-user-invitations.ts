import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import {
  addShopScopedForeignKey,
  intId,
  shopIdColumn,
  tableOptions,
  timestamps,
} from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

// A person is added by invitation: the owner names an e-mail address, the person sets a password
// through the link mailed to it. Only a hash of the link's token is stored.
export async function up({ context: qi }: Params) {
  await qi.createTable(
    "user_invitation",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      email: { type: DataTypes.STRING(255), allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      role: { type: DataTypes.ENUM("owner", "senior", "technician", "apprentice"), allowNull: false },
      // SHA-256 of the token, hex.
      token_hash: { type: DataTypes.CHAR(64), allowNull: false },
      invited_by: { type: DataTypes.STRING(40), allowNull: false },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      accepted_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.sequelize.query(
    "ALTER TABLE `user_invitation` ADD CONSTRAINT `user_invitation_email_lower_case` CHECK (CAST(`email` AS BINARY) = CAST(LOWER(`email`) AS BINARY))",
  );
  // One invitation per address and shop: inviting again replaces the link.
  await qi.addIndex("user_invitation", ["shop_id", "email"], {
    unique: true,
    name: "user_invitation_shop_email",
  });
  await qi.addIndex("user_invitation", ["token_hash"], { unique: true, name: "user_invitation_token_hash" });
  await addShopScopedForeignKey(qi, {
    table: "user_invitation",
    column: "invited_by",
    references: "user",
    onDelete: "RESTRICT",
  });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("user_invitation");
}
