import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { importRoster } from "@/lib/data/member-admin";
import { readBodyBytes, route } from "@/lib/http/route";
import { AppError, UnsupportedMediaError, ValidationError } from "@/lib/http/errors";
import { decodeRosterText, rosterLimits, rosterProblemFields } from "@/lib/members/roster-import";

/**
 * Admins import a roster: the body is the CSV itself (text/csv or text/plain, UTF-8, at most 200 KB).
 * 200 with the per-row report when at least one row was invited; 400 when the file as a whole is
 * unusable, or when no row could be invited (the report's problems as fields "rows.<row>.<column>").
 */
export const POST = route(async (request) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can import a roster.");
  const bytes = await readBodyBytes(request, { maxBytes: rosterLimits.maxBytes, types: ["text/csv", "text/plain"], field: "file" });
  const text = decodeRosterText(bytes);
  if (text === null) throw new UnsupportedMediaError("the roster must be UTF-8 text.", "file");
  const report = await importRoster(actor, text);
  if (report.fileProblem) throw new ValidationError(`file: ${report.fileProblem}`, { file: [report.fileProblem] });
  if (report.invited.length === 0) {
    const fields = rosterProblemFields(report.problems);
    const first = Object.entries(fields)[0];
    const message = first ? `${first[0]}: ${first[1][0]} No row could be invited.` : "file: no row could be invited.";
    throw new AppError(400, "invalid_input", message, fields, { report });
  }
  return NextResponse.json(report);
});
