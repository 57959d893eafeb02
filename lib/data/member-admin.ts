import "server-only";
import { Op, type Transaction } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { inviteMembers, openInvitationWhere, renameUser } from "@/lib/data/users";
import { countUnderEarlierName } from "@/lib/data/certificate-reissue";
import { clubToday } from "@/lib/data/club-settings";
import type { MemberSummary } from "@/lib/data/members";
import { assertAllowed, assertVisible, canChangeMember, canManageClub, type Actor } from "@/lib/auth/permissions";
import type { Role, UserStatus } from "@/lib/auth/roles";
import { checkRoster, type RosterEntry, type RosterProblem } from "@/lib/members/roster-import";
import { ForbiddenError } from "@/lib/http/errors";
import { Invitation, User } from "@/models";

function toSummary(user: User): MemberSummary {
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    status: user.status,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
  };
}

/**
 * Loads a member for a change by an admin inside the write transaction: 403 for non-admins, 404 for
 * anyone outside the admin's club, 403 for the admin's own account.
 */
async function memberToChange(actor: Actor, memberId: number, transaction: Transaction): Promise<User> {
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change members.");
  const member = await User.findByPk(memberId, { transaction });
  assertVisible(member !== null && member.clubId === actor.clubId);
  assertAllowed(canChangeMember(actor, member), "You cannot change your own role or deactivate yourself. Ask another administrator.");
  return member;
}

/**
 * An admin gives another member of their club a new role. The member's token version moves on, so their
 * current sessions end at their next request and they sign in again with the new role.
 */
export async function changeMemberRole(actor: Actor, memberId: number, role: Role): Promise<MemberSummary> {
  await databaseReady();
  return writeTransaction(async (transaction) => {
    const member = await memberToChange(actor, memberId, transaction);
    if (member.role === role) return toSummary(member);
    const from = member.role;
    await member.update({ role, tokenVersion: member.tokenVersion + 1 }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "member.role_changed",
        subjectType: "user",
        subjectId: member.id,
        details: { from, to: role },
      },
      transaction,
    );
    return toSummary(member);
  });
}

/**
 * An admin corrects how another member's name is written (a typo in an invitation or a roster file).
 * Certificates already issued keep the name they were issued to (the count of those still holding is
 * returned, for reissuing them); new ones, the roster and the register's member column use the new one. Sessions go on: nothing about what the member may do changed.
 */
export async function renameMember(
  actor: Actor,
  memberId: number,
  name: string,
): Promise<MemberSummary & { certificatesUnderEarlierName: number }> {
  await databaseReady();
  const trimmed = name.trim();
  const today = await clubToday(actor.clubId);
  return writeTransaction(async (transaction) => {
    if (memberId === actor.id && canManageClub(actor, actor.clubId)) throw new ForbiddenError("Correct your own name under Your account.");
    const member = await memberToChange(actor, memberId, transaction);
    await renameUser(member, trimmed, actor.id, transaction);
    return { ...toSummary(member), certificatesUnderEarlierName: await countUnderEarlierName(member.id, trimmed, today, transaction) };
  });
}

/**
 * An admin deactivates (blocks sign-in, ends sessions at their next request, keeps every record) or
 * reactivates another member of their club. Both move the token version on.
 */
export async function setMemberStatus(actor: Actor, memberId: number, status: UserStatus): Promise<MemberSummary> {
  await databaseReady();
  return writeTransaction(async (transaction) => {
    const member = await memberToChange(actor, memberId, transaction);
    if (member.status === status) return toSummary(member);
    await member.update({ status, tokenVersion: member.tokenVersion + 1 }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: status === "deactivated" ? "member.deactivated" : "member.reactivated",
        subjectType: "user",
        subjectId: member.id,
      },
      transaction,
    );
    return toSummary(member);
  });
}

export interface RosterImportReport {
  fileProblem: string | null;
  rowCount: number;
  invited: RosterEntry[];
  problems: RosterProblem[];
  /** Addresses whose invitation was created but whose e-mail could not be sent. */
  unsent: string[];
}

/**
 * Imports a roster CSV as invitations: rows with problems (including addresses that already have an
 * account or an open invitation to this club) are reported, the good rows are invited and e-mailed.
 */
export async function importRoster(actor: Actor, text: string): Promise<RosterImportReport> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can import a roster.");
  const firstPass = checkRoster(text);
  if (firstPass.fileProblem) return { ...firstPass, invited: [], unsent: [] };

  const emails = [...new Set(firstPass.entries.map((entry) => entry.email))];
  const [users, invitations] = await Promise.all([
    User.findAll({ where: { email: { [Op.in]: emails } }, attributes: ["email"] }),
    Invitation.findAll({
      where: { clubId: actor.clubId, email: { [Op.in]: emails }, ...openInvitationWhere() },
      attributes: ["email"],
    }),
  ]);
  const check = checkRoster(text, {
    existingEmails: new Set(users.map((user) => user.email)),
    pendingEmails: new Set(invitations.map((invitation) => invitation.email)),
  });
  const { unsent } = check.entries.length > 0 ? await inviteMembers(actor, check.entries, "roster-import") : { unsent: [] };
  if (check.entries.length > 0) {
    await writeTransaction((transaction) =>
      recordAudit(
        {
          clubId: actor.clubId,
          actorId: actor.id,
          action: "member.roster_imported",
          subjectType: "club",
          subjectId: actor.clubId,
          details: { rows: check.rowCount, invited: check.entries.length, problems: check.problems.length },
        },
        transaction,
      ),
    );
  }
  return { fileProblem: null, rowCount: check.rowCount, invited: check.entries, problems: check.problems, unsent };
}
