import { GRADING } from "./grading";
import { CAUSE_PRIORS, LIKELIHOOD_TABLE, RANKING_GATES } from "./likelihood-table";

/** Bump by hand when the engine's code changes how it reads evidence; table and threshold edits change the hash by themselves. */
export const ENGINE_SEMVER = "2.0.0";

/** Key-sorted JSON, so the hash depends on content, not on the order keys were written in. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value !== null && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value);
}

/** 32-bit FNV-1a over UTF-16 code units, as 8 hex digits: small, pure and the same in browser and server. */
export function fnv1a32(text: string): string {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash.toString(16).padStart(8, "0");
}

export function scoringTableHash(table: {
  priors: unknown;
  rows: unknown;
  gates: unknown;
  grading: unknown;
}): string {
  return fnv1a32(canonicalJson(table));
}

export const ENGINE_VERSION = `${ENGINE_SEMVER}+${scoringTableHash({ priors: CAUSE_PRIORS, rows: LIKELIHOOD_TABLE, gates: RANKING_GATES, grading: GRADING })}`;
