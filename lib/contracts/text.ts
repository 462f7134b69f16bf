import { z } from "zod";

// The shared rules for text and dates that arrive from outside: every text field and every date of
// every contract is built from these, so odd input is refused once, with a clear message, before it
// reaches the database (where a lone surrogate or year 0 would fail or be changed silently).

/** Half of a UTF-16 pair with no other half: not a character, and not storable as utf8mb4. */
const LONE_SURROGATE = /[\uD800-\uDFFF]/u;
/** Bidi embeddings, overrides and isolates: they make stored text read differently from what it is. */
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/u;
/** C0 and C1 controls (NUL included), DEL, and the Unicode line and paragraph separators. */
const CONTROL_SINGLE_LINE = /[\u0000-\u001F\u007F-\u009F\u2028\u2029]/u;
/** The same, less tab, line feed and carriage return, which multi-line text may hold. */
const CONTROL_MULTI_LINE = /[\u0000-\u0008\u000B-\u000C\u000E-\u001F\u007F-\u009F]/u;

export const TEXT_MESSAGES = {
  illFormed: "This text has a broken character in it (half of an emoji or symbol). Type it again.",
  bidi: "This text has an invisible direction-changing character in it. Type it again without it.",
  control: "This text has an invisible control character in it. Type it again without it.",
  singleLine: "Keep this to one line, without tabs.",
} as const;

/** Every string must be well-formed Unicode; used by the JSON body reader for values no schema names. */
export function isWellFormedText(text: string): boolean {
  return !LONE_SURROGATE.test(text);
}

/** The first problem with a piece of text, or null when it may be stored. */
export function textProblem(text: string, lines: "single" | "multi"): string | null {
  if (!isWellFormedText(text)) return TEXT_MESSAGES.illFormed;
  if (BIDI_CONTROL.test(text)) return TEXT_MESSAGES.bidi;
  if (lines === "multi") return CONTROL_MULTI_LINE.test(text) ? TEXT_MESSAGES.control : null;
  if (/[\t\n\r\u2028\u2029]/u.test(text)) return TEXT_MESSAGES.singleLine;
  return CONTROL_SINGLE_LINE.test(text) ? TEXT_MESSAGES.control : null;
}

function checked(lines: "single" | "multi", params?: { message?: string }) {
  return z.string(params).superRefine((text, ctx) => {
    const problem = textProblem(text, lines);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });
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
