import { handler } from "@/lib/server/handler";
import { ANSWER_CACHE_HEADER } from "@/lib/server/casebook/answer-cache";
import { rememberedSearch } from "@/lib/server/casebook/remembered";
import { casebookSearchQuerySchema } from "@/lib/contracts/casebook";

/** One page of the shop's cases matching the words and filters, with the total. */
export const GET = handler(
  { permission: "casebook:search", query: casebookSearchQuerySchema },
  async ({ user, query, responseHeaders }) => {
    const { value, hit } = await rememberedSearch({ shopId: user.shopId, query });
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
