import { handler } from "@/lib/server/handler";
import { ANSWER_CACHE_HEADER } from "@/lib/server/casebook/answer-cache";
import { rememberedSimilar } from "@/lib/server/casebook/remembered";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { similarCasesQuerySchema } from "@/lib/contracts/casebook";

/** The shop's closed cases nearest to this one in their readings, and what each turned out to be. */
export const GET = handler(
  { permission: "casebook:search", params: caseParamsSchema, query: similarCasesQuerySchema },
  async ({ user, params, query, responseHeaders }) => {
    const { value, hit } = await rememberedSimilar({ shopId: user.shopId, caseId: params.id, k: query.k });
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
