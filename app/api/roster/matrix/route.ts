import { NextResponse } from "next/server";
import { assertMaySeeRoster } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { readQuery, route } from "@/lib/http/route";
import { noQuerySchema } from "@/lib/validations/paging";
import { rosterMatrix } from "@/lib/data/clearance";
import type { RosterMatrix } from "@/lib/clearance/roster";

export const dynamic = "force-dynamic";

/**
 * The JSON of each kept matrix: rosterMatrix answers the same object until the next write, and turning
 * 1,000 athletes into JSON on every request cost more than reading the kept matrix.
 */
const serialized = new WeakMap<RosterMatrix, string>();

/** Coaches and admins: the club's active athletes × modules with each one's clearance. Takes no parameters (400 naming any). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMaySeeRoster(actor);
  readQuery(request, noQuerySchema);
  const matrix = await rosterMatrix(actor);
  let body = serialized.get(matrix);
  if (body === undefined) {
    body = JSON.stringify(matrix);
    serialized.set(matrix, body);
  }
  return new NextResponse(body, { headers: { "Content-Type": "application/json", "Cache-Control": "private, no-store" } });
});
