import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { listClubMembers } from "@/lib/data/members";
import { route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

/** The club's athletes for coaches and admins. */
export const GET = route(async () => {
  const actor = await requireActor();
  const athletes = await listClubMembers(actor, "athlete");
  return NextResponse.json({ athletes });
});
