import { NextResponse } from "next/server";
import { readQuery, route } from "@/lib/http/route";
import { noQuerySchema } from "@/lib/validations/paging";

export const dynamic = "force-dynamic";

/**
 * The benchmark's trivial route: a public GET that runs through the same route wrapper and query check
 * as every API route but touches no database, session or body, so `npm run bench` can compare real
 * routes with the framework's own cost per request. It reveals nothing and changes nothing. Takes no
 * parameters (400 naming any), like every route without a query.
 */
export const GET = route(async (request) => {
  readQuery(request, noQuerySchema);
  return NextResponse.json({ ok: true }, { headers: { "Cache-Control": "no-store" } });
});
