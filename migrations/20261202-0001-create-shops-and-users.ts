import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import {
  addShopIdKey,
  createdAt,
  intId,
  shopIdColumn,
  tableOptions,
  timestamps,
} from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

export async function up({ context: qi }: Params) {
  await qi.createTable(
    "shop",
    {
      id: intId(),
      name: { type: DataTypes.STRING(120), allowNull: false },
      units: { type: DataTypes.ENUM("metric", "imperial"), allowNull: false, defaultValue: "metric" },
      altitude_m: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
      ...timestamps(),
    },
    tableOptions,
  );

  await qi.createTable(
    "user",
    {
      // Lucia v3 uses string user ids.
      id: { type: DataTypes.STRING(40), primaryKey: true, allowNull: false },
      shop_id: shopIdColumn(),
      email: { type: DataTypes.STRING(255), allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      password_hash: { type: DataTypes.STRING(255), allowNull: false },
      role: { type: DataTypes.ENUM("owner", "senior", "technician", "apprentice"), allowNull: false },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      ...timestamps(),
    },
    tableOptions,
  );
  // The collation compares case-insensitively, so the check compares bytes.
  await qi.sequelize.query(
    "ALTER TABLE `user` ADD CONSTRAINT `user_email_lower_case` CHECK (CAST(`email` AS BINARY) = CAST(LOWER(`email`) AS BINARY))",
  );
  await qi.addIndex("user", ["email"], { unique: true, name: "user_email_unique" });
  await addShopIdKey(qi, "user");
  await qi.addIndex("user", ["shop_id", "role"], { name: "user_shop_id_role" });

  // Exactly the shape @lucia-auth/adapter-mysql reads and writes.
  await qi.createTable(
    "user_session",
    {
      id: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
      user_id: {
        type: DataTypes.STRING(40),
        allowNull: false,
        references: { model: "user", key: "id" },
        onDelete: "CASCADE",
        onUpdate: "CASCADE",
      },
      expires_at: { type: DataTypes.DATE, allowNull: false },
    },
    tableOptions,
  );

  await qi.createTable(
    "sign_in_attempt",
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true, allowNull: false },
      email: { type: DataTypes.STRING(255), allowNull: false },
      ip: { type: DataTypes.STRING(64), allowNull: false },
      succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
      attempted_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("sign_in_attempt", ["email", "attempted_at"], { name: "sign_in_attempt_email_at" });
  await qi.addIndex("sign_in_attempt", ["ip", "attempted_at"], { name: "sign_in_attempt_ip_at" });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("sign_in_attempt");
  await qi.dropTable("user_session");
  await qi.dropTable("user");
  await qi.dropTable("shop");
}
