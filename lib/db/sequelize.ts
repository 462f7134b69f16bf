import { Sequelize } from "sequelize";
import { databaseConfig } from "@/lib/env";
import { mariadbDriver } from "./mariadb-driver";

// No "server-only" here: tsx scripts and vitest import this module too.

type DatabaseSettings = ReturnType<typeof databaseConfig>;

const cache = globalThis as typeof globalThis & { chillwrightSequelize?: Sequelize };

/** A Sequelize instance with the house settings; prefer getSequelize() outside tests and scripts. */
export function createSequelize(settings: DatabaseSettings = databaseConfig()): Sequelize {
  return new Sequelize(settings.database, settings.user, settings.password, {
    dialect: "mariadb",
    dialectModule: mariadbDriver,
    host: settings.host,
    port: settings.port,
    logging: false,
    timezone: "+00:00",
    define: { underscored: true, charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
    dialectOptions: { connectTimeout: 10_000 },
    pool: { max: 5, min: 0, idle: 10_000, acquire: 30_000 },
  });
}

/** The process-wide instance, created on first use from DATABASE_URL. */
export function getSequelize(): Sequelize {
  cache.chillwrightSequelize ??= createSequelize();
  return cache.chillwrightSequelize;
}

/** Closes the process-wide instance (scripts and test teardown). */
export async function closeSequelize(): Promise<void> {
  const instance = cache.chillwrightSequelize;
  cache.chillwrightSequelize = undefined;
  await instance?.close();
}
