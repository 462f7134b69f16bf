import "server-only";
import { QueryTypes } from "sequelize";
import { getSequelize } from "@/lib/db/sequelize";

/** Whether the database answers, and how fast; never throws. */
export async function databaseHealth(): Promise<{ ok: true; latencyMs: number } | { ok: false }> {
  const started = performance.now();
  try {
    await getSequelize().query("SELECT 1", { type: QueryTypes.SELECT });
    return { ok: true, latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    console.error("Health check: database did not answer", error);
    return { ok: false };
  }
}
