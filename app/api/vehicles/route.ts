import { z } from "zod";
import { handler } from "@/lib/server/handler";
import { listVehicleChoices } from "@/lib/server/vehicles";

const querySchema = z.object({ q: z.string().max(80, "Search with fewer than 80 characters.").optional() });

export const GET = handler({ permission: "cases:read", query: querySchema }, async ({ user, query }) => {
  return { vehicles: await listVehicleChoices({ shopId: user.shopId, search: query.q }) };
});
