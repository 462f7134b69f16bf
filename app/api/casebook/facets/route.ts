import { handler } from "@/lib/server/handler";
import { ANSWER_CACHE_HEADER } from "@/lib/server/casebook/answer-cache";
import { rememberedFacets } from "@/lib/server/casebook/remembered";
import { casebookFiltersSchema } from "@/lib/contracts/casebook";

/** How many of the search's cases carry each facet value (remembered until the shop's next case change). */
export const GET = handler(
  { permission: "casebook:search", query: casebookFiltersSchema },
  async ({ user, query, responseHeaders }) => {
    const { value, hit } = await rememberedFacets({ shopId: user.shopId, filters: query });
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
