import { NextResponse } from "next/server";
import { databaseHealth } from "@/lib/data/health";
import { readQuery, route } from "@/lib/http/route";
import { noQuerySchema } from "@/lib/validations/paging";

export const dynamic = "force-dynamic";

/** Reports whether the database answers; 503 when it does not. Takes no parameters (400 naming any). */
export const GET = route(async (request) => {
  readQuery(request, noQuerySchema);
  const health = await databaseHealth();
  return NextResponse.json(health, { status: health.ok ? 200 : 503 });
});
