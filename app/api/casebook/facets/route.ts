import { handler } from "@/lib/server/handler";
import { casebookFacets } from "@/lib/server/casebook/facets";
import { ANSWER_CACHE_HEADER, rememberedAnswer } from "@/lib/server/casebook/answer-cache";
import { casebookFiltersSchema } from "@/lib/contracts/casebook";

/** How many of the search's cases carry each facet value (remembered until the shop's next case change). */
export const GET = handler(
  { permission: "casebook:search", query: casebookFiltersSchema },
  async ({ user, query, responseHeaders }) => {
    const { value, hit } = await rememberedAnswer(
      { shopId: user.shopId, question: `facets:${JSON.stringify(query)}` },
      () => casebookFacets({ shopId: user.shopId, filters: query }),
    );
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
