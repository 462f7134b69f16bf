import { handler } from "@/lib/server/handler";
import { listSpecMatchesForVehicle } from "@/lib/server/specs";
import { specMatchQuerySchema } from "@/lib/contracts/specs";

export const GET = handler(
  { permission: "specs:read", query: specMatchQuerySchema },
  async ({ user, query }) => {
    return listSpecMatchesForVehicle({ shopId: user.shopId, vehicleId: query.vehicleId });
  },
);
