import { z } from "zod/mini";
import { textRefinement, type TextLines } from "./text-rules";
import { ensureEnglishMessages } from "./zod-mini-messages";

// The text helpers of text.ts built with zod's mini build, for schemas that run in the browser
// (the interview's answers): the same rules and messages at a fraction of the full build's weight.

ensureEnglishMessages();

function checked(lines: TextLines, params?: { message?: string }) {
  return z.string(params).check(z.superRefine(textRefinement(lines)));
}

/** A name, label, model or search: one line of well-formed text with no control or bidi characters. */
export function singleLineText(params?: { message?: string }) {
  return checked("single", params);
}

/** A complaint, note or comment: may hold tabs and line breaks, nothing else invisible. */
export function multiLineText(params?: { message?: string }) {
  return checked("multi", params);
}
