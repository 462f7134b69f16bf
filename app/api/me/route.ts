import { handler } from "@/lib/server/handler";
import { getShop } from "@/lib/server/shops";

export const GET = handler({ permission: "cases:read" }, async ({ user }) => {
  const shop = await getShop({ shopId: user.shopId });
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, shop };
});
