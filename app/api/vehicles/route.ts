import { handler } from "@/lib/server/handler";
import { listVehicleChoices } from "@/lib/server/vehicles";
import { vehicleListQuerySchema } from "@/lib/contracts/vehicles";

export const GET = handler(
  { permission: "cases:read", query: vehicleListQuerySchema },
  async ({ user, query }) => {
    return listVehicleChoices({
      shopId: user.shopId,
      search: query.q,
      limit: query.limit,
      offset: query.offset,
    });
  },
);
