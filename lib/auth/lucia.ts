import "server-only";
import { Lucia, TimeSpan } from "lucia";
import { Mysql2Adapter } from "@lucia-auth/adapter-mysql";
import { getMysqlPool } from "@/lib/db/pool";
import { env } from "@/lib/env";
import { secureCookies } from "@/lib/security/cookies";
import type { Role } from "./roles";

/** How long a session lives without use; its cookie lives exactly as long (Max-Age), not 400 days. */
export const SESSION_LIFETIME = new TimeSpan(30, "d");

interface DatabaseUserAttributes {
  email: string;
  name: string;
  role: Role;
  shop_id: number;
  active: number | boolean;
}

function createLucia() {
  const adapter = new Mysql2Adapter(getMysqlPool(), { user: "user", session: "user_session" });
  return new Lucia(adapter, {
    sessionExpiresIn: SESSION_LIFETIME,
    sessionCookie: {
      name: "cw_session",
      // true: Max-Age follows sessionExpiresIn; a refreshed session sends a refreshed cookie.
      expires: true,
      attributes: { secure: secureCookies(env().APP_ORIGIN), sameSite: "lax" },
    },
    getUserAttributes: (attributes) => ({
      email: attributes.email,
      name: attributes.name,
      role: attributes.role,
      shopId: Number(attributes.shop_id),
      active: Boolean(attributes.active),
    }),
  });
}

const globalForLucia = globalThis as unknown as { chillwrightLucia?: ReturnType<typeof createLucia> };

export function getLucia() {
  globalForLucia.chillwrightLucia ??= createLucia();
  return globalForLucia.chillwrightLucia;
}

declare module "lucia" {
  interface Register {
    Lucia: ReturnType<typeof createLucia>;
    DatabaseUserAttributes: DatabaseUserAttributes;
  }
}
