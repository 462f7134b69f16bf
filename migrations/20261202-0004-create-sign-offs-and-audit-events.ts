import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import {
  addShopScopedForeignKey,
  createdAt,
  intId,
  shopIdColumn,
  tableOptions,
} from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

export async function up({ context: qi }: Params) {
  // Append-only: a verdict is never edited, a new one is added.
  await qi.createTable(
    "sign_off",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      reviewer_id: { type: DataTypes.STRING(40), allowNull: false },
      verdict: { type: DataTypes.ENUM("signed_off", "sent_back"), allowNull: false },
      comment: { type: DataTypes.TEXT, allowNull: true },
      created_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("sign_off", ["shop_id", "case_id", "created_at"], { name: "sign_off_shop_id_case_id" });
  await qi.addIndex("sign_off", ["shop_id", "reviewer_id"], { name: "sign_off_shop_id_reviewer_id" });
  await addShopScopedForeignKey(qi, {
    table: "sign_off",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  await addShopScopedForeignKey(qi, {
    table: "sign_off",
    column: "reviewer_id",
    references: "user",
    onDelete: "RESTRICT",
  });

  await qi.createTable(
    "audit_event",
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true, allowNull: false },
      shop_id: shopIdColumn(),
      actor_id: {
        type: DataTypes.STRING(40),
        allowNull: true,
        references: { model: "user", key: "id" },
        onDelete: "RESTRICT",
        onUpdate: "CASCADE",
      },
      entity: { type: DataTypes.STRING(40), allowNull: false },
      entity_id: { type: DataTypes.STRING(40), allowNull: false },
      action: { type: DataTypes.STRING(40), allowNull: false },
      detail: { type: DataTypes.JSON, allowNull: true },
      created_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("audit_event", ["shop_id", "entity", "entity_id", "created_at"], {
    name: "audit_event_shop_id_entity",
  });
  await qi.addIndex("audit_event", ["shop_id", "created_at"], { name: "audit_event_shop_id_created_at" });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("audit_event");
  await qi.dropTable("sign_off");
}
