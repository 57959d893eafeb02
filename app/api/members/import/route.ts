import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { importRoster } from "@/lib/data/member-admin";
import { readBodyBytes, route } from "@/lib/http/route";
import { UnsupportedMediaError, ValidationError } from "@/lib/http/errors";
import { decodeRosterText, rosterLimits } from "@/lib/members/roster-import";

/**
 * Admins import a roster: the body is the CSV itself (text/csv or text/plain, UTF-8, at most 200 KB).
 * 200 with the per-row report (the good rows are invited); 400 when the file as a whole is unusable.
 */
export const POST = route(async (request) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can import a roster.");
  const bytes = await readBodyBytes(request, { maxBytes: rosterLimits.maxBytes, types: ["text/csv", "text/plain"] });
  const text = decodeRosterText(bytes);
  if (text === null) throw new UnsupportedMediaError("The roster must be UTF-8 text.");
  const report = await importRoster(actor, text);
  if (report.fileProblem) throw new ValidationError(report.fileProblem, { file: [report.fileProblem] });
  return NextResponse.json(report);
});
