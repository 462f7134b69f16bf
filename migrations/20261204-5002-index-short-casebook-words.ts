import { QueryTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";
import { shopIndexTerms } from "@/lib/casebook/words";

type Params = MigrationParams<QueryInterface>;

const BATCH = 500;

/**
 * Short words ("ac", "r") join the casebook's full-text terms (lib/casebook/words.ts): with the shop's
 * prefix in front they are long enough for the index, so a search for them reads the index instead of
 * testing every row of the shop with a pattern. Rewrites each row's terms from its stored search text.
 */
export async function up({ context: qi }: Params) {
  let lastId = 0;
  for (;;) {
    const rows = await qi.sequelize.query<{ case_id: number; shop_id: number; search_text: string }>(
      "SELECT case_id, shop_id, search_text FROM casebook_entry WHERE case_id > :lastId ORDER BY case_id LIMIT :batch",
      { replacements: { lastId, batch: BATCH }, type: QueryTypes.SELECT },
    );
    if (rows.length === 0) return;
    await qi.sequelize.transaction(async (transaction) => {
      for (const r of rows)
        await qi.sequelize.query("UPDATE casebook_entry SET search_terms = :terms WHERE case_id = :caseId", {
          replacements: { terms: shopIndexTerms(r.search_text, r.shop_id), caseId: r.case_id },
          transaction,
        });
    });
    lastId = rows[rows.length - 1]!.case_id;
  }
}

/** The extra terms do no harm to the code before this migration: nothing to undo. */
export async function down() {}
