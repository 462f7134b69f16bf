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

export async function up({ context: qi }: Params) {
  await qi.createTable(
    "customer",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      name: { type: DataTypes.STRING(120), allowNull: false },
      phone: { type: DataTypes.STRING(40), allowNull: true },
      email: { type: DataTypes.STRING(255), allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "customer");
  await qi.addIndex("customer", ["shop_id", "name"], { name: "customer_shop_id_name" });

  await qi.createTable(
    "vehicle",
    {
      id: intId(),
      shop_id: shopIdColumn(),
      customer_id: { type: DataTypes.INTEGER, allowNull: false },
      year: { type: DataTypes.SMALLINT, allowNull: false },
      make: { type: DataTypes.STRING(60), allowNull: false },
      model: { type: DataTypes.STRING(80), allowNull: false },
      engine: { type: DataTypes.STRING(80), allowNull: true },
      vin: { type: DataTypes.STRING(17), allowNull: true },
      refrigerant: { type: DataTypes.ENUM("R-134a", "R-1234yf", "R-744", "R-12"), allowNull: false },
      expansion_device: { type: DataTypes.ENUM("orifice_tube", "txv"), allowNull: false },
      electric_compressor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      label_charge_g: { type: DataTypes.INTEGER, allowNull: true },
      oil_type: { type: DataTypes.STRING(60), allowNull: true },
      ...timestamps(),
    },
    tableOptions,
  );
  await addShopIdKey(qi, "vehicle");
  await qi.addIndex("vehicle", ["shop_id", "customer_id"], { name: "vehicle_shop_id_customer_id" });
  await qi.addIndex("vehicle", ["shop_id", "vin"], { name: "vehicle_shop_id_vin" });
  await qi.addIndex("vehicle", ["shop_id", "make", "model", "year"], { name: "vehicle_shop_id_make_model" });
  await addShopScopedForeignKey(qi, {
    table: "vehicle",
    column: "customer_id",
    references: "customer",
    onDelete: "RESTRICT",
  });
}

export async function down({ context: qi }: Params) {
  await qi.dropTable("vehicle");
  await qi.dropTable("customer");
}
