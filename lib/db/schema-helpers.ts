import { DataTypes, literal, type QueryInterface, type ModelAttributeColumnOptions } from "sequelize";

// Shared column shapes for migrations. Past migrations call these, so change them only by
// adding new helpers: an edit here would silently rewrite the history of the schema.

export const tableOptions = { engine: "InnoDB", charset: "utf8mb4", collate: "utf8mb4_unicode_ci" } as const;

export function intId(): ModelAttributeColumnOptions {
  return { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
}

export function shopIdColumn(): ModelAttributeColumnOptions {
  return {
    type: DataTypes.INTEGER,
    allowNull: false,
    references: { model: "shop", key: "id" },
    onDelete: "RESTRICT",
    onUpdate: "CASCADE",
  };
}

export function createdAt(): ModelAttributeColumnOptions {
  return { type: DataTypes.DATE(3), allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP(3)") };
}

export function timestamps(): Record<"created_at" | "updated_at", ModelAttributeColumnOptions> {
  return { created_at: createdAt(), updated_at: createdAt() };
}

type ShopScopedReference = {
  table: string;
  column: string;
  references: string;
  onDelete: "RESTRICT" | "CASCADE";
};

/**
 * A foreign key on (shop_id, column) → references(shop_id, id), so the database itself refuses a row
 * that points at another shop's customer, vehicle, case or user.
 */
export async function addShopScopedForeignKey(queryInterface: QueryInterface, ref: ShopScopedReference) {
  const name = `${ref.table}_${ref.column}_fk`;
  await queryInterface.sequelize.query(
    `ALTER TABLE \`${ref.table}\` ADD CONSTRAINT \`${name}\` FOREIGN KEY (\`shop_id\`, \`${ref.column}\`) ` +
      `REFERENCES \`${ref.references}\` (\`shop_id\`, \`id\`) ON DELETE ${ref.onDelete} ON UPDATE RESTRICT`,
  );
}

/** The (shop_id, id) key that shop-scoped foreign keys point at. */
export async function addShopIdKey(queryInterface: QueryInterface, table: string) {
  await queryInterface.addIndex(table, ["shop_id", "id"], { unique: true, name: `${table}_shop_id_id` });
}
