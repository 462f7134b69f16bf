/*
 * "a" or "an" goes by how the next word is spoken, not how it is spelled: refrigerant names are said
 * letter first ("an R-134a system", spoken "ar"), and numbers by their words ("an 800 g target",
 * "an 18 °C day", "a 1,200 g target").
 */

/** "an" before a refrigerant name (R-…), a number spoken with a vowel sound, or a vowel; else "a". */
export function indefiniteArticle(next: string): "a" | "an" {
  const text = next.trim();
  // R-134a, R-1234yf, R-12, R-744: the letter R is spoken "ar".
  if (/^R-?\d/.test(text)) return "an";
  const digits = /^(\d[\d,]*)/.exec(text)?.[1];
  if (digits !== undefined) {
    if (digits.startsWith("8")) return "an";
    // 11 and 18 lead with a vowel ("eleven", "eighteen"), alone or as the thousands: 11,000, 18,500.
    const leading = digits.split(",")[0]!;
    const whole = digits.replace(/,/g, "");
    const thousands = digits.includes(",") ? leading : whole.length % 3 === 2 ? whole.slice(0, 2) : "";
    return thousands === "11" || thousands === "18" ? "an" : "a";
  }
  return /^[aeio]/i.test(text) ? "an" : "a";
}

/** The word with its article: withArticle("R-134a") is "an R-134a". */
export function withArticle(next: string): string {
  return `${indefiniteArticle(next)} ${next}`;
}
