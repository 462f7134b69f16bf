import { handler } from "@/lib/server/handler";
import { searchCasebook } from "@/lib/server/casebook/search";
import { ANSWER_CACHE_HEADER, rememberedAnswer } from "@/lib/server/casebook/answer-cache";
import { casebookSearchQuerySchema } from "@/lib/contracts/casebook";

/** One page of the shop's cases matching the words and filters, with the total. */
export const GET = handler(
  { permission: "casebook:search", query: casebookSearchQuerySchema },
  async ({ user, query, responseHeaders }) => {
    // The parsed query (zod's fixed key order, defaults filled in) is the question, so equal searches
    // written differently share one answer.
    const { value, hit } = await rememberedAnswer(
      { shopId: user.shopId, question: `search:${JSON.stringify(query)}` },
      () => searchCasebook({ shopId: user.shopId, query }),
    );
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
