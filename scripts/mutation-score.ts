// Prints the mutation score per area from Stryker's JSON report (npm run test:mutation runs it after
// Stryker) and fails when the whole, or lib/diagnosis, is under the goal of issue 16.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";

export const MUTATION_AREAS = [
  "lib/diagnosis",
  "lib/refrigerants",
  "lib/service",
  "lib/units",
  "machines",
] as const;
export const MUTATION_GOAL_PCT = 90;

type Status = "Killed" | "Timeout" | "Survived" | "NoCoverage" | "CompileError" | "RuntimeError" | "Ignored";
interface Report {
  files: Record<string, { mutants: { status: Status }[] }>;
}
export interface AreaScore {
  area: string;
  /** source files of the area with results in the report (a partial run shows fewer than the area has) */
  files: number;
  killed: number;
  timeout: number;
  survived: number;
  noCoverage: number;
  ignored: number;
  /** killed and timed-out over every valid mutant (Stryker's own definition); null with no mutants */
  scorePct: number | null;
}

export function scoreAreas(report: Report, areas: readonly string[] = MUTATION_AREAS): AreaScore[] {
  const tally = (area: string, inArea: (file: string) => boolean): AreaScore => {
    const s: AreaScore = {
      area,
      files: 0,
      killed: 0,
      timeout: 0,
      survived: 0,
      noCoverage: 0,
      ignored: 0,
      scorePct: null,
    };
    for (const [file, { mutants }] of Object.entries(report.files)) {
      if (!inArea(file)) continue;
      s.files++;
      for (const { status } of mutants) {
        if (status === "Killed") s.killed++;
        else if (status === "Timeout") s.timeout++;
        else if (status === "Survived") s.survived++;
        else if (status === "NoCoverage") s.noCoverage++;
        else if (status === "Ignored") s.ignored++;
      }
    }
    const valid = s.killed + s.timeout + s.survived + s.noCoverage;
    s.scorePct = valid === 0 ? null : (100 * (s.killed + s.timeout)) / valid;
    return s;
  };
  const under = (area: string) => (file: string) => file.replace(/\\/g, "/").startsWith(`${area}/`);
  return [...areas.map((a) => tally(a, under(a))), tally("overall", () => true)];
}

export function formatScores(scores: readonly AreaScore[]): string {
  const head = ["area", "score %", "files", "killed", "timeout", "survived", "no coverage", "ignored"];
  const rows = scores.map((s) => [
    s.area,
    s.scorePct === null ? "–" : s.scorePct.toFixed(1),
    ...[s.files, s.killed, s.timeout, s.survived, s.noCoverage, s.ignored].map(String),
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  return [line(head), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n");
}

/** The areas held to the goal: the whole run and the findings engine. */
export function belowGoal(scores: readonly AreaScore[]): AreaScore[] {
  return scores.filter(
    (s) => (s.area === "overall" || s.area === "lib/diagnosis") && (s.scorePct ?? 0) < MUTATION_GOAL_PCT,
  );
}

if (process.argv[1]?.endsWith("mutation-score.ts")) {
  // By default every area's last report (reports/mutation/<area>.json, written by scripts/mutation.sh), oldest
  // first, merged file by file so the newest result for a file wins; or the reports given as arguments.
  const paths = process.argv.slice(2);
  if (paths.length === 0) {
    const dir = join(process.cwd(), "reports", "mutation");
    if (existsSync(dir))
      paths.push(
        ...readdirSync(dir)
          .filter((name) => name.endsWith(".json"))
          .map((name) => join(dir, name))
          .sort((a, b) => statSync(a).mtimeMs - statSync(b).mtimeMs),
      );
  }
  if (paths.length === 0) {
    console.error("No mutation report under reports/mutation: run `npm run test:mutation` first.");
    process.exit(1);
  }
  const merged: Report = { files: {} };
  for (const path of paths)
    Object.assign(merged.files, (JSON.parse(readFileSync(path, "utf8")) as Report).files);
  const scores = scoreAreas(merged);
  console.log(`Mutation score per area (${paths.join(", ")})\n`);
  console.log(formatScores(scores));
  const short = belowGoal(scores);
  if (short.length > 0) {
    console.error(`\nBelow the ${MUTATION_GOAL_PCT} % goal: ${short.map((s) => s.area).join(", ")}`);
    process.exitCode = 1;
  }
}
