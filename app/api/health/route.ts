import { NextResponse } from "next/server";
import { databaseHealth } from "@/lib/server/health";

export const dynamic = "force-dynamic";

export async function GET() {
  const health = await databaseHealth();
  return health.ok
    ? NextResponse.json({ status: "ok", database: "ok", latencyMs: health.latencyMs })
    : NextResponse.json({ status: "degraded", database: "unreachable" }, { status: 503 });
}
