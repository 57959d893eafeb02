"use server";

import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { changeMemberRole, importRoster, setMemberStatus, type RosterImportReport } from "@/lib/data/member-admin";
import type { MemberSummary } from "@/lib/data/members";
import { roleLabels } from "@/lib/auth/roles";
import { changeRoleSchema, memberStatusSchema } from "@/lib/validations/member-admin";
import { parseActionInput } from "@/lib/validations/issues";
import { decodeRosterText, rosterFileProblem } from "@/lib/members/roster-import";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";

const membersPath = "/club/members";

/** An admin gives another member a new role; that member's sessions end at their next request. */
export async function changeMemberRoleAction(input: unknown): Promise<ActionResult<MemberSummary>> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(changeRoleSchema, input);
    if (!parsed.success) return { ok: false, message: "Choose the new role.", fieldErrors: parsed.fieldErrors };
    const { memberId, role } = parsed.data;
    const member = await lookUpBy("memberId", "member of your club", () => changeMemberRole(actor, memberId, role));
    revalidatePath(membersPath);
    return { ok: true, message: `${member.name} is now ${roleLabels[member.role].toLowerCase()}. They sign in again to continue.`, data: member };
  } catch (error) {
    return actionFailure(error);
  }
}

/** An admin deactivates or reactivates another member; either way their sessions end at once. */
export async function setMemberStatusAction(input: unknown): Promise<ActionResult<MemberSummary>> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(memberStatusSchema, input);
    if (!parsed.success) return { ok: false, message: "Choose a member.", fieldErrors: parsed.fieldErrors };
    const { memberId, status } = parsed.data;
    const member = await lookUpBy("memberId", "member of your club", () => setMemberStatus(actor, memberId, status));
    revalidatePath(membersPath);
    const message =
      member.status === "deactivated"
        ? `${member.name} is deactivated: signed out and unable to sign in. Their records are kept.`
        : `${member.name} is active again and can sign in.`;
    return { ok: true, message, data: member };
  } catch (error) {
    return actionFailure(error);
  }
}

/** An admin uploads a roster CSV (field "roster"): good rows become invitations, the rest are reported. */
export async function importRosterAction(formData: FormData): Promise<ActionResult<RosterImportReport>> {
  try {
    const actor = await requireActor();
    assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can import a roster.");
    const file = formData.get("roster");
    if (!(file instanceof File)) return { ok: false, message: "Choose a CSV file.", fieldErrors: { roster: ["Choose a CSV file."] } };
    const fileProblem = rosterFileProblem(file);
    if (fileProblem) return { ok: false, message: fileProblem, fieldErrors: { roster: [fileProblem] } };
    const text = decodeRosterText(new Uint8Array(await file.arrayBuffer()));
    if (text === null) {
      const message = "The file is not text: save it from your spreadsheet as CSV (UTF-8).";
      return { ok: false, message, fieldErrors: { roster: [message] } };
    }
    const report = await importRoster(actor, text);
    if (report.fileProblem) return { ok: false, message: report.fileProblem, fieldErrors: { roster: [report.fileProblem] } };
    revalidatePath(membersPath);
    const invited = report.invited.length;
    const message =
      invited === 0
        ? "No invitations sent: every row had a problem."
        : `${invited} ${invited === 1 ? "invitation" : "invitations"} sent.${report.problems.length > 0 ? " Some rows were not imported." : ""}`;
    return { ok: true, message, data: report };
  } catch (error) {
    return actionFailure(error);
  }
}
