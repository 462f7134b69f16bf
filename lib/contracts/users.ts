import { z } from "zod";
import { pageQuery, type PageInfo } from "./paging";
import { ROLES, type Role } from "@/lib/auth/roles";

export const updateUserSchema = z
  .object({
    role: z.enum(ROLES, { message: "Choose one of: owner, senior, technician, apprentice." }).optional(),
    active: z.boolean({ message: "active is true or false." }).optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined, {
    message: "Nothing to change: send a role or active.",
  });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const userParamsSchema = z.object({ id: z.string().regex(/^[a-z0-9]{8,40}$/, "Not a user id.") });

/** A person of the shop as the people screen shows them; never the password hash. */
export interface ShopUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
}

/** GET /api/users. */
export const userListQuerySchema = pageQuery({ defaultLimit: 100, maxLimit: 200 });

export interface UserListResponse extends PageInfo {
  users: ShopUser[];
}

/** POST /api/users and PATCH /api/users/[id]. */
export interface UserResponse {
  user: ShopUser;
}
