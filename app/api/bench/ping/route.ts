import { NextResponse } from "next/server";
import { route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

/**
 * The benchmark's trivial route: a public GET that runs through the same route wrapper as every API
 * route but touches no database, session or input, so `npm run bench` can compare real routes with the
 * framework's own cost per request. It reveals nothing and changes nothing.
 */
export const GET = route(async () => NextResponse.json({ ok: true }, { headers: { "Cache-Control": "no-store" } }));
