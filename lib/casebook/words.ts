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
 * Words shorter than this are not put in the index, as MariaDB would skip them at its
 * innodb_ft_min_token_size (3 on the server scripts/db.sh starts; an integration test checks it), and
 * are found with a whole-word pattern instead.
 */
export const MIN_INDEXED_WORD_CHARS = 3;

export interface SearchWords {
  /** Words the index holds: matched in natural-language mode, ranked by relevance. */
  indexed: string[];
  /** Words shorter than the index's minimum (such as "ac"): each must appear as a whole word. */
  short: string[];
}

const MAX_WORDS = 12;

/**
 * Splits a search into words the way InnoDB's parser does (letters and digits; anything else separates),
 * lower-cased and without repeats. Stopwords are dropped beside other words: the index skips them.
 */
export function searchWords(text: string | undefined, minTokenSize = MIN_INDEXED_WORD_CHARS): SearchWords {
  const all = [...new Set((text ?? "").toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [])].slice(0, MAX_WORDS);
  const words = all.filter((w) => !INNODB_STOPWORDS.has(w));
  // Only stopwords ("on", "at"): the index cannot help, so look for them whole in the text.
  if (words.length === 0) return { indexed: [], short: all };
  return {
    indexed: words.filter((w) => [...w].length >= minTokenSize),
    short: words.filter((w) => [...w].length < minTokenSize),
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

/** The words of a text the index holds, each with its shop's prefix, once each. */
export function shopIndexTerms(text: string, shopId: number): string {
  const prefix = shopTermPrefix(shopId);
  const words = new Set(
    (text.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? []).filter(
      (w) => [...w].length >= MIN_INDEXED_WORD_CHARS && !INNODB_STOPWORDS.has(w),
    ),
  );
  return [...words].map((w) => `${prefix}${w}`).join(" ");
}

/** A search's indexed words as the shop's terms, for MATCH … AGAINST in natural-language mode. */
export function shopQueryTerms(words: readonly string[], shopId: number): string {
  const prefix = shopTermPrefix(shopId);
  return words.map((w) => `${prefix}${w}`).join(" ");
}
