import { handler } from "@/lib/server/handler";
import { similarCases } from "@/lib/server/casebook/similar";
import { ANSWER_CACHE_HEADER, rememberedAnswer } from "@/lib/server/casebook/answer-cache";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { similarCasesQuerySchema } from "@/lib/contracts/casebook";

/** The shop's closed cases nearest to this one in their readings, and what each turned out to be. */
export const GET = handler(
  { permission: "casebook:search", params: caseParamsSchema, query: similarCasesQuerySchema },
  async ({ user, params, query, responseHeaders }) => {
    const { value, hit } = await rememberedAnswer(
      { shopId: user.shopId, caseId: params.id, question: `similar:${params.id}:${query.k}` },
      () => similarCases({ shopId: user.shopId, caseId: params.id, k: query.k }),
    );
    responseHeaders.set(ANSWER_CACHE_HEADER, hit ? "hit" : "miss");
    return value;
  },
);
