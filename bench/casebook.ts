// The casebook under load: 100,000 invented cases in 50 shops (bench/casebook-data.ts, its own MariaDB in
// /tmp), the production server (`next build` output) started against it, and autocannon at 50
// connections on (1) a search with words and two facets and (2) similar cases. Prints p50, p95, p99 and
// requests per second for each, and the machine's load. Figures to read: nothing here passes or fails.
//
// Answers are remembered per shop and question until the shop's next case change
// (lib/server/casebook/answer-cache.ts): each request draws its question at random from thousands, and the
// output says what share came from memory and the p95 of the rest, so the memory never does the work unseen.
//
//   npm run bench:casebook           (BENCH_SECONDS=20, BENCH_CONNECTIONS=50, BENCH_PORT=3540 move it;
//                                     BENCH_DISTINCT=4000 questions to draw searches from,
//                                     BENCH_SIMILAR_PER_SHOP=60 cases per shop to ask similar cases of;
//                                     BENCH_KEEP_DB=1 leaves the database's server running afterwards)
import { QueryTypes } from "sequelize";
import { benchServer, loadNow, printLoad, recordFigure, runLoad, seeded, type Shot } from "./harness";

const SECONDS = Number(process.env.BENCH_SECONDS ?? 20);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
/** Each request draws its question at random from this many (answers are remembered per question). */
const DISTINCT_SEARCHES = Number(process.env.BENCH_DISTINCT ?? 4000);
const SIMILAR_CASES_PER_SHOP = Number(process.env.BENCH_SIMILAR_PER_SHOP ?? 60);

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

const SORTS = ["", "&sort=opened_at", "&sort=closed_at"];

async function main() {
  const started = loadNow();
  const bench = await benchServer(3540);
  const { sequelize } = bench;
  const users = await sequelize.query<{ id: string; shop_id: number }>(
    "SELECT MIN(id) AS id, shop_id FROM user WHERE role = 'technician' GROUP BY shop_id ORDER BY shop_id",
    { type: QueryTypes.SELECT },
  );
  const cookies = await bench.sessionsFor(users.map((u) => u.id));
  const shops = users.map((u) => ({ shopId: u.shop_id, cookie: cookies.get(u.id)! }));

  // The space of questions: shop × word × facet pair × sort × page, numbered, and a random sample of it.
  const space = shops.length * WORDS.length * FACET_PAIRS.length * SORTS.length * 2;
  const pickSearch = seeded(13);
  const searches: Shot[] = [];
  const seen = new Set<number>();
  while (searches.length < Math.min(DISTINCT_SEARCHES, space)) {
    const n = Math.floor(pickSearch() * space);
    if (seen.has(n)) continue;
    seen.add(n);
    let r = n;
    const shop = shops[r % shops.length]!;
    r = Math.floor(r / shops.length);
    const word = WORDS[r % WORDS.length]!;
    r = Math.floor(r / WORDS.length);
    const pair = FACET_PAIRS[r % FACET_PAIRS.length]!;
    r = Math.floor(r / FACET_PAIRS.length);
    const sort = SORTS[r % SORTS.length]!;
    r = Math.floor(r / SORTS.length);
    searches.push({
      group: "search: words + two facets",
      method: "GET",
      path: `/api/casebook?q=${word}&${pair}${sort}${r % 2 === 1 ? "&page=2" : ""}`,
      cookie: shop.cookie,
    });
  }
  const similar: Shot[] = [];
  for (const { shopId, cookie } of shops) {
    const cases = await sequelize.query<{ case_id: number }>(
      "SELECT case_id FROM case_features WHERE shop_id = ? ORDER BY case_id LIMIT ?",
      { replacements: [shopId, SIMILAR_CASES_PER_SHOP], type: QueryTypes.SELECT },
    );
    for (const c of cases)
      similar.push({
        group: "similar cases",
        method: "GET",
        path: `/api/cases/${c.case_id}/similar`,
        cookie,
      });
  }
  await bench.start();
  try {
    for (const t of [searches[0]!, similar[0]!]) {
      const response = await fetch(`${bench.base}${t.path}`, { headers: { cookie: t.cookie } });
      if (!response.ok) throw new Error(`${t.path} answered ${response.status}: ${await response.text()}`);
    }
    console.log(
      `load average before: ${started} (${CONNECTIONS} connections, ${SECONDS} s each; ${searches.length} distinct searches of ${space}, ${similar.length} cases for similar)`,
    );
    // Warm the server's code paths and the database's pages (not the answers' memory: a few of each).
    const warm = seeded(7);
    for (let i = 0; i < 100; i++) {
      const t =
        i % 2
          ? searches[Math.floor(warm() * searches.length)]!
          : similar[Math.floor(warm() * similar.length)]!;
      await fetch(`${bench.base}${t.path}`, { headers: { cookie: t.cookie } });
    }
    for (const [name, shots, goalMs, seed] of [
      ["search", searches, 50, 1],
      ["similar", similar, 100, 2],
    ] as const) {
      const pick = seeded(seed);
      const figures = await runLoad({
        base: bench.base,
        connections: CONNECTIONS,
        seconds: SECONDS,
        next: () => shots[Math.floor(pick() * shots.length)]!,
        cpuMs: bench.cpuMs,
      });
      printLoad(`${name} at ${CONNECTIONS} connections`, figures);
      const g = figures.overall;
      const remembered =
        g.cacheHits + g.cacheMisses > 0 ? (100 * g.cacheHits) / (g.cacheHits + g.cacheMisses) : 0;
      const common = { bench: "casebook", note: `load ${loadNow()}` };
      recordFigure({
        ...common,
        figure: `${name} p95 (${CONNECTIONS} conn.)`,
        value: g.p95,
        unit: "ms",
        goal: { below: goalMs },
      });
      recordFigure({
        ...common,
        figure: `${name} p95 of answers not remembered`,
        value: g.p95Uncached,
        unit: "ms",
      });
      recordFigure({ ...common, figure: `${name} answers remembered`, value: remembered, unit: "%" });
      if (figures.cpuPerRequestMs)
        recordFigure({
          ...common,
          figure: `${name} CPU per answer, app + database`,
          value: figures.cpuPerRequestMs.app + figures.cpuPerRequestMs.db,
          unit: "ms",
          note: `app ${figures.cpuPerRequestMs.app.toFixed(2)} + database ${figures.cpuPerRequestMs.db.toFixed(2)}; ${common.note}`,
        });
      recordFigure({ ...common, figure: `${name} requests/s`, value: g.perSecond, unit: "req/s" });
      recordFigure({
        ...common,
        figure: `${name} errors + non-2xx`,
        value: figures.errors + figures.timeouts + (g.requests - (g.statuses.get(200) ?? 0)),
        unit: "",
        goal: { below: 1 },
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
