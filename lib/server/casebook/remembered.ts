import "server-only";
import type { CasebookFilters, CasebookSearchQuery } from "@/lib/contracts/casebook";
import { rememberedAnswer } from "./answer-cache";
import { casebookFacets } from "./facets";
import { searchCasebook } from "./search";
import { similarCases } from "./similar";

// Each casebook route makes one call: these ask the shop's answer memory first (./answer-cache.ts) and say
// whether it answered, so the route can tell the benches in its header.

/** A search; the parsed query (zod's fixed key order, defaults filled in) is the question, so equal searches
 * written differently share one answer. */
export function rememberedSearch({ shopId, query }: { shopId: number; query: CasebookSearchQuery }) {
  return rememberedAnswer({ shopId, question: `search:${JSON.stringify(query)}` }, () =>
    searchCasebook({ shopId, query }),
  );
}

/** How many of the search's cases carry each facet value. */
export function rememberedFacets({ shopId, filters }: { shopId: number; filters: CasebookFilters }) {
  return rememberedAnswer({ shopId, question: `facets:${JSON.stringify(filters)}` }, () =>
    casebookFacets({ shopId, filters }),
  );
}

/** The shop's closed cases nearest to this one, keyed by the case's own version too. */
export function rememberedSimilar({ shopId, caseId, k }: { shopId: number; caseId: number; k: number }) {
  return rememberedAnswer({ shopId, caseId, question: `similar:${caseId}:${k}` }, () =>
    similarCases({ shopId, caseId, k }),
  );
}
