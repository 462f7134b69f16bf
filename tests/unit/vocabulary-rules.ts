import { readdirSync, readFileSync, statSync } from "node:fs";
import { extname, join, relative, sep } from "node:path";
import { CAUTION_IDS } from "@/lib/cautions/catalog";
import { CASE_STATUSES } from "@/lib/cases/statuses";
import { REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";

/*
 * Each shared list and threshold has one home. A rule says what a second definition looks like in the
 * source; the tree is searched for it everywhere except the rule's home. Tests are not searched: they
 * name the values they check on purpose, apart from the code under test. Landed migrations are history
 * and are never edited, so they are not searched either.
 */

export interface VocabularyRule {
  id: string;
  /** what has one home */
  what: string;
  /** the module that owns it (repository-relative) */
  homes: readonly string[];
  patterns: readonly RegExp[];
  /** files where a match is not a second definition, each with the reason */
  except?: Readonly<Record<string, string>>;
}

export interface VocabularyHit {
  rule: string;
  file: string;
  line: number;
  text: string;
}

const alternatives = (words: readonly string[]) =>
  words.map((w) => w.replace(/[.*+?^${}()|[\]\\-]/g, "\\$&")).join("|");
const REFRIGERANT = `(?:${alternatives(REFRIGERANT_IDS)})`;
const DEVICE = `(?:${alternatives(EXPANSION_DEVICE_IDS)})`;
const COMPRESSOR = `(?:${alternatives(COMPRESSOR_TYPES)})`;
const STATUS = `(?:${alternatives(CASE_STATUSES)})`;
const CAUTION = `(?:${alternatives(CAUTION_IDS)})`;
const quoted = (word: string) => `["'\`]${word}["'\`]`;
/** Two items of a list: a separator of an array, a union, an enum call, an `||` chain or a record. */
const NEXT_ITEM = String.raw`\s*(?:,|\||:\s*[^,{}\[\]\n]{1,40},|\|\|\s*[\w.?]+\s*===)\s*`;

export const VOCABULARY_RULES: readonly VocabularyRule[] = [
  {
    id: "refrigerant-list",
    what: "the refrigerant list, its labels and each refrigerant's gauge limit",
    homes: ["lib/refrigerants/catalog.ts", "lib/refrigerants/gauge-limits.ts"],
    patterns: [
      new RegExp(`${quoted(REFRIGERANT)}${NEXT_ITEM}${quoted(REFRIGERANT)}`),
      // The list written out as a choice: "R-134a, R-1234yf or R-744".
      new RegExp(`${REFRIGERANT}, ${REFRIGERANT}(?:, ${REFRIGERANT})* or ${REFRIGERANT}`),
    ],
  },
  {
    id: "expansion-device-list",
    what: "the expansion devices and the one way each is named",
    homes: ["lib/vehicles/expansion-devices.ts"],
    patterns: [
      new RegExp(`${quoted(DEVICE)}${NEXT_ITEM}${quoted(DEVICE)}`),
      // A label table: a device id with a name (a capitalised phrase without a full stop).
      new RegExp(`\\b${DEVICE}:\\s*"[A-Z][^".]{0,40}"`),
      /\b(?:TXV|orifice tube)\s*(?:\+|and|with)\s*(?:receiver-drier|accumulator)\b/i,
    ],
  },
  {
    id: "compressor-type-list",
    what: "the compressor types and the one way each is named",
    homes: ["lib/vehicles/compressor-types.ts"],
    patterns: [
      new RegExp(`${quoted(COMPRESSOR)}${NEXT_ITEM}${quoted(COMPRESSOR)}`),
      new RegExp(`\\b${COMPRESSOR}:\\s*"[A-Z][^".]{0,40}"`),
    ],
  },
  {
    id: "case-status-list",
    what: "the case statuses and their labels",
    homes: ["lib/cases/statuses.ts"],
    patterns: [
      new RegExp(`${quoted(STATUS)}(?:${NEXT_ITEM}${quoted(STATUS)}){2,}`),
      new RegExp(`\\b${STATUS}:\\s*"[A-Z][^".]{0,40}"`),
    ],
  },
  {
    id: "step-labels",
    what: "the interview steps' names",
    homes: ["lib/interview/steps.ts"],
    // The steps only the interview has; a name is a capitalised phrase without a full stop.
    patterns: [/\b(?:leakFinding|recoveryHeld|chargeAudit):\s*"[A-Z][^".]{0,40}"/],
  },
  {
    id: "purity-limit",
    what: "the identifier's purity pass mark",
    homes: ["lib/service/identifier.ts"],
    patterns: [/\b[A-Z_]*PURITY[A-Z_]*\s*=\s*\d/],
  },
  {
    id: "gauge-limits",
    what: "what a gauge can read: the full vacuum and the reading limit",
    homes: ["lib/refrigerants/gauge-limits.ts", "lib/units/barometric.ts"],
    patterns: [/=\s*-?101\.325\b/, /\b[A-Z_]*KPA[A-Z_]*\s*=\s*16_?000\b/, /\.max\(\s*16_?000\b/],
  },
  {
    id: "empty-system",
    what: "the empty-system test on a static reading",
    homes: ["lib/refrigerants/static-charge.ts"],
    patterns: [
      /\bconst\s+(?:[A-Z_]*EMPTY[A-Z_]*(?:KPA|GAUGE|STATIC|SATURATION)|[A-Z_]*STATIC[A-Z_]*EMPTY)[A-Z_]*\s*=/,
    ],
  },
  {
    id: "caution-catalogue",
    what: "the cautions: ids, levels, texts and sources",
    homes: ["lib/cautions/catalog.ts"],
    patterns: [
      // A caution defined outside the catalogue: a level beside it, or a catalogue id keyed to a text.
      /\b(?:level|severity):\s*"(?:danger|warning|notice)"/,
      new RegExp(`\\b${CAUTION}:\\s*(?:\\n\\s*)?"[A-Z]`),
      // Another spelling of a catalogue id.
      new RegExp(`["'\`](?:${CAUTION_IDS.map((id) => id.replace(/_/g, "-")).join("|")}|eyes_skin)["'\`]`),
      // The level written into the text instead of shown by its own mark.
      /["'`>]\s*(?:Caution|Danger|Warning|Note):/,
    ],
    except: {
      "lib/service/oil-type.ts":
        "the oil check's verdicts: texts built from the oil typed, with a level on the catalogue's scale",
    },
  },
  {
    id: "contaminated",
    what: "one word for a charge that failed identification: refrigerantContaminated, not mixed",
    homes: ["lib/service/identifier.ts"],
    patterns: [/\b(?:const|let)\s+mixed\b|\bmixed\??:\s*boolean\b|\.mixed\b/],
  },
];

/** Where the rules search: the code, not the tests, not the landed migrations. */
const SEARCHED_ROOTS = [
  "lib",
  "app",
  "components",
  "machines",
  "models",
  "scripts",
  "data",
  "bench",
  "proxy.ts",
];
const SOURCE = new Set([".ts", ".tsx", ".mjs"]);

function listSources(path: string, out: string[]): void {
  let stat;
  try {
    stat = statSync(path);
  } catch {
    return;
  }
  if (stat.isFile()) {
    const name = path.split(sep).at(-1) ?? "";
    if (SOURCE.has(extname(path)) && !/\.(test|spec)\.tsx?$/.test(name)) out.push(path);
    return;
  }
  for (const entry of readdirSync(path)) {
    if (entry.startsWith(".") || entry === "node_modules") continue;
    listSources(join(path, entry), out);
  }
}

function lineOf(text: string, index: number): number {
  let line = 1;
  for (let i = 0; i < index; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** Every match of the rules in one file's text, the file's homes excepted. */
export function searchText(file: string, text: string, rules = VOCABULARY_RULES): VocabularyHit[] {
  const hits: VocabularyHit[] = [];
  for (const rule of rules) {
    if (rule.homes.includes(file) || (rule.except && file in rule.except)) continue;
    for (const pattern of rule.patterns) {
      const global = new RegExp(
        pattern.source,
        pattern.flags.includes("g") ? pattern.flags : `${pattern.flags}g`,
      );
      for (const match of text.matchAll(global)) {
        hits.push({
          rule: rule.id,
          file,
          line: lineOf(text, match.index),
          text: match[0].replace(/\s+/g, " "),
        });
      }
    }
  }
  return hits;
}

/** Search the repository at `rootDir`; returns the files read and the hits. */
export function searchRepository(rootDir: string): { files: string[]; hits: VocabularyHit[] } {
  const paths: string[] = [];
  for (const root of SEARCHED_ROOTS) listSources(join(rootDir, root), paths);
  const files = paths.map((p) => relative(rootDir, p).split(sep).join("/")).sort();
  const hits = files.flatMap((file) => searchText(file, readFileSync(join(rootDir, file), "utf8")));
  return { files, hits };
}
