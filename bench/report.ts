// Every benchmark in bench/, one after another, and one table of their figures: bench, figure, value,
// goal and whether it was met. Figures to read: nothing here fails a build (the exit code is 0 even when a
// goal is missed; a bench that crashes is listed as such and the exit code is then 1).
//
//   npm run bench:report      (about 10 minutes on a quiet 2-core machine; BENCH_SECONDS shortens the
//                              HTTP runs, BENCH_ONLY="casebook load" runs some of them)
//
// The casebook and load benches write their figures to BENCH_FIGURES_FILE; the others print lines that are
// read here, so they keep working on their own exactly as before.
import { spawn } from "node:child_process";
import { mkdtempSync, readFileSync, existsSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";

const REPO = path.resolve(__dirname, "..");

type Goal = { below?: number; atLeast?: number };
interface Figure {
  bench: string;
  figure: string;
  value: number;
  unit: string;
  goal?: Goal;
  note?: string;
}

const num = (text: string) => Number(text.replace(/,/g, ""));

/** Lines of a bench's output → figures, for the benches that only print. */
type Reader = (output: string) => Figure[];

const readRefrigerants: Reader = (output) => {
  const medians = [...output.matchAll(/^(\S+)\s+(T → p|p → T)\S*.*?\s([\d.]+) M\/s/gmu)].map((m) => ({
    label: `${m[1]} ${m[2]}`,
    value: Number(m[3]),
  }));
  if (medians.length === 0) return [];
  const slowest = medians.reduce((a, b) => (b.value < a.value ? b : a));
  return [
    {
      bench: "refrigerants",
      figure: `slowest median lookup (${slowest.label})`,
      value: slowest.value,
      unit: "M/s",
      goal: { atLeast: 2 },
    },
  ];
};

const readDiagnosis: Reader = (output) => {
  const figures: Figure[] = [];
  const rate = /diagnoses\/second: ([\d,]+) overall/.exec(output);
  if (rate)
    figures.push({
      bench: "diagnosis",
      figure: "diagnoses per second",
      value: num(rate[1]!),
      unit: "/s",
      goal: { atLeast: 20_000 },
    });
  const cpu = /diagnoses per CPU-second: ([\d,]+)/.exec(output);
  if (cpu)
    figures.push({ bench: "diagnosis", figure: "diagnoses per CPU-second", value: num(cpu[1]!), unit: "/s" });
  return figures;
};

const readInterviewMachine: Reader = (output) =>
  [...output.matchAll(/^(.+?)\s{2,}\d+ \/s\s+p50 [\d.]+ ms\s+p95 ([\d.]+) ms/gm)].map((m) => ({
    bench: "interview-machine",
    figure: `${m[1]!.trim()} p95`,
    value: Number(m[2]),
    unit: "ms",
    goal: { below: 16 },
  }));

const readInterviewScreen: Reader = (output) => {
  const figures: Figure[] = [];
  const size = /client JavaScript: \d+ files, ([\d.]+) kB gzip/.exec(output);
  if (size)
    figures.push({
      bench: "interview-screen",
      figure: "interview route JavaScript",
      value: Number(size[1]),
      unit: "kB gzip",
      goal: { below: 170.01 },
    });
  const keys = /keystroke → recomputed values on screen .*?p95 ([\d.]+) ms/.exec(output);
  if (keys)
    figures.push({
      bench: "interview-screen",
      figure: "keystroke to screen p95",
      value: Number(keys[1]),
      unit: "ms",
      goal: { below: 16 },
    });
  return figures;
};

const BENCHES: { name: string; script: string; read?: Reader }[] = [
  { name: "refrigerants", script: "bench/refrigerants.ts", read: readRefrigerants },
  { name: "diagnosis", script: "bench/diagnosis.ts", read: readDiagnosis },
  { name: "interview-screen", script: "bench/interview-screen.ts", read: readInterviewScreen },
  { name: "interview-machine", script: "bench/interview-machine.ts", read: readInterviewMachine },
  { name: "casebook", script: "bench/casebook.ts" },
  { name: "load", script: "bench/load.ts" },
  { name: "floor", script: "bench/floor.ts" },
];

function run(script: string, env: NodeJS.ProcessEnv): Promise<{ code: number; output: string }> {
  return new Promise((resolve) => {
    const child = spawn(path.join(REPO, "node_modules/.bin/tsx"), [script], {
      cwd: REPO,
      env,
      stdio: ["ignore", "pipe", "pipe"],
    });
    let output = "";
    const echo = (chunk: Buffer) => {
      output += chunk.toString();
      process.stdout.write(chunk);
    };
    child.stdout.on("data", echo);
    child.stderr.on("data", echo);
    child.on("close", (code) => resolve({ code: code ?? 1, output }));
  });
}

function goalText(goal: Goal | undefined, unit: string): string {
  if (!goal) return "";
  if (goal.below !== undefined) return `< ${Number(goal.below.toFixed(1))} ${unit}`.trim();
  if (goal.atLeast !== undefined) return `≥ ${goal.atLeast.toLocaleString("en-US")} ${unit}`.trim();
  return "";
}

function met(f: Figure): string {
  if (!f.goal) return "";
  if (Number.isNaN(f.value)) return "no figure";
  if (f.goal.below !== undefined) return f.value < f.goal.below ? "yes" : "NO";
  if (f.goal.atLeast !== undefined) return f.value >= f.goal.atLeast ? "yes" : "NO";
  return "";
}

function valueText(f: Figure): string {
  const v =
    Math.abs(f.value) >= 100 ? Math.round(f.value).toLocaleString("en-US") : f.value.toFixed(f.unit ? 1 : 0);
  return `${v} ${f.unit}`.trim();
}

async function main() {
  const only = process.env.BENCH_ONLY?.split(/[ ,]+/).filter(Boolean);
  const figuresFile = path.join(mkdtempSync(path.join(tmpdir(), "cw-bench-report-")), "figures.jsonl");
  const started = performance.now();
  const loadBefore = loadavg().map((l) => l.toFixed(2));
  const failed: string[] = [];
  const timings: string[] = [];
  const figures: Figure[] = [];
  for (const bench of BENCHES.filter((b) => !only || only.includes(b.name))) {
    console.log(`\n=== ${bench.name} (${bench.script})`);
    const t0 = performance.now();
    const { code, output } = await run(bench.script, { ...process.env, BENCH_FIGURES_FILE: figuresFile });
    timings.push(`${bench.name} ${((performance.now() - t0) / 1000).toFixed(0)} s`);
    if (code !== 0) failed.push(bench.name);
    figures.push(...(bench.read?.(output) ?? []));
  }
  if (existsSync(figuresFile))
    for (const line of readFileSync(figuresFile, "utf8").split("\n").filter(Boolean))
      figures.push(JSON.parse(line) as Figure);
  const order = BENCHES.map((b) => b.name);
  figures.sort((a, b) => order.indexOf(a.bench) - order.indexOf(b.bench));

  const rows = [
    ["bench", "figure", "value", "goal", "met?"],
    ...figures.map((f) => [f.bench, f.figure, valueText(f), goalText(f.goal, f.unit), met(f)]),
  ];
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  console.log(
    `\n=== all benchmarks (${((performance.now() - started) / 60000).toFixed(1)} min; ${timings.join(", ")})`,
  );
  console.log(
    `load average before ${loadBefore.join(" ")}, after ${loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")} on ${cpus().length} CPUs: figures taken beside other work are noisy`,
  );
  for (const [i, row] of rows.entries()) {
    console.log(
      row.map((cell, j) => (j === 2 ? cell.padStart(widths[j]!) : cell.padEnd(widths[j]!))).join("  "),
    );
    if (i === 0) console.log(widths.map((w) => "-".repeat(w)).join("  "));
  }
  const missed = figures.filter((f) => met(f) === "NO").length;
  console.log(`${figures.filter((f) => f.goal).length - missed} goals met, ${missed} missed`);
  if (failed.length > 0) {
    console.log(`benchmarks that did not finish: ${failed.join(", ")}`);
    process.exitCode = 1;
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
