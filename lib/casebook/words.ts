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
export function searchWords(text: string | undefined, minTokenSize: number): SearchWords {
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
