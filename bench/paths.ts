// CPU per answer, one path at a time: the production server on the 100,000-case database (bench/harness.ts)
// driven by autocannon on a single kind of request, and the CPU time the app server and the database used
// for it divided by the answers. Unlike latency, that figure barely moves when other work shares the
// machine, so it tells whether a change made a path cheaper. Figures to read: nothing here passes or fails.
//
//   npm run bench:paths     (BENCH_SECONDS=8 per path, BENCH_CONNECTIONS=10, BENCH_PORT=3542,
//                            BENCH_PATHS="health ledger" runs some of them, BENCH_CPU_PROF=<folder> has the
//                            server write a V8 CPU profile there, BENCH_KEEP_DB=1 as for the other benches)
import { QueryTypes } from "sequelize";
import {
  benchServer,
  ensureLedger,
  loadNow,
  printLoad,
  recordFigure,
  runLoad,
  seeded,
  type Shot,
} from "./harness";

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);

async function main() {
  const started = loadNow();
  const bench = await benchServer(3542);
  const { sequelize } = bench;
  await ensureLedger(sequelize);
  const shops = await sequelize.query<{ shop_id: number; id: string }>(
    "SELECT shop_id, MIN(id) AS id FROM user WHERE role = 'technician' GROUP BY shop_id ORDER BY shop_id",
    { type: QueryTypes.SELECT },
  );
  const cases = await sequelize.query<{ id: number; shop_id: number }>(
    `SELECT id, shop_id FROM (SELECT id, shop_id, ROW_NUMBER() OVER (PARTITION BY shop_id ORDER BY id DESC) AS n
       FROM service_case) c WHERE c.n <= 80`,
    { type: QueryTypes.SELECT },
  );
  const closed = await sequelize.query<{ case_id: number; shop_id: number }>(
    `SELECT case_id, shop_id FROM (SELECT case_id, shop_id,
            ROW_NUMBER() OVER (PARTITION BY shop_id ORDER BY case_id) AS n FROM case_features) f WHERE f.n <= 60`,
    { type: QueryTypes.SELECT },
  );
  const cookies = await bench.sessionsFor(shops.map((s) => s.id));
  const people = shops.map((s) => ({ shopId: s.shop_id, cookie: cookies.get(s.id)! }));
  const casesOf = new Map<number, number[]>();
  for (const c of cases) casesOf.set(c.shop_id, [...(casesOf.get(c.shop_id) ?? []), c.id]);
  const closedOf = new Map<number, number[]>();
  for (const c of closed) closedOf.set(c.shop_id, [...(closedOf.get(c.shop_id) ?? []), c.case_id]);
  await bench.start();

  const pick = seeded(15);
  const any = <T>(items: readonly T[]) => items[Math.floor(pick() * items.length)]!;
  const WORDS = ["idle", "warm", "fan", "relay", "frost", "clicks", "smell", "leak", "noise"];
  const PAIRS = [
    "refrigerant=R-134a&device=orifice_tube",
    "status=closed&suspect=undercharge",
    "make=Ford&status=closed",
  ];
  const paths: Record<string, () => Shot> = {
    health: () => ({ group: "GET /api/health", method: "GET", path: "/api/health", cookie: "" }),
    cases: () => ({ group: "GET /cases (page)", method: "GET", path: "/cases", cookie: any(people).cookie }),
    ledger: () => ({
      group: "GET /ledger (page)",
      method: "GET",
      path: "/ledger",
      cookie: any(people).cookie,
    }),
    "ledger-api": () => ({
      group: "GET /api/ledger/movements",
      method: "GET",
      path: "/api/ledger/movements?limit=50",
      cookie: any(people).cookie,
    }),
    "case-read": () => {
      const person = any(people);
      return {
        group: "GET /api/cases/:id",
        method: "GET",
        path: `/api/cases/${any(casesOf.get(person.shopId) ?? [0])}`,
        cookie: person.cookie,
      };
    },
    // One question asked again and again: the answer comes from memory after the first time.
    "search-remembered": () => ({
      group: "casebook search (same)",
      method: "GET",
      path: `/api/casebook?q=idle&${PAIRS[0]}`,
      cookie: people[0]!.cookie,
    }),
    search: () => {
      const person = any(people);
      return {
        group: "casebook search (varied)",
        method: "GET",
        path: `/api/casebook?q=${any(WORDS)}&${any(PAIRS)}${pick() < 0.5 ? "&page=2" : ""}`,
        cookie: person.cookie,
      };
    },
    similar: () => {
      const person = any(people);
      return {
        group: "similar cases",
        method: "GET",
        path: `/api/cases/${any(closedOf.get(person.shopId) ?? [0])}/similar`,
        cookie: person.cookie,
      };
    },
  };
  const chosen = (process.env.BENCH_PATHS ?? Object.keys(paths).join(" ")).split(/[ ,]+/).filter(Boolean);
  try {
    console.log(`load average before: ${started}; ${CONNECTIONS} connections, ${SECONDS} s per path`);
    const summary: string[] = [];
    for (const name of chosen) {
      const next = paths[name];
      if (!next) throw new Error(`no path called ${name}: ${Object.keys(paths).join(", ")}`);
      // Warm the path (code, database pages, and what the app keeps per shop: twice as many requests
      // as shops), and stop at once on a refused answer.
      for (let i = 0; i < Math.max(20, 2 * people.length); i++) {
        const shot = next();
        const response = await fetch(`${bench.base}${shot.path}`, {
          headers: { cookie: shot.cookie },
          redirect: "manual",
        });
        await response.text();
        if (response.status !== 200) throw new Error(`${shot.path} answered ${response.status}`);
      }
      const figures = await runLoad({
        base: bench.base,
        connections: CONNECTIONS,
        seconds: SECONDS,
        next,
        cpuMs: bench.cpuMs,
      });
      printLoad(`${name} at ${CONNECTIONS} connections`, figures);
      const cpu = figures.cpuPerRequestMs;
      if (cpu) {
        summary.push(
          `${name.padEnd(20)}${cpu.app.toFixed(2).padStart(9)}${cpu.db.toFixed(2).padStart(9)}${figures.overall.perSecond.toFixed(0).padStart(8)}`,
        );
        recordFigure({
          bench: "paths",
          figure: `${name} CPU per answer, app + database`,
          value: cpu.app + cpu.db,
          unit: "ms",
          note: `app ${cpu.app.toFixed(2)} + database ${cpu.db.toFixed(2)}; load ${loadNow()}`,
        });
      }
    }
    console.log(`\nCPU ms per answer (load average now ${loadNow()})`);
    console.log(`${"path".padEnd(20)}${"app".padStart(9)}${"db".padStart(9)}${"req/s".padStart(8)}`);
    for (const line of summary) console.log(line);
  } finally {
    bench.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
