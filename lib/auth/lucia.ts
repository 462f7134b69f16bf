import "server-only";
import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from "lucia";
import { Mysql2Adapter } from "@lucia-auth/adapter-mysql";
import type { Pool, RowDataPacket } from "mysql2/promise";
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

/**
 * Lucia's MySQL adapter, on Lucia's standard tables, except that a session and its user are read in one
 * query (the adapter sends two, a session read and a join, for every validation), and only the user
 * columns getUserAttributes reads: not the password hash or the person's settings.
 */
export class OneReadMysql2Adapter extends Mysql2Adapter {
  constructor(private readonly pool: Pool) {
    super(pool, { user: "user", session: "user_session" });
  }

  override async getSessionAndUser(
    sessionId: string,
  ): Promise<[session: DatabaseSession | null, user: DatabaseUser | null]> {
    const [rows] = await this.pool.query<RowDataPacket[]>(
      `SELECT s.id, s.user_id, s.expires_at, u.id AS user_row_id, u.email, u.name, u.role, u.shop_id, u.active
         FROM user_session s
         LEFT JOIN user u ON u.id = s.user_id
        WHERE s.id = ?`,
      [sessionId],
    );
    const row = rows[0];
    if (!row) return [null, null];
    const expiresAt =
      row.expires_at instanceof Date ? row.expires_at : new Date(`${String(row.expires_at)} GMT`);
    const session: DatabaseSession = { id: row.id, userId: row.user_id, expiresAt, attributes: {} };
    const user: DatabaseUser | null =
      row.user_row_id === null
        ? null
        : {
            id: row.user_row_id,
            attributes: {
              email: row.email,
              name: row.name,
              role: row.role,
              shop_id: row.shop_id,
              active: row.active,
            },
          };
    return [session, user];
  }
}

function createLucia() {
  const adapter = new OneReadMysql2Adapter(getMysqlPool());
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
