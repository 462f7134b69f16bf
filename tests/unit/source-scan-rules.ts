import { readdirSync, readFileSync, statSync } from "node:fs";
import { extname, join, relative, sep } from "node:path";

/*
 * What the source scan looks for: web addresses and domain names outside the standards bodies and
 * government publishers a reviewer can check, the words that name study aids, course units and their
 * codes, periodicals and recordings, and quoted titles beside a citation. The word patterns are spelled
 * with a bracketed letter (`fla[s]h`) so that neither the scan nor a plain grep of the tree finds them in
 * this file itself.
 */

export type HitKind = "address" | "domain" | "word" | "quoted title";

export interface ScanHit {
  file: string;
  line: number;
  kind: HitKind;
  text: string;
}

/** Standards bodies and government publishers; their subdomains are allowed too. */
export const ALLOWED_DOMAINS = [
  "sae.org",
  "ashrae.org",
  "iso.org",
  "epa.gov",
  "ecfr.gov",
  "govinfo.gov",
  "nist.gov",
  "europa.eu",
  "w3.org",
  "ietf.org",
] as const;

/** RFC 2606 and RFC 6761 names kept for examples and tests. */
const RESERVED_DOMAINS = ["example.com", "example.org", "example.net"];
const RESERVED_TLDS = ["test", "example", "invalid", "localhost"];

/** Top-level domains a cited web site would use; lower case only, so `psychrolib.SI` is not a domain. */
// Words that are also common property names (`.at`, `.in`, `.dev`, `.app`, `.shop`, `.store`) are left out.
const TLDS = [
  ...["com", "net", "org", "edu", "gov", "info", "biz", "io", "co", "ai", "tv", "ly", "cc", "ws", "xyz"],
  ...["academy", "training", "us", "uk", "ca", "au", "nz", "de", "fr", "nl", "eu", "dk", "fi", "ch", "pl"],
  ...["jp", "za"],
  ...RESERVED_TLDS,
];

const WORDS: readonly RegExp[] = [
  /fla[s]h[ -]?cards?/i,
  /qui[z]let/i,
  /jeopard[y]/i,
  /\bqui[z](?:zes)?\b/i,
  /stud[y][ -](?:note|guide)s?/i,
  /\bless[o]ns?\b/i,
  // a series' unit code: one to three capitals, a hyphen, then two numbers split by a slash
  /\b[A-Z]{1,3}-\d{1,3}\/\d{1,3}\b/,
  /\bmagazin[e]s?\b/i,
  /trade pres[s]/i,
  /trainin[g] (?:manual|handout|series|course|channel|video|material)s?\b/i,
  /you[t]ube|webina[r]s?|podcas[t]s?|transcrip[t]s?/i,
];

/** A line that cites something: a source or basis field, a Source line, a test title, a trade label. */
const CITATION_CONTEXT =
  /\b(?:sources?|basis|cites?|cited|citation)\b|\bSource:|\b(?:it|test|describe)(?:\.each\(.*\))?\(\s*["'`]|common practice|from memory/i;
/** A value Prettier moved to the next line: `source:` or `const X =` at the end of the line above. */
const WRAPPED_VALUE = /[:=(]\s*$/;

/** 'Two or more words', ‘Two words’, “Two words” or \"Two words\", opening on a capital letter. */
const QUOTED_TITLE = [
  /(?<![\p{L}\p{N}])'(\p{Lu}[^'"\n]*?\s[^'"\n]*?)'(?![\p{L}\p{N}])/gu,
  /‘(\p{Lu}[^’\n]*?\s[^’\n]*?)’/gu,
  /“(\p{Lu}[^”\n]*?\s[^”\n]*?)”/gu,
  /\\"(\p{Lu}[^"\\\n]*?\s[^"\\\n]*?)\\"/gu,
];

const URL = /\b[a-z][a-z0-9+.-]*:\/\/(?:[^\s/?#@"'`<>]*@)?(\[[^\]\s]*\]|[^\s/?#:"'`<>()[\]{},;\\]*)/gi;
const DOMAIN = new RegExp(
  String.raw`(?<![\w.-])((?:[A-Za-z0-9](?:[A-Za-z0-9-]*[A-Za-z0-9])?\.)+(?:${TLDS.join("|")}))(?![\w(-]|\.[A-Za-z0-9])`,
  "g",
);

function isLoopback(host: string): boolean {
  return host === "localhost" || host === "[::1]" || host === "0.0.0.0" || /^127(?:\.\d{1,3}){3}$/.test(host);
}

/** Is this host name (or an address's host) one a reviewer may find in the tree? */
export function hostAllowed(rawHost: string): boolean {
  const host = rawHost.toLowerCase().replace(/\.$/, "");
  if (isLoopback(host)) return true;
  const tld = host.split(".").at(-1) ?? "";
  if (RESERVED_TLDS.includes(tld)) return true;
  return [...ALLOWED_DOMAINS, ...RESERVED_DOMAINS].some((d) => host === d || host.endsWith(`.${d}`));
}

/** Every finding in one file's text. */
export function scanText(file: string, text: string): ScanHit[] {
  const hits: ScanHit[] = [];
  const lines = text.split("\n");
  lines.forEach((raw, index) => {
    const line = index + 1;
    let rest = raw;
    for (const match of raw.matchAll(URL)) {
      const host = match[1] ?? "";
      // An address whose host is filled in at run time (`http://${host}`) names no site.
      if (host !== "" && !/^[$%{<]/.test(host) && !hostAllowed(host))
        hits.push({ file, line, kind: "address", text: match[0] });
      rest = rest.replace(match[0], " ".repeat(match[0].length));
    }
    for (const match of rest.matchAll(DOMAIN)) {
      const domain = match[1] ?? "";
      if (!hostAllowed(domain)) hits.push({ file, line, kind: "domain", text: domain });
    }
    for (const pattern of WORDS) {
      const found = raw.match(pattern);
      if (found) hits.push({ file, line, kind: "word", text: found[0] });
    }
    const above = index > 0 ? lines[index - 1]! : "";
    const context = CITATION_CONTEXT.test(raw) || (WRAPPED_VALUE.test(above) && CITATION_CONTEXT.test(above));
    if (context) {
      for (const pattern of QUOTED_TITLE) {
        for (const match of raw.matchAll(pattern))
          hits.push({ file, line, kind: "quoted title", text: match[0] });
      }
    }
  });
  return hits;
}

/** The folders and files the scan reads, relative to the repository root. */
export const SCANNED_ROOTS = [
  "lib",
  "app",
  "components",
  "data",
  "tests",
  "machines",
  "models",
  "migrations",
  "scripts",
  "bench",
  "public",
  "README.md",
  "DEVELOPERS.md",
] as const;

const TEXT_EXTENSIONS = new Set(
  [".ts", ".tsx", ".js", ".mjs", ".cjs", ".json", ".md", ".mdx", ".sh", ".css", ".svg", ".txt"].concat([
    ".csv",
    ".sql",
    ".yml",
    ".yaml",
    ".html",
    ".webmanifest",
  ]),
);

function listTextFiles(path: string, out: string[]): void {
  let stat;
  try {
    stat = statSync(path);
  } catch {
    return; // a root the repository does not have (yet)
  }
  if (stat.isFile()) {
    if (TEXT_EXTENSIONS.has(extname(path))) out.push(path);
    return;
  }
  for (const entry of readdirSync(path)) {
    // Hidden folders hold tool output (browser sign-in states), never authored text.
    if (entry.startsWith(".") || entry === "node_modules") continue;
    listTextFiles(join(path, entry), out);
  }
}

/** Scan the repository at `rootDir`; returns the files read and what was found in them. */
export function scanRepository(rootDir: string): { files: string[]; hits: ScanHit[] } {
  const paths: string[] = [];
  for (const root of SCANNED_ROOTS) listTextFiles(join(rootDir, root), paths);
  const files = paths.map((p) => relative(rootDir, p).split(sep).join("/")).sort();
  const hits = files.flatMap((file) => scanText(file, readFileSync(join(rootDir, file), "utf8")));
  return { files, hits };
}
