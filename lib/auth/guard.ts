import "server-only";
import { forbidden, redirect } from "next/navigation";
import type { User } from "lucia";
import { validateRequest } from "./session";
import { can, type Permission } from "./roles";

/** For protected pages: no session → sign-in; a role without the permission → the 403 page. */
export async function requireUser(permission?: Permission): Promise<User> {
  const { user } = await validateRequest();
  if (!user) redirect("/sign-in");
  if (permission && !can(user.role, permission)) forbidden();
  return user;
}
