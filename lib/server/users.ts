import "server-only";
import { pageOf } from "./paging";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/auth/roles";
import type { ShopUser, UserListResponse } from "@/lib/contracts/users";
import { recordAudit } from "./audit";
import { forgetUserSessions } from "@/lib/auth/session-cache";

const PUBLIC_ATTRIBUTES = ["id", "email", "name", "role", "active"] as const;

function toShopUser(row: {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean | number;
}): ShopUser {
  return { id: row.id, email: row.email, name: row.name, role: row.role, active: Boolean(row.active) };
}

export async function listUsers({
  shopId,
  limit = 100,
  offset = 0,
}: {
  shopId: number;
  limit?: number;
  offset?: number;
}): Promise<UserListResponse> {
  const { User } = getModels();
  const rows = await User.findAll({
    where: { shopId },
    attributes: [...PUBLIC_ATTRIBUTES],
    order: [
      ["name", "ASC"],
      ["id", "ASC"],
    ],
    limit: limit + 1,
    offset,
    raw: true,
  });
  const page = pageOf(rows, { limit, offset });
  return { users: page.items.map(toShopUser), nextOffset: page.nextOffset };
}

export async function updateUser({
  shopId,
  userId,
  actorId,
  role,
  active,
}: {
  shopId: number;
  userId: string;
  actorId: string;
  role?: Role;
  active?: boolean;
}): Promise<ShopUser> {
  const { User, sequelize } = getModels();
  const updated = await sequelize.transaction(async (transaction) => {
    const user = await User.findOne({ where: { id: userId, shopId }, transaction });
    if (!user) throw new AppError("not_found:user", "No such user in this shop.");
    if (userId === actorId && ((role && role !== "owner") || active === false)) {
      throw new AppError("conflict:user", "You cannot remove your own owner role or deactivate yourself.");
    }
    if (role) user.set("role", role);
    if (active !== undefined) user.set("active", active);
    await user.save({ transaction });
    await recordAudit({
      shopId,
      actorId,
      entity: "user",
      entityId: user.id,
      action: "update",
      detail: { ...(role !== undefined ? { role } : {}), ...(active !== undefined ? { active } : {}) },
      transaction,
    });
    return toShopUser(user.get({ plain: true }));
  });
  // After the commit, so no request in between can remember the old role or a deactivated person again.
  forgetUserSessions(userId);
  return updated;
}
