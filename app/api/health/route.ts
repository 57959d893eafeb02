import { NextResponse } from "next/server";
import { databaseHealth } from "@/lib/data/health";
import { route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

/** Reports whether the database answers; 503 when it does not. */
export const GET = route(async () => {
  const health = await databaseHealth();
  return NextResponse.json(health, { status: health.ok ? 200 : 503 });
});
