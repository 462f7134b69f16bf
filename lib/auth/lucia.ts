import "server-only";
import { Lucia } from "lucia";
import { Mysql2Adapter } from "@lucia-auth/adapter-mysql";
import { getMysqlPool } from "@/lib/db/pool";
import { env } from "@/lib/env";
import type { Role } from "./roles";

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
    sessionCookie: {
      name: "cw_session",
      expires: false,
      attributes: { secure: env().APP_ORIGIN.startsWith("https://"), sameSite: "lax" },
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
