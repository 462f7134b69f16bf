import { handler } from "@/lib/server/handler";
import { reverseMovement } from "@/lib/server/ledger-post";
import { movementParamsSchema, reversalSchema } from "@/lib/contracts/ledger";

/** Cancel a wrong line with a reason; the line stays and the correction is posted beside it. */
export const POST = handler(
  { permission: "ledger:write", params: movementParamsSchema, body: reversalSchema },
  async ({ user, params, body }) => {
    const reversal = await reverseMovement({ user, id: params.id, input: body });
    return Response.json(reversal, { status: 201 });
  },
);
