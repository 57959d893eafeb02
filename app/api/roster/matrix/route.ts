import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { readQuery, route } from "@/lib/http/route";
import { noQuerySchema } from "@/lib/validations/certification";
import { rosterMatrix } from "@/lib/data/clearance";

export const dynamic = "force-dynamic";

/** Coaches and admins: the club's active athletes × modules with each one's clearance. Takes no parameters (400 naming any). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  readQuery(request, noQuerySchema);
  return NextResponse.json(await rosterMatrix(actor), { headers: { "Cache-Control": "private, no-store" } });
});
