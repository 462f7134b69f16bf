import { z } from "zod";
import { textRefinement, type TextLines } from "./text-rules";

// The shared rules for text and dates that arrive from outside: every text field and every date of
// every contract is built from these, so odd input is refused once, with a clear message, before it
// reaches the database (where a lone surrogate or year 0 would fail or be changed silently). The text
// rules themselves live in text-rules.ts, which the interview's zod/mini schemas share.

export { isWellFormedText, TEXT_MESSAGES, textProblem } from "./text-rules";

function checked(lines: TextLines, params?: { message?: string }) {
  return z.string(params).superRefine(textRefinement(lines));
}

/** A name, label, model or search: one line of well-formed text with no control or bidi characters. */
export function singleLineText(params?: { message?: string }) {
  return checked("single", params);
}

/** A complaint, note or comment: may hold tabs and line breaks, nothing else invisible. */
export function multiLineText(params?: { message?: string }) {
  return checked("multi", params);
}

/**
 * The range a date the shop types or a device reports can fall in: nothing before 1990 (no record
 * this product keeps is older) and nothing more than a day ahead of the server's clock (a phone's
 * clock and time zone may be a little off). Year 0 and year 9999 are typing slips, not dates.
 */
export const PLAUSIBLE_DATE_FROM = "1990-01-01T00:00:00Z";
export const PLAUSIBLE_DATE_AHEAD_MS = 24 * 60 * 60 * 1000;

export function isPlausibleInstant(iso: string, nowMs = Date.now()): boolean {
  const ms = Date.parse(iso);
  return (
    Number.isFinite(ms) && ms >= Date.parse(PLAUSIBLE_DATE_FROM) && ms <= nowMs + PLAUSIBLE_DATE_AHEAD_MS
  );
}

/** An ISO 8601 date and time with its offset, within the plausible range. */
export function plausibleInstant(message = "Give a date and time.") {
  return z.iso
    .datetime({ offset: true, message })
    .refine(
      (iso) => isPlausibleInstant(iso),
      `Give a date from ${PLAUSIBLE_DATE_FROM.slice(0, 4)} up to today; check the year.`,
    );
}
