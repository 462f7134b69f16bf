import { handler } from "@/lib/server/handler";
import { getPartOilAllowances, setPartOilAllowances } from "@/lib/server/oil-allowances";
import { recordAudit } from "@/lib/server/audit";
import { oilAllowancesInputSchema } from "@/lib/contracts/specs";

export const GET = handler({ permission: "specs:read" }, async ({ user }) => {
  return { allowancesMl: await getPartOilAllowances({ shopId: user.shopId }) };
});

export const PUT = handler(
  { permission: "specs:edit", body: oilAllowancesInputSchema },
  async ({ user, body }) => {
    const allowancesMl = await setPartOilAllowances({ shopId: user.shopId, allowancesMl: body.allowancesMl });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "part_oil_allowance",
      entityId: "all",
      action: "updated",
      detail: body.allowancesMl,
    });
    return { allowancesMl };
  },
);
