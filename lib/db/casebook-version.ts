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

/**
 * The shop's casebook version now (0 before its first change), in one read; with a case id, that case's
 * row version joins it ("12.7"), or "12.-" when the shop has no such case.
 */
export async function casebookVersion(
  sequelize: Sequelize,
  shopId: number,
  caseId?: number,
): Promise<string> {
  const [row] = await sequelize.query<{ version: number | string | null; caseVersion: number | null }>(
    caseId === undefined
      ? "SELECT (SELECT version FROM casebook_version WHERE shop_id = :shopId) AS version"
      : `SELECT (SELECT version FROM casebook_version WHERE shop_id = :shopId) AS version,
                (SELECT version FROM service_case WHERE shop_id = :shopId AND id = :caseId) AS caseVersion`,
    { replacements: { shopId, caseId: caseId ?? 0 }, type: QueryTypes.SELECT },
  );
  const shopVersion = String(row?.version ?? 0);
  return caseId === undefined ? shopVersion : `${shopVersion}.${row?.caseVersion ?? "-"}`;
}
