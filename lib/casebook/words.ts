// Turning what a person typed into what MariaDB's full-text index can match.

/**
 * InnoDB's built-in full-text stopwords (MariaDB's default innodb_ft_default_stopword table): words the
 * index never holds, so a search for them alone must fall back to a pattern.
 */
export const INNODB_STOPWORDS: ReadonlySet<string> = new Set([
  "a",
  "about",
  "an",
  "are",
  "as",
  "at",
  "be",
  "by",
  "com",
  "de",
  "en",
  "for",
  "from",
  "how",
  "i",
  "in",
  "is",
  "it",
  "la",
  "of",
  "on",
  "or",
  "that",
  "the",
  "this",
  "to",
  "was",
  "what",
  "when",
  "where",
  "who",
  "will",
  "with",
  "und",
  "www",
]);

/**
 * The server's innodb_ft_min_token_size (3 on the server scripts/db.sh starts; an integration test checks
 * it). The index holds shop terms (a six-letter shop prefix and the word), so even a one-letter word
 * makes a term well over this minimum: short words such as "ac" are in the index like any other.
 */
export const MIN_INDEXED_WORD_CHARS = 3;

export interface SearchWords {
  /** Words of the index's usual length: matched in natural-language mode, ranked by relevance. */
  indexed: string[];
  /** Words shorter than MIN_INDEXED_WORD_CHARS (such as "ac"): each must appear, read from the same index. */
  short: string[];
  /** A search of stopwords only ("on", "at the"): the index skips them, so they are looked for whole. */
  stopwords: string[];
}

const MAX_WORDS = 12;

/**
 * Splits a search into words the way InnoDB's parser does (letters and digits; anything else separates),
 * lower-cased and without repeats. Stopwords are dropped beside other words: the index skips them.
 */
export function searchWords(text: string | undefined, minTokenSize = MIN_INDEXED_WORD_CHARS): SearchWords {
  const all = [...new Set((text ?? "").toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [])].slice(0, MAX_WORDS);
  const words = all.filter((w) => !INNODB_STOPWORDS.has(w));
  if (words.length === 0) return { indexed: [], short: [], stopwords: all };
  return {
    indexed: words.filter((w) => [...w].length >= minTokenSize),
    short: words.filter((w) => [...w].length < minTokenSize),
    stopwords: [],
  };
}

/** A PCRE pattern (MariaDB REGEXP) that finds the word whole, never inside a longer word. */
export function wholeWordPattern(word: string): string {
  return `(^|[^[:alnum:]])${word.replace(/[^\p{L}\p{N}]/gu, "")}($|[^[:alnum:]])`;
}

const LETTERS = "abcdefghijklmnopqrstuvwxyz";

/**
 * Each shop's words carry the shop in front ("qaaabhidle" for "idle" at shop 7), so the full-text index
 * holds one short list of cases per shop and word. A search then reads its own shop's matches only,
 * however many other shops use the same words, and can never rank or return another shop's case.
 * Letters only, fixed width, so no prefix and word can run together into another shop's term.
 */
export function shopTermPrefix(shopId: number): string {
  let n = Math.trunc(shopId);
  let code = "";
  for (let i = 0; i < 5; i++) {
    code = LETTERS[n % 26] + code;
    n = Math.floor(n / 26);
  }
  return `q${code}`;
}

/** The words of a text the index holds (every word but the stopwords), each with its shop's prefix, once each. */
export function shopIndexTerms(text: string, shopId: number): string {
  const prefix = shopTermPrefix(shopId);
  const words = new Set(
    (text.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? []).filter((w) => !INNODB_STOPWORDS.has(w)),
  );
  return [...words].map((w) => `${prefix}${w}`).join(" ");
}

/** A search's indexed words as the shop's terms, for MATCH … AGAINST in natural-language mode. */
export function shopQueryTerms(words: readonly string[], shopId: number): string {
  const prefix = shopTermPrefix(shopId);
  return words.map((w) => `${prefix}${w}`).join(" ");
}

/**
 * A search with short words, for MATCH … AGAINST in boolean mode: every short word is required, and so is
 * at least one of the other words ("+qaaaahac +(qaaaahlight qaaaahflashes)"). Terms are letters and
 * digits only, so no boolean operator can come from what was typed.
 */
export function shopBooleanTerms(
  { indexed, short }: Pick<SearchWords, "indexed" | "short">,
  shopId: number,
): string {
  const prefix = shopTermPrefix(shopId);
  const required = short.map((w) => `+${prefix}${w}`);
  if (indexed.length > 0) required.push(`+(${indexed.map((w) => `${prefix}${w}`).join(" ")})`);
  return required.join(" ");
}
