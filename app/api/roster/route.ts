import { NextResponse } from "next/server";
import { assertMayListMembers } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { pageOfClubMembers } from "@/lib/data/members";
import { readQuery, route } from "@/lib/http/route";
import { pageQuerySchema } from "@/lib/validations/paging";

export const dynamic = "force-dynamic";

/**
 * The club's athletes for coaches and admins, by name, a page at a time: `?limit=` (1–500, default 100)
 * and `?offset=`. Answers `{ athletes, total, limit, offset, nextOffset }`; nextOffset is null on the last page.
 */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMayListMembers(actor);
  const query = readQuery(request, pageQuerySchema);
  const { items, ...paging } = await pageOfClubMembers(actor, "athlete", query);
  return NextResponse.json({ athletes: items, ...paging });
});
