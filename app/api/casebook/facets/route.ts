import { handler } from "@/lib/server/handler";
import { casebookFacets } from "@/lib/server/casebook/facets";
import { casebookFiltersSchema } from "@/lib/contracts/casebook";

/** How many of the search's cases carry each facet value. */
export const GET = handler(
  { permission: "casebook:search", query: casebookFiltersSchema },
  async ({ user, query }) => casebookFacets({ shopId: user.shopId, filters: query }),
);
