import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { route } from "@/lib/http/route";
import { rosterMatrix } from "@/lib/data/clearance";

export const dynamic = "force-dynamic";

/** Coaches and admins: the club's active athletes × modules with each one's clearance. */
export const GET = route(async () => {
  const actor = await requireActor();
  return NextResponse.json(await rosterMatrix(actor), { headers: { "Cache-Control": "private, no-store" } });
});
