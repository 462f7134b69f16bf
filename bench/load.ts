// The whole product under a mixed load: the production server on the 100,000-case database of
// bench/casebook-data.ts (with an invented refrigerant ledger added once: cylinders and movements for the
// closed cases), autocannon at 50 and then 200 connections. Every connection works like a person at a
// counter or a bay, one request after another: the cases home screen (with the work counts), case reads,
// autosaves of an interview, casebook searches, and the ledger (its page and its API).
//
// Autosaves send the version they last saw. Each draft is lent to one request at a time and takes the
// version its answer gives back, so a 409 (a stale version) should not happen; if one does it is counted
// apart from the errors. Prints per route group and overall: requests/s, p50/p95/p99, non-2xx answers by
// status, errors and timeouts, and what share of casebook answers came from memory. Figures only.
//
//   npm run bench:load     (BENCH_SECONDS=60 per run, BENCH_CONNECTIONS="50 200", BENCH_PORT=3541,
//                           BENCH_KEEP_DB=1 leaves the database's server running afterwards)
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

const SECONDS = Number(process.env.BENCH_SECONDS ?? 60);
const CONNECTION_STEPS = (process.env.BENCH_CONNECTIONS ?? "50 200").split(/[ ,]+/).map(Number);
const CASES_PER_SHOP = 80;
const DRAFTS_PER_SHOP = 10;

const WORDS = ["idle", "warm", "fan", "relay", "frost", "clicks", "smell", "leak", "noise", "ac"];
const FACETS = [
  "",
  "&status=closed",
  "&refrigerant=R-134a&device=orifice_tube",
  "&refrigerant=R-1234yf",
  "&suspect=undercharge",
  "&make=Ford",
];

// One person's round: what a working screen asks for, in about the proportions a shop day has them.
const ROUND = [
  "home",
  "case read",
  "autosave",
  "casebook search",
  "case read",
  "autosave",
  "ledger page",
  "casebook search",
  "case read",
  "ledger API",
] as const;

type Draft = { caseId: number; cookie: string; version: number; n: number };

async function main() {
  const started = loadNow();
  const bench = await benchServer(3541);
  const { sequelize } = bench;
  await ensureLedger(sequelize);

  const shops = await sequelize.query<{ shop_id: number; id: string }>(
    "SELECT shop_id, MIN(id) AS id FROM user WHERE role = 'technician' GROUP BY shop_id ORDER BY shop_id",
    { type: QueryTypes.SELECT },
  );
  const drafts = await sequelize.query<{
    id: number;
    shop_id: number;
    technician_id: string;
    version: number;
  }>(
    `SELECT c.id, c.shop_id, c.technician_id, c.version
       FROM (SELECT id, shop_id, technician_id, version,
                    ROW_NUMBER() OVER (PARTITION BY shop_id ORDER BY id) AS n
               FROM service_case WHERE status = 'draft') c
       JOIN user u ON u.id = c.technician_id AND u.role IN ('technician', 'senior') AND u.active = 1
      WHERE c.n <= ${DRAFTS_PER_SHOP}`,
    { type: QueryTypes.SELECT },
  );
  const cases = await sequelize.query<{ id: number; shop_id: number }>(
    `SELECT id, shop_id FROM (SELECT id, shop_id, ROW_NUMBER() OVER (PARTITION BY shop_id ORDER BY id DESC) AS n
       FROM service_case) c WHERE c.n <= ${CASES_PER_SHOP}`,
    { type: QueryTypes.SELECT },
  );
  const cookies = await bench.sessionsFor([...shops.map((s) => s.id), ...drafts.map((d) => d.technician_id)]);
  const people = shops.map((s) => ({ shopId: s.shop_id, cookie: cookies.get(s.id)! }));
  const casesOf = new Map<number, number[]>();
  for (const c of cases) casesOf.set(c.shop_id, [...(casesOf.get(c.shop_id) ?? []), c.id]);
  const free: Draft[] = drafts.map((d) => ({
    caseId: d.id,
    cookie: cookies.get(d.technician_id)!,
    version: d.version,
    n: 0,
  }));
  await bench.start();

  const pick = seeded(2026);
  const any = <T>(items: readonly T[]) => items[Math.floor(pick() * items.length)]!;
  let turn = 0;
  let conflicts = 0;
  const next = (): Shot => {
    const kind = ROUND[turn++ % ROUND.length]!;
    const person = any(people);
    switch (kind) {
      case "home":
        return { group: "home screen (page)", method: "GET", path: "/cases", cookie: person.cookie };
      case "case read":
        return {
          group: "case read",
          method: "GET",
          path: `/api/cases/${any(casesOf.get(person.shopId) ?? [0])}`,
          cookie: person.cookie,
        };
      case "casebook search":
        return {
          group: "casebook search",
          method: "GET",
          path: `/api/casebook?q=${any(WORDS)}${any(FACETS)}${pick() < 0.2 ? "&page=2" : ""}`,
          cookie: person.cookie,
        };
      case "ledger page":
        return { group: "ledger (page)", method: "GET", path: "/ledger", cookie: person.cookie };
      case "ledger API":
        return {
          group: "ledger (API)",
          method: "GET",
          path: "/api/ledger/movements?limit=50",
          cookie: person.cookie,
        };
      case "autosave": {
        // A draft no other request holds; a round with none free reads a case instead.
        const draft = free.shift();
        if (!draft)
          return {
            group: "case read",
            method: "GET",
            path: `/api/cases/${any(casesOf.get(person.shopId) ?? [0])}`,
            cookie: person.cookie,
          };
        draft.n += 1;
        const body = JSON.stringify({
          baseVersion: draft.version,
          step: "running",
          answers: {},
          // What a technician has typed so far on the running step, one more figure each time.
          drafts: {
            running: {
              highKpaGauge: String(1400 + ((draft.n * 7) % 300)),
              lowKpaGauge: String(180 + (draft.n % 60)),
              ambientC: String(25 + (draft.n % 12)),
            },
          },
          visited: ["complaint", "system", "conditions", "running"],
        });
        return {
          group: "autosave (PUT)",
          method: "PUT",
          path: `/api/cases/${draft.caseId}/interview`,
          cookie: draft.cookie,
          body,
          conflictExpected: true,
          onAnswer: (status, text) => {
            if (status === 200) draft.version = (JSON.parse(text) as { version: number }).version;
            else if (status === 409) conflicts += 1;
            free.push(draft);
          },
        };
      }
    }
  };

  try {
    // A first pass of every kind, so nothing below measures a cold code path; then refused answers show.
    for (let i = 0; i < ROUND.length * 3; i++) {
      const shot = next();
      const response = await fetch(`${bench.base}${shot.path}`, {
        method: shot.method,
        headers: {
          cookie: shot.cookie,
          ...(shot.body ? { "content-type": "application/json", origin: bench.base } : {}),
        },
        body: shot.body,
        redirect: "manual",
      });
      const text = await response.text();
      shot.onAnswer?.(response.status, text);
      if (response.status !== 200)
        throw new Error(`${shot.method} ${shot.path} answered ${response.status}: ${text.slice(0, 300)}`);
    }
    console.log(
      `load average before: ${started}; ${people.length} shops, ${free.length} drafts to autosave, ${SECONDS} s per run`,
    );
    for (const connections of CONNECTION_STEPS) {
      conflicts = 0;
      const figures = await runLoad({
        base: bench.base,
        connections,
        seconds: SECONDS,
        next,
        cpuMs: bench.cpuMs,
      });
      printLoad(`mixed load at ${connections} connections`, figures, new Set(["autosave (PUT)"]));
      const g = figures.overall;
      const unexpected = [...g.statuses]
        .filter(([s]) => (s < 200 || s >= 300) && s !== 409)
        .reduce((sum, [, n]) => sum + n, 0);
      const common = { bench: "load", note: `load ${loadNow()}` };
      recordFigure({
        ...common,
        figure: `mixed p95 (${connections} conn.)`,
        value: g.p95,
        unit: "ms",
        goal: connections === 50 ? { below: 100 } : undefined,
      });
      if (figures.cpuPerRequestMs)
        recordFigure({
          ...common,
          figure: `mixed CPU per answer, app + database (${connections} conn.)`,
          value: figures.cpuPerRequestMs.app + figures.cpuPerRequestMs.db,
          unit: "ms",
          note: `app ${figures.cpuPerRequestMs.app.toFixed(2)} + database ${figures.cpuPerRequestMs.db.toFixed(2)}; ${common.note}`,
        });
      recordFigure({ ...common, figure: `mixed p99 (${connections} conn.)`, value: g.p99, unit: "ms" });
      recordFigure({
        ...common,
        figure: `mixed requests/s (${connections} conn.)`,
        value: g.perSecond,
        unit: "req/s",
      });
      recordFigure({
        ...common,
        figure: `errors, timeouts and unexpected non-2xx (${connections} conn.)`,
        value: figures.errors + figures.timeouts + unexpected,
        unit: "",
        goal: { below: 1 },
      });
      recordFigure({
        ...common,
        figure: `autosaves answered 409 (${connections} conn.)`,
        value: conflicts,
        unit: "",
      });
      for (const group of figures.groups)
        recordFigure({
          ...common,
          figure: `${group.group} p95 (${connections} conn.)`,
          value: group.p95,
          unit: "ms",
        });
    }
  } finally {
    bench.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
