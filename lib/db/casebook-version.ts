import { QueryTypes, type Sequelize, type Transaction } from "sequelize";

// The per-shop counter of migrations/20261204-5001-create-casebook-version.ts. No "server-only": the
// casebook refresh that raises it runs in scripts too.

/** Raises the shop's casebook version inside the change's transaction (visible when it commits). */
export async function bumpCasebookVersion(
  sequelize: Sequelize,
  shopId: number,
  transaction?: Transaction,
): Promise<void> {
  await sequelize.query(
    "INSERT INTO casebook_version (shop_id, version) VALUES (:shopId, 1) ON DUPLICATE KEY UPDATE version = version + 1",
    { replacements: { shopId }, transaction },
  );
}

/** The shop's casebook version now (0 before its first change). */
export async function casebookVersion(sequelize: Sequelize, shopId: number): Promise<number> {
  const [row] = await sequelize.query<{ version: number | string }>(
    "SELECT version FROM casebook_version WHERE shop_id = :shopId",
    { replacements: { shopId }, type: QueryTypes.SELECT },
  );
  return Number(row?.version ?? 0);
}
