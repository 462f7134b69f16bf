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

const reading = () => ({ type: DataTypes.FLOAT, allowNull: true });

/**
 * The casebook: the outcome a case is closed with (confirmed causes and repairs, as data), the shop's
 * comeback window, and two tables derived from each case and rewritten whenever it changes: one row per
 * case to search and filter (with its symptoms beside it), and one row of readings to find similar cases.
 */
export async function up({ context: qi }: Params) {
  await qi.addColumn("shop", "comeback_window_days", {
    type: DataTypes.SMALLINT,
    allowNull: false,
    defaultValue: 90,
  });
  await qi.addColumn("service_case", "closed_at", { type: DataTypes.DATE(3), allowNull: true });
  await qi.addColumn("service_case", "repair_note", { type: DataTypes.TEXT, allowNull: true });
  // The case list sorts by the last change; comebacks look up a vehicle's closed cases.
  await qi.addIndex("service_case", ["shop_id", "updated_at", "id"], { name: "service_case_shop_updated" });
  await qi.addIndex("service_case", ["shop_id", "status", "updated_at", "id"], {
    name: "service_case_shop_status_updated",
  });
  await qi.addIndex("service_case", ["shop_id", "vehicle_id", "closed_at"], {
    name: "service_case_shop_vehicle_closed",
  });

  await qi.createTable(
    "case_confirmed_cause",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      // A cause id from lib/diagnosis/causes.ts, or none_found.
      cause: { type: DataTypes.STRING(40), allowNull: false },
      created_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("case_confirmed_cause", ["shop_id", "case_id", "cause"], {
    unique: true,
    name: "case_confirmed_cause_unique",
  });
  await qi.addIndex("case_confirmed_cause", ["shop_id", "cause", "case_id"], {
    name: "case_confirmed_cause_shop_cause",
  });
  await addShopScopedForeignKey(qi, {
    table: "case_confirmed_cause",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });

  await qi.createTable(
    "case_repair",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      // A repair id from lib/repairs/catalog.ts.
      repair_id: { type: DataTypes.STRING(40), allowNull: false },
      created_at: createdAt(),
    },
    tableOptions,
  );
  await qi.addIndex("case_repair", ["shop_id", "case_id", "repair_id"], {
    unique: true,
    name: "case_repair_unique",
  });
  await qi.addIndex("case_repair", ["shop_id", "repair_id", "case_id"], { name: "case_repair_shop_repair" });
  await addShopScopedForeignKey(qi, {
    table: "case_repair",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });

  // One row per case, rewritten by lib/server/casebook whenever the case changes.
  await qi.createTable(
    "casebook_entry",
    {
      case_id: { type: DataTypes.INTEGER, primaryKey: true, allowNull: false },
      shop_id: shopIdColumn(),
      status: { type: DataTypes.STRING(20), allowNull: false },
      technician_id: { type: DataTypes.STRING(40), allowNull: false },
      vehicle_id: { type: DataTypes.INTEGER, allowNull: true },
      make: { type: DataTypes.STRING(60), allowNull: true },
      model: { type: DataTypes.STRING(80), allowNull: true },
      year: { type: DataTypes.SMALLINT, allowNull: true },
      refrigerant: { type: DataTypes.STRING(12), allowNull: true },
      metering_device: { type: DataTypes.STRING(20), allowNull: true },
      compressor_type: { type: DataTypes.STRING(30), allowNull: true },
      leading_suspect: { type: DataTypes.STRING(40), allowNull: true },
      // The first confirmed cause, for display and sorting; all of them are in case_confirmed_cause.
      outcome: { type: DataTypes.STRING(40), allowNull: true },
      opened_at: { type: DataTypes.DATE(3), allowNull: false },
      closed_at: { type: DataTypes.DATE(3), allowNull: true },
      // The earlier closed case of the same vehicle this one came back after, and the later case that
      // came back after this one, each within the shop's comeback window.
      comeback_of_case_id: { type: DataTypes.INTEGER, allowNull: true },
      came_back_case_id: { type: DataTypes.INTEGER, allowNull: true },
      comeback: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      search_text: { type: DataTypes.TEXT, allowNull: false },
      // The words of search_text with the shop in front of each (lib/casebook/words.ts): what the full-text
      // index holds, so a search reads its own shop's matches only.
      search_terms: { type: DataTypes.TEXT, allowNull: false },
      updated_at: createdAt(),
    },
    tableOptions,
  );
  await addShopScopedForeignKey(qi, {
    table: "casebook_entry",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  const entryIndexes: [string, string[]][] = [
    ["casebook_entry_shop_opened", ["shop_id", "opened_at", "case_id"]],
    ["casebook_entry_shop_closed", ["shop_id", "closed_at", "case_id"]],
    ["casebook_entry_shop_status", ["shop_id", "status", "opened_at"]],
    ["casebook_entry_shop_system", ["shop_id", "refrigerant", "metering_device", "opened_at"]],
    ["casebook_entry_shop_compressor", ["shop_id", "compressor_type", "opened_at"]],
    ["casebook_entry_shop_suspect", ["shop_id", "leading_suspect", "opened_at"]],
    ["casebook_entry_shop_outcome", ["shop_id", "outcome", "opened_at"]],
    ["casebook_entry_shop_vehicle", ["shop_id", "make", "model", "year"]],
    ["casebook_entry_shop_technician", ["shop_id", "technician_id", "opened_at"]],
    ["casebook_entry_shop_comeback", ["shop_id", "comeback", "opened_at"]],
  ];
  for (const [name, fields] of entryIndexes) await qi.addIndex("casebook_entry", fields, { name });
  await qi.addIndex("casebook_entry", ["search_terms"], { type: "FULLTEXT", name: "casebook_entry_terms" });

  await qi.createTable(
    "casebook_symptom",
    {
      shop_id: { ...shopIdColumn(), primaryKey: true },
      symptom: { type: DataTypes.STRING(48), allowNull: false, primaryKey: true },
      case_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    },
    tableOptions,
  );
  await qi.addIndex("casebook_symptom", ["shop_id", "case_id"], { name: "casebook_symptom_shop_case" });
  await addShopScopedForeignKey(qi, {
    table: "casebook_symptom",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });

  // The readings of a submitted case, in °C, K and %: what "similar cases" measures distance over.
  await qi.createTable(
    "case_features",
    {
      case_id: { type: DataTypes.INTEGER, primaryKey: true, allowNull: false },
      shop_id: shopIdColumn(),
      refrigerant: { type: DataTypes.STRING(12), allowNull: false },
      metering_device: { type: DataTypes.STRING(20), allowNull: false },
      closed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      condensing_c: reading(),
      evaporating_c: reading(),
      subcooling_k: reading(),
      superheat_k: reading(),
      approach_k: reading(),
      ambient_c: reading(),
      charge_deviation_pct: reading(),
      updated_at: createdAt(),
    },
    tableOptions,
  );
  await addShopScopedForeignKey(qi, {
    table: "case_features",
    column: "case_id",
    references: "service_case",
    onDelete: "CASCADE",
  });
  // Covers the similar-case query: the range on condensing_c bounds it, the rest is read from the index.
  await qi.addIndex(
    "case_features",
    [
      "shop_id",
      "refrigerant",
      "metering_device",
      "closed",
      "condensing_c",
      "evaporating_c",
      "subcooling_k",
      "superheat_k",
      "approach_k",
      "ambient_c",
      "charge_deviation_pct",
    ],
    { name: "case_features_nearest" },
  );
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("case_features");
  await qi.dropTable("casebook_symptom");
  await qi.dropTable("casebook_entry");
  await qi.dropTable("case_repair");
  await qi.dropTable("case_confirmed_cause");
  await qi.removeIndex("service_case", "service_case_shop_vehicle_closed");
  await qi.removeIndex("service_case", "service_case_shop_status_updated");
  await qi.removeIndex("service_case", "service_case_shop_updated");
  await qi.removeColumn("service_case", "repair_note");
  await qi.removeColumn("service_case", "closed_at");
  await qi.removeColumn("shop", "comeback_window_days");
}
