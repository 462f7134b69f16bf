import mysql from "mysql2/promise";
import { databaseConfig } from "@/lib/env";

// The mysql2 pool Lucia's adapter needs, on the same database as Sequelize.
// timezone "Z" so DATETIME values (session expiry) are written and read as UTC, matching Sequelize.

const cache = globalThis as typeof globalThis & { chillwrightMysqlPool?: mysql.Pool };

export function getMysqlPool(): mysql.Pool {
  if (!cache.chillwrightMysqlPool) {
    const settings = databaseConfig();
    cache.chillwrightMysqlPool = mysql.createPool({
      host: settings.host,
      port: settings.port,
      user: settings.user,
      password: settings.password,
      database: settings.database,
      charset: "utf8mb4_unicode_ci",
      timezone: "Z",
      connectionLimit: 5,
      waitForConnections: true,
    });
  }
  return cache.chillwrightMysqlPool;
}

export async function closeMysqlPool(): Promise<void> {
  const pool = cache.chillwrightMysqlPool;
  cache.chillwrightMysqlPool = undefined;
  await pool?.end();
}
