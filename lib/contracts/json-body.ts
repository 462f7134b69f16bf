import { z } from "zod";
import { isWellFormedText, TEXT_MESSAGES } from "./text";

// Limits every JSON body meets before any schema or recursive code sees it. The deepest body the
// product sends (an interview save: record → answers → group → a list → a reading) is 6 levels; the
// database's JSON columns refuse more than 32, and recursive code overflows the stack long before
// a body's size limit is reached, so depth is counted on the raw text, without recursion.

export const MAX_JSON_DEPTH = 16;

/** How deeply the raw JSON text nests, counted without parsing; stops counting past `limit`. */
export function jsonDepth(text: string, limit = Number.POSITIVE_INFINITY): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c /* \ */) i += 1;
      else if (c === 0x22 /* " */) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x7b /* { */ || c === 0x5b /* [ */) {
      depth += 1;
      if (depth > deepest) deepest = depth;
      if (deepest > limit) return deepest;
    } else if (c === 0x7d /* } */ || c === 0x5d /* ] */) depth -= 1;
  }
  return deepest;
}

/** How deeply a parsed value nests (a scalar is 0), without recursion; stops counting past `limit`. */
export function valueDepth(value: unknown, limit = Number.POSITIVE_INFINITY): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length > 0) {
    const [item, depth] = stack.pop()!;
    if (item === null || typeof item !== "object") continue;
    const here = depth + 1;
    if (here > deepest) deepest = here;
    if (deepest > limit) return deepest;
    for (const child of Object.values(item)) stack.push([child, here]);
  }
  return deepest;
}

/** The path ("answers.complaint.notes") of the first key or string that is not well-formed Unicode. */
export function illFormedTextPath(value: unknown): string | null {
  const stack: [unknown, string][] = [[value, ""]];
  while (stack.length > 0) {
    const [item, path] = stack.pop()!;
    if (typeof item === "string") {
      if (!isWellFormedText(item)) return path || "_";
      continue;
    }
    if (item === null || typeof item !== "object") continue;
    for (const [key, child] of Object.entries(item)) {
      const childPath = path ? `${path}.${key}` : key;
      if (!isWellFormedText(key)) return path || "_";
      stack.push([child, childPath]);
    }
  }
  return null;
}

export const JSON_BODY_MESSAGES = {
  tooDeep: `The request nests values more than ${MAX_JSON_DEPTH} levels deep; nothing was saved.`,
  illFormed: TEXT_MESSAGES.illFormed,
} as const;

/**
 * A free-form JSON value kept as it was typed (an interview draft): bounded in depth and size so a
 * buggy or hostile client cannot fill a row or nest past what the database and the screens handle.
 */
export function boundedJson({ maxDepth, maxChars }: { maxDepth: number; maxChars: number }) {
  return z.unknown().superRefine((value, ctx) => {
    if (valueDepth(value, maxDepth) > maxDepth) {
      ctx.addIssue({ code: "custom", message: `Nested more than ${maxDepth} levels deep.` });
      return;
    }
    if ((JSON.stringify(value) ?? "").length > maxChars) {
      ctx.addIssue({ code: "custom", message: `Larger than ${maxChars} characters.` });
    }
  });
}
