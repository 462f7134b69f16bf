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

const REFRIGERANTS = ["R-134a", "R-1234yf", "R-744", "R-12"] as const;
const PARTS = ["compressor", "condenser", "evaporator", "accumulator", "receiver_drier", "hose"] as const;
const MOVEMENTS = ["recovered_into", "charged_from", "recycled", "sent_out", "adjustment"] as const;

export async function up({ context: qi }: Params) {
  await qi.createTable(
    "spec_entry",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      year_from: { type: DataTypes.SMALLINT, allowNull: false },
      year_to: { type: DataTypes.SMALLINT, allowNull: false },
      make: { type: DataTypes.STRING(60), allowNull: false },
      model: { type: DataTypes.STRING(80), allowNull: false },
      variant: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
      rear_ac: { type: DataTypes.BOOLEAN, allowNull: false },
      refrigerant: { type: DataTypes.ENUM(...REFRIGERANTS), allowNull: false },
      label_charge_g: { type: DataTypes.INTEGER, allowNull: false },
      oil_type: { type: DataTypes.STRING(60), allowNull: false },
      total_oil_ml: { type: DataTypes.INTEGER, allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "spec_entry");
  await qi.addIndex(
    "spec_entry",
    ["shop_id", "make", "model", "variant", "year_from", "year_to", "rear_ac"],
    {
      unique: true,
      name: "spec_entry_shop_vehicle_unique",
    },
  );

  await qi.createTable(
    "part_oil_allowance",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      part: { type: DataTypes.ENUM(...PARTS), allowNull: false },
      // null: drain the removed part and measure instead of assuming a figure
      allowance_ml: { type: DataTypes.INTEGER, allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await qi.addIndex("part_oil_allowance", ["shop_id", "part"], {
    unique: true,
    name: "part_oil_allowance_shop_part",
  });

  await qi.createTable(
    "cylinder",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      label: { type: DataTypes.STRING(60), allowNull: false },
      serial: { type: DataTypes.STRING(60), allowNull: true },
      refrigerant: { type: DataTypes.ENUM(...REFRIGERANTS), allowNull: false },
      kind: { type: DataTypes.ENUM("recovery", "virgin", "recycled"), allowNull: false },
      tare_g: { type: DataTypes.INTEGER, allowNull: false },
      capacity_g: { type: DataTypes.INTEGER, allowNull: false },
      initial_net_g: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      retired_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "cylinder");
  await qi.addIndex("cylinder", ["shop_id", "label"], { unique: true, name: "cylinder_shop_label" });

  await qi.createTable(
    "service_record",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      case_id: { type: DataTypes.INTEGER, allowNull: false },
      technician_id: { type: DataTypes.STRING(40), allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      step: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "identify" },
      refrigerant: { type: DataTypes.ENUM(...REFRIGERANTS), allowNull: false },
      spec_entry_id: { type: DataTypes.INTEGER, allowNull: true },
      label_charge_g: { type: DataTypes.INTEGER, allowNull: true },
      purity_pct: { type: DataTypes.DECIMAL(5, 2), allowNull: true },
      air_pct: { type: DataTypes.DECIMAL(5, 2), allowNull: true },
      recovery_started_at: { type: DataTypes.DATE(3), allowNull: true },
      recovery_ended_at: { type: DataTypes.DATE(3), allowNull: true },
      recovered_g: { type: DataTypes.INTEGER, allowNull: true },
      recovery_cylinder_id: { type: DataTypes.INTEGER, allowNull: true },
      oil_drained_ml: { type: DataTypes.INTEGER, allowNull: true },
      oil_pulled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      slow_recovery_note: { type: DataTypes.TEXT, allowNull: true },
      deepest_kpa_abs: { type: DataTypes.DECIMAL(7, 3), allowNull: true },
      hold_start_kpa_abs: { type: DataTypes.DECIMAL(7, 3), allowNull: true },
      hold_end_kpa_abs: { type: DataTypes.DECIMAL(7, 3), allowNull: true },
      hold_minutes: { type: DataTypes.DECIMAL(6, 1), allowNull: true },
      hold_passed: { type: DataTypes.BOOLEAN, allowNull: true },
      oil_added_type: { type: DataTypes.STRING(60), allowNull: true },
      oil_added_ml: { type: DataTypes.INTEGER, allowNull: true },
      parts_replaced: { type: DataTypes.JSON, allowNull: false },
      target_g: { type: DataTypes.INTEGER, allowNull: true },
      charged_g: { type: DataTypes.INTEGER, allowNull: true },
      charge_cylinder_id: { type: DataTypes.INTEGER, allowNull: true },
      final_reading_set_id: { type: DataTypes.INTEGER, allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "service_record");
  await qi.addIndex("service_record", ["case_id"], { unique: true, name: "service_record_case_unique" });
  await addShopScopedForeignKey(qi, {
    table: "service_record",
    column: "case_id",
    references: "service_case",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_record",
    column: "technician_id",
    references: "user",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_record",
    column: "recovery_cylinder_id",
    references: "cylinder",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_record",
    column: "charge_cylinder_id",
    references: "cylinder",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "service_record",
    column: "spec_entry_id",
    references: "spec_entry",
    onDelete: "RESTRICT",
  });
  // reading_set has no (shop_id, id) key; the server sets this only to a reading set of the record's own case.
  await qi.addConstraint("service_record", {
    type: "foreign key",
    name: "service_record_final_reading_set_id_fk",
    fields: ["final_reading_set_id"],
    references: { table: "reading_set", field: "id" },
    onDelete: "SET NULL",
    onUpdate: "RESTRICT",
  });

  // Append-only: a correction is a new row that cancels an earlier one (reverses_id).
  // service_record_id has no foreign key on purpose: the ledger outlives a deleted record.
  await qi.createTable(
    "refrigerant_movement",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      cylinder_id: { type: DataTypes.INTEGER, allowNull: false },
      case_id: { type: DataTypes.INTEGER, allowNull: true },
      service_record_id: { type: DataTypes.INTEGER, allowNull: true },
      technician_id: { type: DataTypes.STRING(40), allowNull: false },
      type: { type: DataTypes.ENUM(...MOVEMENTS), allowNull: false },
      refrigerant: { type: DataTypes.ENUM(...REFRIGERANTS), allowNull: false },
      mass_g: { type: DataTypes.INTEGER, allowNull: false },
      occurred_at: { type: DataTypes.DATE(3), allowNull: false },
      reverses_id: { type: DataTypes.INTEGER, allowNull: true, unique: true },
      destination: { type: DataTypes.STRING(120), allowNull: true },
      note: { type: DataTypes.STRING(255), allowNull: true },
      created_at: timestamps().created_at,
    },
    tableOptions,
  );
  await addShopIdKey(qi, "refrigerant_movement");
  await qi.addIndex("refrigerant_movement", ["shop_id", "occurred_at"], {
    name: "refrigerant_movement_shop_occurred",
  });
  await qi.addIndex("refrigerant_movement", ["shop_id", "service_record_id"], {
    name: "refrigerant_movement_shop_record",
  });
  await addShopScopedForeignKey(qi, {
    table: "refrigerant_movement",
    column: "cylinder_id",
    references: "cylinder",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "refrigerant_movement",
    column: "case_id",
    references: "service_case",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "refrigerant_movement",
    column: "technician_id",
    references: "user",
    onDelete: "RESTRICT",
  });
  await addShopScopedForeignKey(qi, {
    table: "refrigerant_movement",
    column: "reverses_id",
    references: "refrigerant_movement",
    onDelete: "RESTRICT",
  });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("refrigerant_movement");
  await qi.dropTable("service_record");
  await qi.dropTable("cylinder");
  await qi.dropTable("part_oil_allowance");
  await qi.dropTable("spec_entry");
}
