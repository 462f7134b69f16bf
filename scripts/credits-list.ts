import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { CreditedPackage, CreditsFile } from "@/lib/credits/packages";

interface PackageJson {
  name?: string;
  version?: string;
  license?: string | { type?: string };
  licenses?: { type?: string }[];
  author?: string | { name?: string };
  dependencies?: Record<string, string>;
}

interface LockEntry {
  version?: string;
  license?: string;
  dependencies?: Record<string, string>;
  optionalDependencies?: Record<string, string>;
  peerDependencies?: Record<string, string>;
  peerDependenciesMeta?: Record<string, { optional?: boolean }>;
}

type LockPackages = Record<string, LockEntry>;

/** Node's lookup: the nearest node_modules/<name> from the requiring package's folder up to the root. */
function resolveInLock(packages: LockPackages, fromPath: string, name: string): string | null {
  let base = fromPath;
  for (;;) {
    const candidate = base ? `${base}/node_modules/${name}` : `node_modules/${name}`;
    if (packages[candidate]) return candidate;
    if (!base) return null;
    const parent = base.lastIndexOf("/node_modules/");
    base = parent === -1 ? "" : base.slice(0, parent);
  }
}

/**
 * Every package the runtime dependencies need, following dependencies, optional dependencies and
 * required peers (optional peers such as a test runner are not installed for the app); a package is
 * optional when only optional edges reach it. Development tools never enter the walk.
 */
function runtimeClosure(packages: LockPackages, rootDependencies: string[]): Map<string, boolean> {
  const optionalByPath = new Map<string, boolean>();
  const queue: { from: string; name: string; optional: boolean }[] = rootDependencies.map((name) => ({
    from: "",
    name,
    optional: false,
  }));
  while (queue.length > 0) {
    const { from, name, optional } = queue.shift()!;
    const path = resolveInLock(packages, from, name);
    if (!path) continue; // an optional build for another platform that the lock file does not carry
    const seen = optionalByPath.get(path);
    if (seen !== undefined && (seen === false || optional)) continue;
    optionalByPath.set(path, optional);
    const entry = packages[path]!;
    const meta = entry.peerDependenciesMeta ?? {};
    for (const dep of Object.keys(entry.dependencies ?? {})) queue.push({ from: path, name: dep, optional });
    for (const dep of Object.keys(entry.optionalDependencies ?? {}))
      queue.push({ from: path, name: dep, optional: true });
    for (const dep of Object.keys(entry.peerDependencies ?? {}))
      if (!meta[dep]?.optional) queue.push({ from: path, name: dep, optional });
  }
  return optionalByPath;
}

function readJson<T>(path: string): T | null {
  try {
    return JSON.parse(readFileSync(path, "utf8")) as T;
  } catch {
    return null;
  }
}

/** A licence file that opens with a well-known licence's name ("MIT License"), for packages whose package.json names none. */
function licenceFromFile(dir: string): string {
  for (const file of ["LICENSE", "LICENSE.md", "LICENSE.txt", "LICENCE"]) {
    try {
      const first = readFileSync(join(dir, file), "utf8").trimStart().split("\n")[0]?.trim() ?? "";
      const match =
        first.match(/^(MIT|ISC|BSD-[23]-Clause|Apache-2\.0)\b/i) ?? first.match(/^The (MIT|ISC) License/i);
      if (match?.[1])
        return match[1].toUpperCase() === "MIT" || match[1].toUpperCase() === "ISC"
          ? match[1].toUpperCase()
          : match[1];
    } catch {
      // no such file
    }
  }
  return "";
}

function licenceOf(pkg: PackageJson | null, lock: LockEntry | undefined, dir = ""): string {
  const field = pkg?.license;
  if (typeof field === "string" && field.trim()) return field.trim();
  if (field && typeof field === "object" && field.type) return field.type;
  const legacy = (pkg?.licenses ?? []).map((l) => l.type).filter(Boolean);
  if (legacy.length > 0) return legacy.join(" OR ");
  return lock?.license?.trim() || (dir ? licenceFromFile(dir) : "");
}

/** "Jane Doe <e-mail> (web page)" → "Jane Doe"; an author given only as a web address gives nothing. */
export function authorName(author: PackageJson["author"]): string | undefined {
  const raw = typeof author === "string" ? author : author?.name;
  if (!raw) return undefined;
  const name = raw
    .replace(/<[^>]*>/g, "")
    .replace(/\([^)]*\)/g, "")
    .replace(/\b[a-z][a-z0-9+.-]*:\/\/\S*/gi, "")
    .replace(/\s+/g, " ")
    .trim();
  return name || undefined;
}

const byNameThenVersion = (a: CreditedPackage, b: CreditedPackage) =>
  a.name.localeCompare(b.name, "en") || a.version.localeCompare(b.version, "en", { numeric: true });

/** Reads package.json, package-lock.json and each installed package's package.json under rootDir. */
export function buildCredits(rootDir: string): CreditsFile {
  const own = readJson<PackageJson>(join(rootDir, "package.json"));
  const lock = readJson<{ packages?: LockPackages }>(join(rootDir, "package-lock.json"));
  if (!own || !lock?.packages) throw new Error("package.json and package-lock.json are needed");
  const directNames = Object.keys(own.dependencies ?? {});
  const direct: CreditedPackage[] = [];
  const included = new Map<string, CreditedPackage>();

  for (const [path, optional] of runtimeClosure(lock.packages, directNames)) {
    const entry = lock.packages[path]!;
    const name = path.slice(path.lastIndexOf("node_modules/") + "node_modules/".length);
    const pkg = readJson<PackageJson>(join(rootDir, path, "package.json"));
    const credited: CreditedPackage = {
      name,
      version: pkg?.version ?? entry.version ?? "",
      licence: licenceOf(pkg, entry, join(rootDir, path)),
    };
    const author = authorName(pkg?.author);
    if (author) credited.author = author;
    if (optional) credited.optional = true;
    // The top-level copy is the one package.json asked for; nested copies are other versions.
    if (path === `node_modules/${name}` && directNames.includes(name)) direct.push(credited);
    else included.set(`${name}@${credited.version}`, credited);
  }
  return {
    note: "Generated by scripts/credits.ts (npm run data:credits) from package.json, package-lock.json and each package's own package.json. Do not edit by hand.",
    direct: direct.sort(byNameThenVersion),
    included: [...included.values()].sort(byNameThenVersion),
  };
}
