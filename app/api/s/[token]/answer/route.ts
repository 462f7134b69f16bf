import { ownerAnswerSchema, rawTokenParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { tokenFromParams } from "@/lib/server/public-token";
import { answerProposal } from "@/lib/server/repair-proposals";

/** The owner's yes or no to the proposed repair. Public: the link is the key. */
export const POST = handler(
  { public: true, params: rawTokenParamsSchema, body: ownerAnswerSchema },
  async ({ params, body }) => answerProposal({ token: tokenFromParams(params), input: body }),
);
