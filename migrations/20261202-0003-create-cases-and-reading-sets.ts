import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import {
  addShopIdKey,
  addShopScopedForeignKey,
  intId,
  shopIdColumn,
  tableOptions,
  timestamps,
} from "@/lib/db/schema-helpers";

type Params = MigrationParams<QueryInterface>;

const decimal = (precision: number, scale: number) => ({
  type: DataTypes.DECIMAL(precision, scale),
  allowNull: true,
});

export async function up({ context: qi }: Params) {
  // "case" is a reserved word in SQL.
  await qi.createTable(
    "service_case",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      customer_id: { type: DataTypes.INTEGER, allowNull: true },
      vehicle_id: { type: DataTypes.INTEGER, allowNull: true },
      technician_id: { type: DataTypes.STRING(40), allowNull: false },
      status: {
        type: DataTypes.ENUM("draft", "awaiting_signoff", "signed_off", "sent_back", "closed"),
        allowNull: false,
        defaultValue: "draft",
      },
      complaint: { type: DataTypes.TEXT, allowNull: false },
      symptom_tags: { type: DataTypes.JSON, allowNull: false },
      interview_step: { type: DataTypes.STRING(40), allowNull: true },
      answers: { type: DataTypes.JSON, allowNull: false },
      computed: { type: DataTypes.JSON, allowNull: true },
      findings: { type: DataTypes.JSON, allowNull: true },
      engine_version: { type: DataTypes.STRING(64), allowNull: true },
      conclusion_cause: { type: DataTypes.STRING(40), allowNull: true },
      conclusion_notes: { type: DataTypes.TEXT, allowNull: true },
      confirmed_repair: { type: DataTypes.TEXT, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      submitted_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "service_case");
  await qi.addIndex("service_case", ["shop_id", "status"], { name: "service_case_shop_id_status" });
  await qi.addIndex("service_case", ["shop_id", "vehicle_id"], { name: "service_case_shop_id_vehicle_id" });
  await qi.addIndex("service_case", ["shop_id", "customer_id"], { name: "service_case_shop_id_customer_id" });
  await qi.addIndex("service_case", ["shop_id", "technician_id"], {
    name: "service_case_shop_id_technician_id",
  });
  await qi.addIndex("service_case", ["shop_id", "created_at"], { name: "service_case_shop_id_created_at" });
  await qi.addIndex("service_case", ["complaint", "conclusion_notes", "confirmed_repair"], {
    type: "FULLTEXT",
    name: "service_case_search",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_case",
    column: "customer_id",
    references: "customer",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_case",
    column: "vehicle_id",
    references: "vehicle",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_case",
    column: "technician_id",
    references: "user",
    onDelete: "RESTRICT",
  });

  await qi.createTable(
    "reading_set",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.ENUM("static", "running", "final"), allowNull: false },
      ambient_c: decimal(5, 2),
      relative_humidity_pct: decimal(5, 2),
      engine_rpm: { type: DataTypes.INTEGER, allowNull: true },
      static_kpa_gauge: decimal(7, 2),
      high_kpa_gauge: decimal(7, 2),
      low_kpa_gauge: decimal(7, 2),
      liquid_line_c: decimal(5, 2),
      suction_line_c: decimal(5, 2),
      vent_c: decimal(5, 2),
      taken_at: { type: DataTypes.DATE(3), allowNull: false },
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.addIndex("reading_set", ["shop_id", "case_id", "taken_at"], {
    name: "reading_set_shop_id_case_id",
  });
  await addShopScopedForeignKey(qi, {
    table: "reading_set",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("reading_set");
  await qi.dropTable("service_case");
}
