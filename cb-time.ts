import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import { closeSequelize } from "@/lib/db/sequelize";
import { casebookSearchQuerySchema } from "@/lib/contracts/casebook";
import { searchCasebook } from "@/lib/server/casebook/search";
import { similarCases } from "@/lib/server/casebook/similar";
import { casebookFacets } from "@/lib/server/casebook/facets";
async function main() {
  const queries = [
    "q=idle&refrigerant=R-134a&device=orifice_tube",
    "q=warm idle fan&status=closed&suspect=undercharge",
    "q=grinding&make=Ford&status=closed",
    "q=ac&status=closed",
    "refrigerant=R-134a",
    "",
  ];
  for (const qs of queries) {
    const query = casebookSearchQuerySchema.parse(Object.fromEntries(new URLSearchParams(qs)));
    await searchCasebook({ shopId: 1, query });
    let t = performance.now();
    let total = 0;
    for (let i = 0; i < 40; i++) total = (await searchCasebook({ shopId: 1 + (i % 50), query })).total;
    const ms = (performance.now() - t) / 40;
    t = performance.now();
    for (let i = 0; i < 10; i++) await casebookFacets({ shopId: 1 + (i % 50), filters: query });
    console.log(
      qs.padEnd(50),
      "search",
      ms.toFixed(2),
      "ms",
      total,
      "facets",
      ((performance.now() - t) / 10).toFixed(1),
    );
  }
  const ids = await getModels().sequelize.query<{ case_id: number; shop_id: number }>(
    "SELECT case_id, shop_id FROM case_features ORDER BY RAND() LIMIT 40",
    { type: QueryTypes.SELECT },
  );
  const t = performance.now();
  let n = 0;
  for (const r of ids) n += (await similarCases({ shopId: r.shop_id, caseId: r.case_id })).neighbours.length;
  console.log("similar", ((performance.now() - t) / ids.length).toFixed(2), "ms", n / ids.length);
}
main().finally(() => closeSequelize());
