// What the HTTP benchmarks share: the 100,000-case database (bench/casebook-data.ts), a production build
// of the current code, the production server started against that database, sessions written straight
// into Lucia's table (the sign-in route would throttle a burst), autocannon runs that keep figures per
// route group, and the figures file bench/report.ts reads. Figures to read: nothing here passes or fails.
import { spawn, execFileSync, type ChildProcess } from "node:child_process";
import { appendFileSync, existsSync, readFileSync, readdirSync, statSync } from "node:fs";
import { loadavg } from "node:os";
import path from "node:path";
import { randomBytes } from "node:crypto";
import autocannon from "autocannon";
import { QueryTypes, type Sequelize } from "sequelize";
import { ensureBenchDatabase } from "./casebook-data";

export const REPO = path.resolve(__dirname, "..");

/** A seeded generator, so two runs ask the same questions in the same order. */
export function seeded(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const percentile = (sorted: number[], p: number) =>
  sorted.length === 0
    ? Number.NaN
    : sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;

export const loadNow = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(" ");

/** One figure for bench/report.ts: written to BENCH_FIGURES_FILE (one JSON line) when it is set. */
export function recordFigure(figure: {
  bench: string;
  figure: string;
  value: number;
  unit: string;
  /** The goal, read as "value < goal" ("below") or "value ≥ goal" ("at least"). */
  goal?: { below?: number; atLeast?: number };
  note?: string;
}) {
  const file = process.env.BENCH_FIGURES_FILE;
  if (file) appendFileSync(file, `${JSON.stringify(figure)}\n`);
}

/** Every process now running (Linux /proc): its parent and the CPU ticks (user + system) it has used. */
export function processTable(): Map<number, { ppid: number; ticks: number }> {
  const table = new Map<number, { ppid: number; ticks: number }>();
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const text = readFileSync(`/proc/${entry}/stat`, "utf8");
      const fields = text.slice(text.lastIndexOf(")") + 2).split(" ");
      table.set(Number(entry), { ppid: Number(fields[1]), ticks: Number(fields[11]) + Number(fields[12]) });
    } catch {
      // gone meanwhile
    }
  }
  return table;
}

/** CPU time (user + system, ms) a process and all its descendants have used, from /proc (Linux). */
export function treeCpuMs(rootPid: number | undefined): number {
  if (!rootPid) return 0;
  const tick = 10; // USER_HZ is 100 on Linux: one tick is 10 ms
  const stats = processTable();
  let total = 0;
  const visit = (pid: number) => {
    total += stats.get(pid)?.ticks ?? 0;
    for (const [child, s] of stats) if (s.ppid === pid) visit(child);
  };
  visit(rootPid);
  return total * tick;
}

/** When the app's code last changed: a build older than this would measure other code. */
function newestSourceMs(): number {
  let newest = 0;
  const visit = (entry: string) => {
    const full = path.join(REPO, entry);
    if (!existsSync(full)) return;
    const stat = statSync(full);
    if (stat.isDirectory()) for (const child of readdirSync(full)) visit(path.join(entry, child));
    else newest = Math.max(newest, stat.mtimeMs);
  };
  for (const entry of [
    "app",
    "components",
    "lib",
    "machines",
    "models",
    "migrations",
    "data",
    "proxy.ts",
    "instrumentation-client.ts",
    "next.config.mjs",
    "package-lock.json",
  ])
    visit(entry);
  return newest;
}

export interface BenchServer {
  base: string;
  sequelize: Sequelize;
  /** A session cookie for each user id, valid for a week. */
  sessionsFor(userIds: string[]): Promise<Map<string, string>>;
  /** Closes the database connection of the set-up and starts the production server. */
  start(): Promise<void>;
  /** CPU ms used so far by the app server (with its children) and by the database server. */
  cpuMs(): { app: number; db: number };
  stop(): void;
}

/** The filled database, a current build and (after start()) the production server on BENCH_PORT. */
export async function benchServer(defaultPort: number): Promise<BenchServer> {
  const port = Number(process.env.BENCH_PORT ?? defaultPort);
  const base = `http://127.0.0.1:${port}`;
  const { databaseUrl, env: dbEnv, dir } = await ensureBenchDatabase();
  const buildId = path.join(REPO, ".next/BUILD_ID");
  if (!existsSync(buildId) || statSync(buildId).mtimeMs < newestSourceMs()) {
    console.log("no production build of the current code: running next build…");
    execFileSync("npx", ["next", "build"], { cwd: REPO, stdio: "inherit" });
  }
  const { getModels } = await import("@/models");
  const { closeSequelize } = await import("@/lib/db/sequelize");
  const { sequelize } = getModels();
  let server: ChildProcess | null = null;
  return {
    base,
    sequelize,
    async sessionsFor(userIds) {
      const cookies = new Map<string, string>();
      for (const userId of new Set(userIds)) {
        const sessionId = randomBytes(20).toString("hex");
        await sequelize.query("INSERT INTO user_session (id, user_id, expires_at) VALUES (?, ?, ?)", {
          replacements: [sessionId, userId, new Date(Date.now() + 7 * 86_400_000)],
        });
        cookies.set(userId, `cw_session=${sessionId}`);
      }
      return cookies;
    },
    async start() {
      await closeSequelize();
      // BENCH_CPU_PROF=<folder>: the server writes a V8 CPU profile there when it stops.
      const profile = process.env.BENCH_CPU_PROF;
      const nextArgs = ["start", "-H", "127.0.0.1", "-p", String(port)];
      server = spawn(
        profile ? process.execPath : path.join(REPO, "node_modules/.bin/next"),
        profile
          ? [
              "--cpu-prof",
              `--cpu-prof-dir=${path.resolve(profile)}`,
              path.join(REPO, "node_modules/next/dist/bin/next"),
              ...nextArgs,
            ]
          : nextArgs,
        {
          cwd: REPO,
          env: {
            ...process.env,
            NODE_ENV: "production",
            DATABASE_URL: databaseUrl,
            APP_ORIGIN: base,
          },
          stdio: ["ignore", "ignore", "inherit"],
        },
      );
      const until = Date.now() + 60_000;
      for (;;) {
        try {
          if ((await fetch(`${base}/api/health`)).ok) return;
        } catch {
          // not up yet
        }
        if (Date.now() > until) throw new Error(`no server at ${base}`);
        await new Promise((r) => setTimeout(r, 500));
      }
    },
    cpuMs() {
      const dbPid = Number(readFileSync(path.join(dir, "pid"), "utf8").trim());
      return { app: treeCpuMs(server?.pid), db: treeCpuMs(dbPid) };
    },
    stop() {
      server?.kill("SIGTERM");
      // The filled database stays in its folder for the next run (or another benchmark); its server stops.
      if (process.env.BENCH_KEEP_DB !== "1")
        execFileSync("bash", [path.join(REPO, "scripts/db.sh"), "down"], { env: dbEnv, stdio: "ignore" });
    },
  };
}

/** One request of a load: its route group for the figures, and what to send. */
export interface Shot {
  group: string;
  method: "GET" | "PUT";
  path: string;
  cookie: string;
  body?: string;
  /** Told the answer (status, body) when it arrives, before the next request of its connection. */
  onAnswer?: (status: number, body: string) => void;
  /** 409 here is an expected answer (a stale version), counted apart from other non-2xx answers. */
  conflictExpected?: boolean;
}

export interface GroupFigures {
  group: string;
  requests: number;
  perSecond: number;
  p50: number;
  p95: number;
  p99: number;
  statuses: Map<number, number>;
  cacheHits: number;
  cacheMisses: number;
  /** p95 of the answers not served from memory (misses and uncached routes). */
  p95Uncached: number;
}

export interface LoadFigures {
  /** CPU ms per answered request, of the app server and of the database: steadier than latency on a shared machine. */
  cpuPerRequestMs?: { app: number; db: number };
  overall: GroupFigures;
  groups: GroupFigures[];
  errors: number;
  timeouts: number;
  seconds: number;
}

function figuresOf(
  group: string,
  samples: { ms: number; status: number; cache: string | null }[],
  seconds: number,
): GroupFigures {
  const all = samples.map((s) => s.ms).sort((a, b) => a - b);
  const uncached = samples
    .filter((s) => s.cache !== "hit")
    .map((s) => s.ms)
    .sort((a, b) => a - b);
  const statuses = new Map<number, number>();
  for (const s of samples) statuses.set(s.status, (statuses.get(s.status) ?? 0) + 1);
  return {
    group,
    requests: samples.length,
    perSecond: samples.length / seconds,
    p50: percentile(all, 50),
    p95: percentile(all, 95),
    p99: percentile(all, 99),
    statuses,
    cacheHits: samples.filter((s) => s.cache === "hit").length,
    cacheMisses: samples.filter((s) => s.cache === "miss").length,
    p95Uncached: percentile(uncached, 95),
  };
}

/**
 * autocannon against the server: every connection asks `next()` for its next request as soon as the last
 * one is answered (a closed loop, as people wait for a screen). Figures per group and overall.
 */
export async function runLoad({
  base,
  connections,
  seconds,
  next,
  cpuMs,
}: {
  base: string;
  connections: number;
  seconds: number;
  next: () => Shot;
  cpuMs?: () => { app: number; db: number };
}): Promise<LoadFigures> {
  const cpuBefore = cpuMs?.();
  const samples = new Map<string, { ms: number; status: number; cache: string | null }[]>();
  // autocannon tells a request's answer to its onResponse and then, at once and in the same turn, emits
  // "response" with the latency: the answer's group and cache header wait here in between.
  let answered: { group: string; cache: string | null } | null = null;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: base,
        connections,
        duration: seconds,
        timeout: 10,
        requests: [
          {
            setupRequest: (req, context) => {
              const shot = next();
              (context as { shot?: Shot }).shot = shot;
              const headers: Record<string, string | string[] | undefined> = {
                ...req.headers,
                cookie: shot.cookie,
              };
              if (shot.body !== undefined) {
                headers["content-type"] = "application/json";
                headers.origin = base;
              }
              return { ...req, method: shot.method, path: shot.path, headers, body: shot.body };
            },
            onResponse: (status, body, context, headers) => {
              const shot = (context as { shot?: Shot }).shot;
              const cache = Object.entries(headers ?? {}).find(
                ([k]) => k.toLowerCase() === "x-casebook-cache",
              )?.[1];
              answered = { group: shot?.group ?? "?", cache: typeof cache === "string" ? cache : null };
              shot?.onAnswer?.(status, body);
            },
          },
        ],
      },
      (error, done) => (error ? reject(error) : resolve(done)),
    );
    instance.on("response", (_client, statusCode, _bytes, responseTime) => {
      const a = answered ?? { group: "?", cache: null };
      answered = null;
      const list = samples.get(a.group) ?? [];
      list.push({ ms: responseTime, status: statusCode, cache: a.cache });
      samples.set(a.group, list);
    });
  });
  const took = result.duration || seconds;
  const cpuAfter = cpuMs?.();
  const answered_ = [...samples.values()].reduce((sum, list) => sum + list.length, 0);
  const groups = [...samples.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([group, list]) => figuresOf(group, list, took));
  return {
    cpuPerRequestMs:
      cpuBefore && cpuAfter && answered_ > 0
        ? { app: (cpuAfter.app - cpuBefore.app) / answered_, db: (cpuAfter.db - cpuBefore.db) / answered_ }
        : undefined,
    overall: figuresOf("all", [...samples.values()].flat(), took),
    groups,
    errors: result.errors,
    timeouts: result.timeouts,
    seconds: took,
  };
}

const ms = (n: number) => (Number.isNaN(n) ? "–" : `${n.toFixed(1)} ms`);

/** The figures as a table on stdout. */
export function printLoad(title: string, figures: LoadFigures, conflictGroups: Set<string> = new Set()) {
  console.log(`\n${title} (${figures.seconds.toFixed(0)} s, load average now ${loadNow()})`);
  console.log(
    `${"group".padEnd(26)}${"req/s".padStart(8)}${"p50".padStart(11)}${"p95".padStart(11)}${"p99".padStart(11)}  answers`,
  );
  for (const g of [...figures.groups, figures.overall]) {
    const other = [...g.statuses]
      .filter(([s]) => s < 200 || s >= 300)
      .map(
        ([s, n]) =>
          `${s}×${n}${s === 409 && conflictGroups.has(g.group) ? " (stale version, expected)" : ""}`,
      );
    const cached =
      g.cacheHits + g.cacheMisses > 0
        ? ` · remembered ${((100 * g.cacheHits) / (g.cacheHits + g.cacheMisses)).toFixed(0)} % (p95 of the rest ${ms(g.p95Uncached)})`
        : "";
    console.log(
      `${g.group.padEnd(26)}${g.perSecond.toFixed(0).padStart(8)}${ms(g.p50).padStart(11)}${ms(g.p95).padStart(11)}${ms(g.p99).padStart(11)}  ${g.requests} answered${other.length ? ` · non-2xx ${other.join(" ")}` : " · all 2xx"}${cached}`,
    );
  }
  const cpu = figures.cpuPerRequestMs;
  console.log(
    `errors ${figures.errors} · timeouts ${figures.timeouts}${cpu ? ` · CPU per answer: app ${cpu.app.toFixed(2)} ms, database ${cpu.db.toFixed(2)} ms` : ""}`,
  );
}

/** An invented ledger for every shop, once: two cylinders per refrigerant and a movement per closed case. */
export async function ensureLedger(sequelize: Sequelize) {
  const [row] = await sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM refrigerant_movement", {
    type: QueryTypes.SELECT,
  });
  if (Number(row?.n ?? 0) > 0) return;
  const started = performance.now();
  await sequelize.query(
    `INSERT INTO cylinder (shop_id, label, refrigerant, kind, tare_g, capacity_g, initial_net_g)
     SELECT s.id, CONCAT(r.refrigerant, ' ', k.kind, ' cylinder'), r.refrigerant, k.kind, 7000, 1000000,
            IF(k.kind = 'virgin', 900000, 0)
       FROM shop s
       CROSS JOIN (SELECT 'R-134a' AS refrigerant UNION ALL SELECT 'R-1234yf') r
       CROSS JOIN (SELECT 'virgin' AS kind UNION ALL SELECT 'recovery') k`,
  );
  // Each closed case recovered what was in the system and was charged again from the virgin cylinder.
  await sequelize.query(
    `INSERT INTO refrigerant_movement (shop_id, cylinder_id, case_id, technician_id, type, refrigerant, mass_g, occurred_at)
     SELECT c.shop_id, y.id, c.id, c.technician_id,
            IF(y.kind = 'virgin', 'charged_from', 'recovered_into'), y.refrigerant,
            IF(y.kind = 'virgin', 450 + c.id % 300, 200 + c.id % 350), COALESCE(c.closed_at, c.created_at)
       FROM service_case c
       JOIN casebook_entry e ON e.case_id = c.id
       JOIN cylinder y ON y.shop_id = c.shop_id AND y.refrigerant = e.refrigerant
      WHERE c.status = 'closed'`,
  );
  console.log(`invented a refrigerant ledger in ${((performance.now() - started) / 1000).toFixed(0)} s`);
}
