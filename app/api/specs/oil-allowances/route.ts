import { handler } from "@/lib/server/handler";
import { getPartOilAllowances, setPartOilAllowances } from "@/lib/server/oil-allowances";
import { oilAllowancesInputSchema } from "@/lib/contracts/specs";

export const GET = handler({ permission: "specs:read" }, async ({ user }) => {
  return { allowancesMl: await getPartOilAllowances({ shopId: user.shopId }) };
});

export const PUT = handler(
  { permission: "specs:edit", body: oilAllowancesInputSchema },
  async ({ user, body }) => ({
    allowancesMl: await setPartOilAllowances({
      shopId: user.shopId,
      actorId: user.id,
      allowancesMl: body.allowancesMl,
    }),
  }),
);
