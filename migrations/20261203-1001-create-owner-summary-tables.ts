import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import {
  addShopIdKey,
  addShopScopedForeignKey,
  createdAt,
  intId,
  shopIdColumn,
  tableOptions,
  timestamps,
} from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

const user = (allowNull: boolean) => ({ type: DataTypes.STRING(40), allowNull });

export async function up({ context: qi }: Params) {
  // The owner's page: only the SHA-256 of the token is kept, never the token itself.
  await qi.createTable(
    "share_link",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false },
      created_by: user(false),
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      revoked_at: { type: DataTypes.DATE(3), allowNull: true },
      revoked_by: user(true),
      last_viewed_at: { type: DataTypes.DATE(3), allowNull: true },
      view_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      created_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("share_link", ["token_hash"], { unique: true, name: "share_link_token_hash" });
  await qi.addIndex("share_link", ["shop_id", "case_id"], { name: "share_link_shop_id_case_id" });
  await addShopIdKey(qi, "share_link");
  await addShopScopedForeignKey(qi, {
    table: "share_link",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  await addShopScopedForeignKey(qi, {
    table: "share_link",
    column: "created_by",
    references: "user",
    onDelete: "RESTRICT",
  });

  // What the shop proposes and the owner's yes or no; a new proposal is a new row.
  await qi.createTable(
    "repair_proposal",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      repair_ids: { type: DataTypes.JSON, allowNull: false },
      price_minor: { type: DataTypes.INTEGER, allowNull: true },
      currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: "USD" },
      note: { type: DataTypes.TEXT, allowNull: true },
      proposed_by: user(false),
      answer: { type: DataTypes.ENUM("approved", "declined"), allowNull: true },
      answer_note: { type: DataTypes.TEXT, allowNull: true },
      answered_at: { type: DataTypes.DATE(3), allowNull: true },
      answered_via_link_id: { type: DataTypes.INTEGER, allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.addIndex("repair_proposal", ["shop_id", "case_id", "created_at"], {
    name: "repair_proposal_shop_id_case_id",
  });
  await addShopScopedForeignKey(qi, {
    table: "repair_proposal",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  await addShopScopedForeignKey(qi, {
    table: "repair_proposal",
    column: "proposed_by",
    references: "user",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "repair_proposal",
    column: "answered_via_link_id",
    references: "share_link",
    onDelete: "RESTRICT",
  });

  // Photos: only re-encoded copies without location data are stored.
  await qi.createTable(
    "attachment",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      kind: {
        type: DataTypes.ENUM("gauges", "label", "identifier", "leak", "damage", "other"),
        allowNull: false,
        defaultValue: "other",
      },
      caption: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
      shareable: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      object_key: { type: DataTypes.STRING(200), allowNull: false },
      thumb_key: { type: DataTypes.STRING(200), allowNull: false },
      content_type: { type: DataTypes.STRING(40), allowNull: false },
      size_bytes: { type: DataTypes.INTEGER, allowNull: false },
      width_px: { type: DataTypes.INTEGER, allowNull: false },
      height_px: { type: DataTypes.INTEGER, allowNull: false },
      uploaded_by: user(false),
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.addIndex("attachment", ["shop_id", "case_id", "created_at"], {
    name: "attachment_shop_id_case_id",
  });
  await addShopScopedForeignKey(qi, {
    table: "attachment",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  await addShopScopedForeignKey(qi, {
    table: "attachment",
    column: "uploaded_by",
    references: "user",
    onDelete: "RESTRICT",
  });

  // Every message we send, with its fate; a failed one waits for a retry.
  await qi.createTable(
    "outbound_email",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: true },
      share_link_id: { type: DataTypes.INTEGER, allowNull: true },
      kind: { type: DataTypes.STRING(40), allowNull: false },
      to_address: { type: DataTypes.STRING(254), allowNull: false },
      subject: { type: DataTypes.STRING(200), allowNull: false },
      status: { type: DataTypes.ENUM("queued", "sent", "failed"), allowNull: false, defaultValue: "queued" },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      last_error: { type: DataTypes.STRING(500), allowNull: true },
      claimed_until: { type: DataTypes.DATE(3), allowNull: true },
      message_id: { type: DataTypes.STRING(200), allowNull: true },
      sent_at: { type: DataTypes.DATE(3), allowNull: true },
      created_by: user(true),
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.addIndex("outbound_email", ["shop_id", "case_id", "created_at"], {
    name: "outbound_email_shop_id_case_id",
  });
  await qi.addIndex("outbound_email", ["status", "created_at"], { name: "outbound_email_status" });
  await addShopScopedForeignKey(qi, {
    table: "outbound_email",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  await addShopScopedForeignKey(qi, {
    table: "outbound_email",
    column: "share_link_id",
    references: "share_link",
    onDelete: "RESTRICT",
  });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("outbound_email");
  await qi.dropTable("attachment");
  await qi.dropTable("repair_proposal");
  await qi.dropTable("share_link");
}
