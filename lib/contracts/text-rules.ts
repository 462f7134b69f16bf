// The rules for text that arrives from outside, without any schema library: lib/contracts/text.ts
// builds the full zod helpers on them, and lib/contracts/text-mini.ts the zod/mini ones the
// interview's screen carries, so both refuse the same text with the same message.

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

export type TextLines = "single" | "multi";

/** Every string must be well-formed Unicode; used by the JSON body reader for values no schema names. */
export function isWellFormedText(text: string): boolean {
  return !LONE_SURROGATE.test(text);
}

/** The first problem with a piece of text, or null when it may be stored. */
export function textProblem(text: string, lines: TextLines): string | null {
  if (!isWellFormedText(text)) return TEXT_MESSAGES.illFormed;
  if (BIDI_CONTROL.test(text)) return TEXT_MESSAGES.bidi;
  if (lines === "multi") return CONTROL_MULTI_LINE.test(text) ? TEXT_MESSAGES.control : null;
  if (/[\t\n\r\u2028\u2029]/u.test(text)) return TEXT_MESSAGES.singleLine;
  return CONTROL_SINGLE_LINE.test(text) ? TEXT_MESSAGES.control : null;
}

/** Where a refinement reports a problem: zod's refinement context, full or mini build. */
interface IssueSink {
  addIssue(issue: { code: "custom"; message: string }): void;
}

/** The refinement both builds run on a string: one custom issue carrying textProblem's message. */
export function textRefinement(lines: TextLines) {
  return (text: string, ctx: IssueSink) => {
    const problem = textProblem(text, lines);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  };
}
