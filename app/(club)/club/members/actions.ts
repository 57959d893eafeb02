"use server";

import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, assertMayManageClub, canManageClub } from "@/lib/auth/permissions";
import { changeMemberRole, importRoster, renameMember, setMemberStatus, type RosterImportReport } from "@/lib/data/member-admin";
import type { MemberSummary } from "@/lib/data/members";
import { roleLabels } from "@/lib/auth/roles";
import { changeRoleSchema, memberEmailChangeSchema, memberStatusSchema, renameMemberSchema } from "@/lib/validations/member-admin";
import { emailChangeLinkHours, requestMemberEmailChange } from "@/lib/data/email-change";
import { parseActionInput } from "@/lib/validations/issues";
import { decodeRosterText, rosterFileProblem, rosterProblemFields } from "@/lib/members/roster-import";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";
import type { FieldErrors } from "@/lib/http/errors";

const membersPath = "/club/members";

/** An admin gives another member a new role; that member's sessions end at their next request. */
export async function changeMemberRoleAction(input: unknown): Promise<ActionResult<MemberSummary>> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(changeRoleSchema, input);
    if (!parsed.success) return { ok: false, message: "Choose the new role.", fieldErrors: parsed.fieldErrors };
    const { memberId, role } = parsed.data;
    const member = await lookUpBy("memberId", "member of your club", () => changeMemberRole(actor, memberId, role));
    revalidatePath(membersPath);
    return {
      ok: true,
      message: `${member.name} is now ${roleLabels[member.role].toLowerCase()}. They sign in again to continue.`,
      data: member,
    };
  } catch (error) {
    return actionFailure(error);
  }
}

/** An admin corrects how another member's name is written; issued certificates keep theirs. */
export async function renameMemberAction(input: unknown): Promise<ActionResult<MemberSummary & { reissueHref: string | null }>> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(renameMemberSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the name.", fieldErrors: parsed.fieldErrors };
    const { memberId, name } = parsed.data;
    const member = await lookUpBy("memberId", "member of your club", () => renameMember(actor, memberId, name));
    revalidatePath(membersPath);
    const { certificatesUnderEarlierName: outdated, ...summary } = member;
    return {
      ok: true,
      message:
        outdated === 0
          ? `Name saved: ${member.name}.`
          : `Name saved: ${member.name}. ${outdated === 1 ? "One current certificate still carries" : `${outdated} current certificates still carry`} the earlier name: reissue ${outdated === 1 ? "it" : "them"} on the athlete's page.`,
      data: { ...summary, reissueHref: outdated === 0 ? null : `/roster/athletes/${member.id}#certificates` },
    };
  } catch (error) {
    return actionFailure(error);
  }
}

/** An admin starts moving another member to a new e-mail address; the member confirms it from there. */
export async function changeMemberEmailAction(input: unknown): Promise<ActionResult<{ newEmail: string }>> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(memberEmailChangeSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the e-mail address.", fieldErrors: parsed.fieldErrors };
    const { memberId, newEmail } = parsed.data;
    const sent = await lookUpBy("memberId", "member of your club", () => requestMemberEmailChange(actor, memberId, newEmail));
    return {
      ok: true,
      message: `A confirmation link is on its way to ${sent.newEmail}. Until it is opened (within ${emailChangeLinkHours} hours) the member signs in with ${sent.currentEmail}.`,
      data: { newEmail: sent.newEmail },
    };
  } catch (error) {
    return actionFailure(error);
  }
}

/** An admin deactivates or reactivates another member; either way their sessions end at once. */
export async function setMemberStatusAction(input: unknown): Promise<ActionResult<MemberSummary>> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
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

/**
 * The import form's one file: FormData with exactly one field, "roster", holding a file (the form
 * builds it so). Anything else is a failure naming what is wrong: the input as a whole ("_"), the
 * roster field, or each unknown field.
 */
function rosterFileOf(formData: unknown): { file: File } | { ok: false; message: string; fieldErrors: FieldErrors } {
  if (!(formData instanceof FormData)) {
    return { ok: false, message: "Send the roster as a form with one file.", fieldErrors: { _: ["Send a form with one field, roster."] } };
  }
  const problems: [string, string[]][] = [...new Set(formData.keys())]
    .filter((name) => name !== "roster")
    .map((name) => [name, ["Not a field of this form."]]);
  const files = formData.getAll("roster");
  const [file] = files;
  const rosterProblem = files.length > 1 ? "Choose one CSV file." : file instanceof File ? null : "Choose a CSV file.";
  if (rosterProblem) problems.unshift(["roster", [rosterProblem]]);
  if (problems.length > 0 || !(file instanceof File)) {
    return { ok: false, message: rosterProblem ?? "The form has fields it does not take.", fieldErrors: Object.fromEntries(problems) };
  }
  return { file };
}

/** An admin uploads a roster CSV (field "roster"): good rows become invitations, the rest are reported. */
export async function importRosterAction(formData: FormData): Promise<ActionResult<RosterImportReport>> {
  try {
    const actor = await requireActor();
    assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can import a roster.");
    const form = rosterFileOf(formData);
    if (!("file" in form)) return form;
    const { file } = form;
    const fileProblem = rosterFileProblem(file);
    if (fileProblem) return { ok: false, message: fileProblem, fieldErrors: { roster: [fileProblem] } };
    const text = decodeRosterText(new Uint8Array(await file.arrayBuffer()));
    if (text === null) {
      const message = "The file is not text: save it from your spreadsheet as CSV (UTF-8).";
      return { ok: false, message, fieldErrors: { roster: [message] } };
    }
    const report = await importRoster(actor, text);
    if (report.fileProblem) return { ok: false, message: report.fileProblem, fieldErrors: { roster: [report.fileProblem] } };
    const invited = report.invited.length;
    // As POST /api/members/import answers 400: the problems under rows.<row>.<column>, the report for the form.
    if (invited === 0) {
      return {
        ok: false,
        message: "No invitations sent: every row had a problem.",
        fieldErrors: rosterProblemFields(report.problems),
        data: report,
      };
    }
    revalidatePath(membersPath);
    const message = `${invited} ${invited === 1 ? "invitation" : "invitations"} sent.${report.problems.length > 0 ? " Some rows were not imported." : ""}`;
    return { ok: true, message, data: report };
  } catch (error) {
    return actionFailure(error);
  }
}
