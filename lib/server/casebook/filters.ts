import "server-only";
import type { CasebookFilters, CasebookTextMode } from "@/lib/contracts/casebook";
import { searchWords, shopBooleanTerms, shopQueryTerms, wholeWordPattern } from "@/lib/casebook/words";

// The WHERE clause every casebook query shares (search, count, facets, export), always starting with
// the shop: the indexes on casebook_entry all begin with shop_id.

export type Replacements = Record<string, string | number | boolean | Date | string[] | number[]>;

export interface CasebookWhere {
  sql: string;
  replacements: Replacements;
  /** The natural-language MATCH expression, when the search has words the index holds. */
  relevanceSql: string | null;
  textMode: CasebookTextMode;
}

export const MATCH_SQL = "MATCH(e.search_terms) AGAINST (:words IN NATURAL LANGUAGE MODE)";
/** A search with short words: each is required, read from the same index (lib/casebook/words.ts). */
export const MATCH_BOOLEAN_SQL = "MATCH(e.search_terms) AGAINST (:words IN BOOLEAN MODE)";

const dayMs = 24 * 60 * 60 * 1000;

/** Builds the shared WHERE; `omit` leaves one facet's own filter out (for that facet's counts). */
export function casebookWhere(
  shopId: number,
  f: CasebookFilters,
  omit?: keyof CasebookFilters,
): CasebookWhere {
  const parts = ["e.shop_id = :shopId"];
  const replacements: Replacements = { shopId };
  const filter = <K extends keyof CasebookFilters>(key: K) => (key === omit ? undefined : f[key]);
  const equal = (column: string, name: string, value: string | number | undefined) => {
    if (value === undefined) return;
    parts.push(`${column} = :${name}`);
    replacements[name] = value;
  };
  equal("e.refrigerant", "refrigerant", filter("refrigerant"));
  equal("e.metering_device", "device", filter("device"));
  equal("e.compressor_type", "compressor", filter("compressor"));
  equal("e.leading_suspect", "suspect", filter("suspect"));
  equal("e.make", "make", filter("make"));
  equal("e.model", "model", filter("model"));
  equal("e.technician_id", "technician", filter("technician"));
  equal("e.status", "status", filter("status"));
  const yearFrom = filter("yearFrom");
  const yearTo = filter("yearTo");
  if (yearFrom !== undefined) {
    parts.push("e.year >= :yearFrom");
    replacements.yearFrom = yearFrom;
  }
  if (yearTo !== undefined) {
    parts.push("e.year <= :yearTo");
    replacements.yearTo = yearTo;
  }
  const from = filter("from");
  const to = filter("to");
  if (from) {
    parts.push("e.opened_at >= :from");
    replacements.from = new Date(`${from}T00:00:00Z`);
  }
  if (to) {
    parts.push("e.opened_at < :to");
    replacements.to = new Date(Date.parse(`${to}T00:00:00Z`) + dayMs);
  }
  if (filter("comeback")) parts.push("e.comeback = 1");
  (filter("symptoms") ?? []).forEach((symptom, i) => {
    parts.push(
      `e.case_id IN (SELECT s${i}.case_id FROM casebook_symptom s${i} WHERE s${i}.shop_id = :shopId AND s${i}.symptom = :symptom${i})`,
    );
    replacements[`symptom${i}`] = symptom;
  });
  const cause = filter("cause");
  if (cause) {
    parts.push(
      "e.case_id IN (SELECT cc.case_id FROM case_confirmed_cause cc WHERE cc.shop_id = :shopId AND cc.cause = :cause)",
    );
    replacements.cause = cause;
  }

  let relevanceSql: string | null = null;
  let textMode: CasebookTextMode = "none";
  const q = filter("q");
  if (q) {
    const words = searchWords(q);
    if (words.short.length > 0) {
      // Short words ("ac") are in the index as shop terms too: one boolean match requires each of them.
      parts.push(MATCH_BOOLEAN_SQL);
      replacements.words = shopBooleanTerms(words, shopId);
      relevanceSql = MATCH_BOOLEAN_SQL;
      textMode = "fulltext";
    } else if (words.indexed.length > 0) {
      // The shop's own terms (lib/casebook/words.ts): the full-text index reads this shop's matches only.
      parts.push(MATCH_SQL);
      replacements.words = shopQueryTerms(words.indexed, shopId);
      relevanceSql = MATCH_SQL;
      textMode = "fulltext";
    }
    // Stopwords alone are not in the index: each must appear as a whole word in the shop's text.
    // LIKE first: a cheap substring test that spares the pattern most rows.
    words.stopwords.forEach((word, i) => {
      parts.push(`e.search_text LIKE :shortLike${i} AND e.search_text REGEXP :short${i}`);
      replacements[`shortLike${i}`] = `%${word}%`;
      replacements[`short${i}`] = wholeWordPattern(word);
      textMode = "pattern";
    });
  }
  return { sql: parts.join("\n   AND "), replacements, relevanceSql, textMode };
}
