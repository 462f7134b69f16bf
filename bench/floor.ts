// The floor under the speed goals: what this machine and the framework give before any work of ours.
// Figures to read: nothing here passes or fails. Needs a production build (`npx next build`); starts its
// own throwaway database and server (scripts/e2e-server.sh on E2E_PORT, default 3100) unless BENCH_URL
// points at a running one.
//
//   npm run bench:floor     (BENCH_CONNECTIONS=50, BENCH_SECONDS=15 per target)
//
// 1. The same closed-loop load as the casebook and load benches (bench/harness.ts: autocannon, each
//    connection sends its next request when the last is answered) against three targets, cheapest first:
//    - a bare Node.js HTTP server answering a fixed JSON body: no framework, so this is the ceiling of the
//      load tool and the machine;
//    - the production server answering a static file (/icon.svg): no handler of ours, no database, no
//      session, no page rendering: the least the framework does for any answer;
//    - the production server answering /api/health: one route handler and one `SELECT 1`.
//    The casebook's goals (search p95 < 50 ms, similar cases p95 < 100 ms) and the mixed load's goal
//    (p95 < 100 ms) are all at 50 connections: set them beside the second and third lines.
// 2. The JavaScript a browser loads for /credits, a page with no client code of ours besides the
//    framework's link: the framework's share of any page's JavaScript, beside the interview route's
//    figure printed by bench:interview.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { chromium } from "@playwright/test";
import { APP_BASE as BASE, recordScripts, startBenchApp, totalKb } from "./browser-app";
import {
  loadNow,
  printLoad,
  processTable,
  recordFigure,
  runLoad,
  treeCpuMs,
  type LoadFigures,
} from "./harness";

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 15);
const DB_DIR = process.env.E2E_DB_DIR ?? "/tmp/cw-e2e-db";

/** A bare HTTP server in its own process (so the load tool does not share its thread); resolves its port. */
function bareServer(): Promise<{ child: ChildProcess; port: number }> {
  const code = `
    const http = require("node:http");
    const body = JSON.stringify({ status: "ok" });
    const server = http.createServer((req, res) => {
      res.writeHead(200, { "content-type": "application/json", "content-length": Buffer.byteLength(body) });
      res.end(body);
    });
    server.listen(0, "127.0.0.1", () => process.stdout.write(String(server.address().port) + "\\n"));
  `;
  const child = spawn(process.execPath, ["-e", code], { stdio: ["ignore", "pipe", "inherit"] });
  return new Promise((resolve, reject) => {
    child.stdout!.once("data", (chunk: Buffer) => resolve({ child, port: Number(chunk.toString().trim()) }));
    child.once("exit", (code) => reject(new Error(`the bare server stopped (${code})`)));
  });
}

/**
 * The app server started by scripts/e2e-server.sh (the highest process under it whose command line names
 * next: Next.js renames its process to "next-server"), for the CPU figures; its workers are its descendants.
 */
function nextServerPid(rootPid: number | undefined): number | undefined {
  if (!rootPid) return undefined;
  const processes = processTable();
  const command = (pid: number) => {
    try {
      return readFileSync(`/proc/${pid}/cmdline`, "utf8").replaceAll("\0", " ");
    } catch {
      return ""; // gone meanwhile
    }
  };
  const queue = [rootPid];
  while (queue.length > 0) {
    const pid = queue.shift()!;
    if (pid !== rootPid && /\bnext\b|next-server/.test(command(pid))) return pid;
    for (const [child, { ppid }] of processes) if (ppid === pid) queue.push(child);
  }
  return undefined;
}

function databasePid(): number | undefined {
  const file = `${DB_DIR}/pid`;
  return existsSync(file) ? Number(readFileSync(file, "utf8").trim()) : undefined;
}

async function load(title: string, base: string, path: string, appPid?: number): Promise<LoadFigures> {
  const dbPid = databasePid();
  const figures = await runLoad({
    base,
    connections: CONNECTIONS,
    seconds: SECONDS,
    next: () => ({ group: `GET ${path}`, method: "GET", path, cookie: "" }),
    cpuMs: appPid ? () => ({ app: treeCpuMs(appPid), db: treeCpuMs(dbPid) }) : undefined,
  });
  printLoad(`${title}, ${CONNECTIONS} connections`, figures);
  return figures;
}

async function main() {
  const app = await startBenchApp();
  const bare = await bareServer();
  try {
    console.log(`the floor under the speed goals (load average now ${loadNow()})`);

    const rows: { target: string; figures: LoadFigures }[] = [];
    const bareBase = `http://127.0.0.1:${bare.port}`;
    rows.push({
      target: "bare Node.js HTTP server",
      figures: await load("bare Node.js HTTP server (no framework)", bareBase, "/", bare.child.pid),
    });
    const appPid = nextServerPid(app.pid);
    // A short warm-up: the first answers of a fresh server compile and cache.
    await runLoad({
      base: BASE,
      connections: 5,
      seconds: 3,
      next: () => ({ group: "warm-up", method: "GET", path: "/icon.svg", cookie: "" }),
    });
    rows.push({
      target: "framework, static file",
      figures: await load("production server, a static file (/icon.svg)", BASE, "/icon.svg", appPid),
    });
    rows.push({
      target: "framework, /api/health",
      figures: await load("production server, /api/health (one SELECT 1)", BASE, "/api/health", appPid),
    });

    // The framework's own JavaScript: a page with no client component of ours.
    const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
    const page = await (await browser.newContext({ baseURL: BASE })).newPage();
    const scripts = recordScripts(page);
    await page.goto("/credits", { waitUntil: "networkidle" });
    await browser.close();
    const frameworkKb = totalKb(scripts);

    console.log(`\nsummary at ${CONNECTIONS} connections`);
    console.log(
      `${"target".padEnd(28)}${"req/s".padStart(8)}${"p50".padStart(10)}${"p95".padStart(10)}  CPU per answer`,
    );
    for (const { target, figures } of rows) {
      const cpu = figures.cpuPerRequestMs;
      console.log(
        `${target.padEnd(28)}${figures.overall.perSecond.toFixed(0).padStart(8)}${`${figures.overall.p50.toFixed(1)} ms`.padStart(10)}${`${figures.overall.p95.toFixed(1)} ms`.padStart(10)}  ${cpu ? `${(cpu.app + cpu.db).toFixed(2)} ms` : "–"}`,
      );
      recordFigure({
        bench: "floor",
        figure: `${target} p95 at ${CONNECTIONS} connections`,
        value: figures.overall.p95,
        unit: "ms",
        note: `${figures.overall.perSecond.toFixed(0)} req/s`,
      });
    }
    console.log(
      `JavaScript of a page with no client code of ours (/credits): ${scripts.size} files, ${frameworkKb.toFixed(1)} kB gzip`,
    );
    recordFigure({
      bench: "floor",
      figure: "framework JavaScript (/credits)",
      value: frameworkKb,
      unit: "kB gzip",
    });
  } finally {
    bare.child.kill();
    await app.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
