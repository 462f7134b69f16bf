import { NextResponse } from "next/server";
import { QueryTypes } from "sequelize";
import { getSequelize } from "@/lib/db/sequelize";

export const dynamic = "force-dynamic";

export async function GET() {
  const started = performance.now();
  try {
    await getSequelize().query("SELECT 1", { type: QueryTypes.SELECT });
    return NextResponse.json({
      status: "ok",
      database: "ok",
      latencyMs: Math.round(performance.now() - started),
    });
  } catch (error) {
    console.error("Health check: database did not answer", error);
    return NextResponse.json({ status: "degraded", database: "unreachable" }, { status: 503 });
  }
}
