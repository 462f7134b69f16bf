import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// The new-case search finds a vehicle by its plate or its customer's phone number. The plate is
// stored as lib/vehicles/plate.ts normalises it; the phone's digits are a stored generated column, so
// "(902) 555-0147" is found by typing 5550147. Both indexes start with shop_id.
export async function up({ context: qi }: Params) {
  await qi.addColumn("vehicle", "plate", { type: DataTypes.STRING(12), allowNull: true });
  await qi.addIndex("vehicle", ["shop_id", "plate"], { name: "vehicle_shop_id_plate" });
  await qi.sequelize.query(
    "ALTER TABLE customer ADD COLUMN phone_digits VARCHAR(40) AS (REGEXP_REPLACE(COALESCE(phone, ''), '[^0-9]', '')) PERSISTENT",
  );
  await qi.addIndex("customer", ["shop_id", "phone_digits"], { name: "customer_shop_id_phone_digits" });
}

export async function down({ context: qi }: Params) {
  await qi.removeIndex("customer", "customer_shop_id_phone_digits");
  await qi.removeColumn("customer", "phone_digits");
  await qi.removeIndex("vehicle", "vehicle_shop_id_plate");
  await qi.removeColumn("vehicle", "plate");
}
