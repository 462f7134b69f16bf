// The casebook under load: 100,000 invented cases in 50 shops (bench/casebook-data.ts, its own MariaDB in
// /tmp), the production server (`next build` output) started against it, and autocannon at 50
// connections on (1) a search with words and two facets and (2) similar cases. Prints p50, p95, p99 and
// requests per second for each, and the machine's load. Figures to read: nothing here passes or fails.
//
//   npm run bench:casebook           (BENCH_SECONDS=20, BENCH_CONNECTIONS=50, BENCH_PORT=3540 move it;
//                                     BENCH_KEEP_DB=1 leaves the database's server running afterwards)
import { spawn, execFileSync, type ChildProcess } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { loadavg } from "node:os";
import path from "node:path";
import { randomBytes } from "node:crypto";
import autocannon from "autocannon";
import { QueryTypes } from "sequelize";
import { ensureBenchDatabase } from "./casebook-data";

const REPO = path.resolve(__dirname, "..");
const PORT = Number(process.env.BENCH_PORT ?? 3540);
const BASE = `http://127.0.0.1:${PORT}`;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 20);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);

// Words a technician would type, from the generated complaints and notes (common and rare ones alike).
const WORDS = [
  "idle",
  "warm",
  "fan",
  "grinding",
  "relay",
  "frost",
  "clicks",
  "smell",
  "traffic",
  "hissing",
  "leak",
  "noise",
];
// Two facets each: the pairs a counter clerk would set beside the words.
const FACET_PAIRS = [
  "refrigerant=R-134a&device=orifice_tube",
  "refrigerant=R-1234yf&device=txv",
  "status=closed&suspect=undercharge",
  "make=Ford&status=closed",
  "cause=condenser_airflow&refrigerant=R-134a",
  "symptoms=worse_at_idle&status=closed",
];

type Target = { path: string; cookie: string };

async function waitForHealth(timeoutMs: number) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`no server at ${BASE}`);
}

const percentile = (sorted: number[], p: number) =>
  sorted.length === 0
    ? Number.NaN
    : sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;

async function load(name: string, targets: Target[]) {
  let next = 0;
  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: BASE,
        connections: CONNECTIONS,
        duration: SECONDS,
        requests: [
          {
            setupRequest: (req) => {
              const t = targets[next++ % targets.length]!;
              return { ...req, method: "GET", path: t.path, headers: { ...req.headers, cookie: t.cookie } };
            },
          },
        ],
      },
      (error, done) => (error ? reject(error) : resolve(done)),
    );
    instance.on("response", (_client, statusCode, _bytes, responseTime) => {
      latencies.push(responseTime);
      statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
    });
  });
  latencies.sort((a, b) => a - b);
  const rps = latencies.length / (result.duration || SECONDS);
  console.log(
    `${name.padEnd(34)} p50 ${percentile(latencies, 50).toFixed(1)} ms · p95 ${percentile(latencies, 95).toFixed(1)} ms · p99 ${percentile(latencies, 99).toFixed(1)} ms · ${rps.toFixed(0)} req/s · ${latencies.length} requests · status ${[...statuses].map(([s, n]) => `${s}×${n}`).join(" ")}${result.errors ? ` · ${result.errors} errors` : ""}`,
  );
}

async function main() {
  const started = loadavg();
  const { databaseUrl, env: dbEnv } = await ensureBenchDatabase();
  const buildId = path.join(REPO, ".next/BUILD_ID");
  if (!existsSync(buildId) || statSync(buildId).mtimeMs < newestSourceMs()) {
    console.log("no production build of the current code: running next build…");
    execFileSync("npx", ["next", "build"], { cwd: REPO, stdio: "inherit" });
  }
  const { getModels } = await import("@/models");
  const { closeSequelize } = await import("@/lib/db/sequelize");
  const { sequelize } = getModels();

  // One session per shop, written straight into Lucia's table (the sign-in route would throttle a burst).
  const users = await sequelize.query<{ id: string; shop_id: number }>(
    "SELECT MIN(id) AS id, shop_id FROM user WHERE role = 'technician' GROUP BY shop_id ORDER BY shop_id",
    { type: QueryTypes.SELECT },
  );
  const cookies = new Map<number, string>();
  for (const u of users) {
    const sessionId = randomBytes(20).toString("hex");
    await sequelize.query("INSERT INTO user_session (id, user_id, expires_at) VALUES (?, ?, ?)", {
      replacements: [sessionId, u.id, new Date(Date.now() + 7 * 86_400_000)],
    });
    cookies.set(u.shop_id, `cw_session=${sessionId}`);
  }
  const search: Target[] = [];
  let i = 0;
  for (const [, cookie] of cookies)
    for (let j = 0; j < 8; j++, i++)
      search.push({
        path: `/api/casebook?q=${WORDS[i % WORDS.length]}&${FACET_PAIRS[(i * 7) % FACET_PAIRS.length]}`,
        cookie,
      });
  const similar: Target[] = [];
  for (const [shopId, cookie] of cookies) {
    const cases = await sequelize.query<{ case_id: number }>(
      "SELECT case_id FROM case_features WHERE shop_id = ? ORDER BY case_id LIMIT 8",
      { replacements: [shopId], type: QueryTypes.SELECT },
    );
    for (const c of cases) similar.push({ path: `/api/cases/${c.case_id}/similar`, cookie });
  }
  await closeSequelize();

  const server: ChildProcess = spawn(
    path.join(REPO, "node_modules/.bin/next"),
    ["start", "-H", "127.0.0.1", "-p", String(PORT)],
    {
      cwd: REPO,
      env: { ...process.env, NODE_ENV: "production", DATABASE_URL: databaseUrl, APP_ORIGIN: BASE },
      stdio: ["ignore", "ignore", "inherit"],
    },
  );
  try {
    await waitForHealth(60_000);
    for (const t of [search[0]!, similar[0]!]) {
      const response = await fetch(`${BASE}${t.path}`, { headers: { cookie: t.cookie } });
      if (!response.ok) throw new Error(`${t.path} answered ${response.status}: ${await response.text()}`);
    }
    // Warm the server's code paths and the database's pages before measuring.
    console.log(
      `load average before: ${started.map((l) => l.toFixed(2)).join(" ")} (${CONNECTIONS} connections, ${SECONDS} s each)`,
    );
    await warm(search, similar);
    await load("search: words + two facets", search);
    await load("similar cases", similar);
    console.log(
      `load average after: ${loadavg()
        .map((l) => l.toFixed(2))
        .join(" ")}`,
    );
  } finally {
    server.kill("SIGTERM");
    // The filled database stays in its folder for the next run (or another benchmark); its server stops.
    if (process.env.BENCH_KEEP_DB !== "1")
      execFileSync("bash", [path.join(REPO, "scripts/db.sh"), "down"], { env: dbEnv, stdio: "ignore" });
  }
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

async function warm(search: Target[], similar: Target[]) {
  for (const t of [...search, ...similar]) await fetch(`${BASE}${t.path}`, { headers: { cookie: t.cookie } });
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
