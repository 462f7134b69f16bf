import { NextResponse } from "next/server";
import { databaseHealth } from "@/lib/server/health";
import { API_CACHE_CONTROL } from "@/lib/security/headers";

export const dynamic = "force-dynamic";

export async function GET() {
  const health = await databaseHealth();
  return health.ok
    ? NextResponse.json(
        { status: "ok", database: "ok", latencyMs: health.latencyMs },
        { headers: { "Cache-Control": API_CACHE_CONTROL } },
      )
    : NextResponse.json(
        { status: "degraded", database: "unreachable" },
        { status: 503, headers: { "Cache-Control": API_CACHE_CONTROL } },
      );
}
