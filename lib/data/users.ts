import "server-only";
import { Op, type Transaction } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { selectRows } from "@/lib/data/sql";
import { recordAudit } from "@/lib/data/audit";
import { countUnderEarlierName } from "@/lib/data/certificate-reissue";
import { clubToday } from "@/lib/data/club-settings";
import type { Actor } from "@/lib/auth/permissions";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { hashPassword, passwordProblem, verifyAgainstDecoy, verifyPassword } from "@/lib/auth/password";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { ConflictError, NotFoundError, TooManyRequestsError, ValidationError } from "@/lib/http/errors";
import { isSignInThrottled, recordSignInFailure } from "@/lib/auth/throttle";
import { linkSessionGraceMinutes } from "@/lib/auth/password-rules";
import { sendMail } from "@/lib/mail/send";
import { publicBaseUrl } from "@/lib/env";
import type { Role } from "@/lib/auth/roles";
import { Club, Invitation, SignInLink, User } from "@/models";

/** A signed-in user plus the token version their session must carry. */
export interface SessionUser extends Actor {
  tokenVersion: number;
}

const invitationDays = 14;
const signInLinkMinutes = 20;

function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    clubId: user.clubId,
    role: user.role,
    name: user.name,
    email: user.email,
    tokenVersion: user.tokenVersion,
  };
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

async function markSignedIn(userId: number): Promise<void> {
  await writeTransaction(async (transaction) => {
    await User.update({ lastSignInAt: new Date() }, { where: { id: userId }, transaction });
  });
}

/** E-mail and password; null for any failure (unknown account, wrong password, deactivated). */
export async function authenticateWithPassword(email: string, password: string): Promise<SessionUser | null> {
  await databaseReady();
  const user = await User.findOne({ where: { email: normaliseEmail(email) } });
  if (!user || !user.passwordHash || user.status !== "active") {
    return verifyAgainstDecoy(password).then(() => null);
  }
  if (!(await verifyPassword(password, user.passwordHash))) return null;
  await markSignedIn(user.id);
  return toSessionUser(user);
}

/** Consumes a one-time sign-in link; null when unknown, used or expired. */
export async function authenticateWithLink(token: string): Promise<SessionUser | null> {
  await databaseReady();
  const userId = await writeTransaction(async (transaction) => {
    const link = await SignInLink.findOne({ where: { tokenHash: hashToken(token) }, transaction });
    if (!link || link.usedAt || link.expiresAt.getTime() < Date.now()) return null;
    await link.update({ usedAt: new Date() }, { transaction });
    return link.userId;
  });
  if (!userId) return null;
  const user = await User.findByPk(userId);
  if (!user || user.status !== "active") return null;
  await markSignedIn(user.id);
  return toSessionUser(user);
}

/** The current state of a session's user: null when deactivated, removed or the token version moved on. */
export async function sessionUserById(id: number, tokenVersion: number): Promise<SessionUser | null> {
  await databaseReady();
  // Every signed-in request runs this: plain SQL (lib/data/sql.ts) instead of a model query.
  const [user] = await selectRows<{
    id: number;
    club_id: number;
    role: Role;
    name: string;
    email: string;
    status: string;
    token_version: number;
  }>("SELECT id, club_id, role, name, email, status, token_version FROM users WHERE id = ?", [id]);
  if (!user || user.status !== "active" || user.token_version !== tokenVersion) return null;
  return { id: user.id, clubId: user.club_id, role: user.role, name: user.name, email: user.email, tokenVersion: user.token_version };
}

/**
 * Mails a one-time sign-in link when the address belongs to an active member. Says nothing either way,
 * so the caller's answer is the same for known and unknown addresses.
 */
export async function requestSignInLink(email: string): Promise<void> {
  await databaseReady();
  const user = await User.findOne({ where: { email: normaliseEmail(email), status: "active" } });
  if (!user) return;
  const token = newToken();
  await writeTransaction(async (transaction) => {
    await SignInLink.create(
      { userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + signInLinkMinutes * 60_000) },
      { transaction },
    );
  });
  await sendMail({
    to: user.email,
    subject: "Your Slipway sign-in link",
    text: [
      `Hello ${user.name},`,
      "",
      `Open this link within ${signInLinkMinutes} minutes to sign in to Slipway. It works once.`,
      `${publicBaseUrl()}/sign-in/link?token=${token}`,
      "",
      `Forgot your password? Once signed in, choose a new one under Your account (your name at the top of the page) within ${linkSessionGraceMinutes} minutes.`,
      "",
      "If you did not ask for it, ignore this message.",
    ].join("\n"),
  });
}

export interface InvitationInput {
  email: string;
  name: string;
  role: Role;
}

/**
 * An admin invites someone to their club; the invitation link arrives by e-mail. An invitation to the
 * same address that is still open is withdrawn in the same write (its link stops working), so a second
 * try with another role or a corrected name is the one that counts; `replaced` says whether there was one.
 */
export async function inviteMember(actor: Actor, input: InvitationInput): Promise<{ invitationId: number; replaced: boolean }> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can invite members.");
  const email = normaliseEmail(input.email);
  if (await User.findOne({ where: { email } })) {
    throw new ConflictError("Someone with that e-mail address is already a member.", { fieldErrors: { email: ["Already a member."] } });
  }
  const club = await Club.findByPk(actor.clubId);
  if (!club) throw new NotFoundError();
  const token = newToken();
  const { invitation, replaced } = await writeTransaction(async (transaction) => {
    const now = new Date();
    const [withdrawn] = await Invitation.update(
      { expiresAt: now },
      { where: { clubId: actor.clubId, email, ...openInvitationWhere(now) }, transaction },
    );
    const created = await Invitation.create(
      {
        clubId: actor.clubId,
        invitedById: actor.id,
        email,
        name: input.name.trim(),
        role: input.role,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + invitationDays * 86_400_000),
      },
      { transaction },
    );
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "member.invited",
        subjectType: "invitation",
        subjectId: created.id,
        details: { email, role: input.role, ...(withdrawn > 0 ? { replacedOpenInvitations: withdrawn } : {}) },
      },
      transaction,
    );
    return { invitation: created, replaced: withdrawn > 0 };
  });
  await sendInvitationMail({ to: email, name: input.name.trim(), inviterName: actor.name, clubName: club.name, token });
  return { invitationId: invitation.id, replaced };
}

function sendInvitationMail(mail: { to: string; name: string; inviterName: string; clubName: string; token: string }) {
  return sendMail({
    to: mail.to,
    subject: `You are invited to ${mail.clubName} on Slipway`,
    text: [
      `Hello ${mail.name},`,
      "",
      `${mail.inviterName} has invited you to ${mail.clubName} on Slipway, the club's oar-rigging course.`,
      `Choose a password here within ${invitationDays} days:`,
      `${publicBaseUrl()}/invite/${mail.token}`,
    ].join("\n"),
  });
}

/**
 * Invites several people at once (a roster import): one write transaction creates every invitation and
 * its audit entry, then each invitation e-mail goes out. The caller has already refused existing members.
 */
export async function inviteMembers(
  actor: Actor,
  inputs: readonly InvitationInput[],
  via: string,
): Promise<{ invitationIds: number[]; unsent: string[] }> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can invite members.");
  const club = await Club.findByPk(actor.clubId);
  if (!club) throw new NotFoundError();
  const prepared = inputs.map((input) => ({
    email: normaliseEmail(input.email),
    name: input.name.trim(),
    role: input.role,
    token: newToken(),
  }));
  const invitationIds = await writeTransaction(async (transaction) => {
    const ids: number[] = [];
    for (const item of prepared) {
      const created = await Invitation.create(
        {
          clubId: actor.clubId,
          invitedById: actor.id,
          email: item.email,
          name: item.name,
          role: item.role,
          tokenHash: hashToken(item.token),
          expiresAt: new Date(Date.now() + invitationDays * 86_400_000),
        },
        { transaction },
      );
      await recordAudit(
        {
          clubId: actor.clubId,
          actorId: actor.id,
          action: "member.invited",
          subjectType: "invitation",
          subjectId: created.id,
          details: { email: item.email, role: item.role, via },
        },
        transaction,
      );
      ids.push(created.id);
    }
    return ids;
  });
  const unsent: string[] = [];
  for (const item of prepared) {
    try {
      await sendInvitationMail({ to: item.email, name: item.name, inviterName: actor.name, clubName: club.name, token: item.token });
    } catch (error) {
      console.error("Invitation e-mail failed", error);
      unsent.push(item.email);
    }
  }
  return { invitationIds, unsent };
}

export interface PendingInvitation {
  email: string;
  name: string;
  role: Role;
  clubName: string;
}

/** What makes an invitation open at `now`: not accepted, not expired (nor withdrawn, which expires it). */
export function openInvitationWhere(now: Date = new Date()) {
  return { acceptedAt: null, expiresAt: { [Op.gt]: now } };
}

async function openInvitation(token: string): Promise<Invitation | null> {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token), ...openInvitationWhere() } });
  return invitation;
}

/** What the invitation page shows; null when the link is unknown, used or expired. */
export async function findPendingInvitation(token: string): Promise<PendingInvitation | null> {
  await databaseReady();
  const invitation = await openInvitation(token);
  if (!invitation) return null;
  const club = await Club.findByPk(invitation.clubId);
  return { email: invitation.email, name: invitation.name, role: invitation.role, clubName: club?.name ?? "" };
}

/** Accepting creates the member with their chosen password; the invitation works once. */
export async function acceptInvitation(token: string, name: string, password: string): Promise<{ email: string }> {
  await databaseReady();
  const problem = passwordProblem(password);
  if (problem) throw new ValidationError(problem, { password: [problem] });
  const passwordHash = await hashPassword(password);
  return writeTransaction(async (transaction) => {
    const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token) }, transaction });
    if (!invitation || invitation.acceptedAt || invitation.expiresAt.getTime() < Date.now()) {
      throw new NotFoundError("This invitation link is no longer valid. Ask your club administrator for a new one.", {
        token: ["no open invitation has this token"],
      });
    }
    if (await User.findOne({ where: { email: invitation.email }, transaction })) {
      throw new ConflictError("That e-mail address already has an account. Sign in instead.");
    }
    const user = await User.create(
      { clubId: invitation.clubId, email: invitation.email, name: name.trim(), role: invitation.role, passwordHash },
      { transaction },
    );
    await invitation.update({ acceptedAt: new Date() }, { transaction });
    await recordAudit(
      { clubId: invitation.clubId, actorId: user.id, action: "member.joined", subjectType: "user", subjectId: user.id },
      transaction,
    );
    return { email: user.email };
  });
}

/** The signed-in member's own row, while their account is active. */
export async function activeSelf(actor: Actor): Promise<User> {
  const user = await User.findByPk(actor.id);
  if (!user || user.status !== "active") throw new NotFoundError("Your account is no longer active. Ask your club administrator.");
  return user;
}

/**
 * Checks the member's current password before a change to their account, unless `withoutCurrent` (a
 * fresh e-mail-link session, see mayChangePasswordWithoutCurrent) and none was typed. Wrong guesses
 * count against the same limit as failed sign-ins, for the account and the address.
 */
export async function checkCurrentPassword(
  user: User,
  currentPassword: string,
  options: { address: string; withoutCurrent: boolean },
): Promise<void> {
  if (options.withoutCurrent && currentPassword === "") return;
  if (await isSignInThrottled(user.email, options.address)) {
    throw new TooManyRequestsError("Too many wrong passwords. Wait 15 minutes, or sign in with an e-mail link to set a new one.", 15 * 60);
  }
  if (currentPassword === "") {
    throw new ValidationError("Enter your current password.", { currentPassword: ["Enter your current password."] });
  }
  const matches = user.passwordHash ? await verifyPassword(currentPassword, user.passwordHash) : await verifyAgainstDecoy(currentPassword);
  if (!matches) {
    await recordSignInFailure(user.email, options.address);
    throw new ValidationError("That is not your current password.", { currentPassword: ["That is not your current password."] });
  }
}

/**
 * A member changes their own password. The current password is checked unless `withoutCurrent` (a fresh
 * e-mail-link session, see mayChangePasswordWithoutCurrent); wrong guesses count against the same limit
 * as failed sign-ins, for the account and the address. The token version moves on, which ends every
 * session of the member, this one included: the form signs in again with the new password.
 */
export async function changeOwnPassword(
  actor: Actor,
  input: { currentPassword: string; newPassword: string },
  options: { address: string; withoutCurrent: boolean },
): Promise<{ email: string }> {
  await databaseReady();
  const user = await activeSelf(actor);
  await checkCurrentPassword(user, input.currentPassword, options);
  const problem = passwordProblem(input.newPassword);
  if (problem) throw new ValidationError(problem, { newPassword: [problem] });
  if (user.passwordHash && (await verifyPassword(input.newPassword, user.passwordHash))) {
    const same = "That is your current password: choose a different one.";
    throw new ValidationError(same, { newPassword: [same] });
  }
  const passwordHash = await hashPassword(input.newPassword);
  const changed = await writeTransaction(async (transaction) => {
    const [changed] = await User.update(
      { passwordHash, tokenVersion: user.tokenVersion + 1 },
      { where: { id: user.id, tokenVersion: user.tokenVersion, status: "active" }, transaction },
    );
    if (changed === 0) throw new ConflictError("Your session ended while you typed. Sign in again, then change your password.");
    await recordAudit(
      { clubId: user.clubId, actorId: user.id, action: "member.password-changed", subjectType: "user", subjectId: user.id },
      transaction,
    );
    return { email: user.email };
  });
  // Told by e-mail, so that a change the member did not make (a phone left signed in) does not go unseen.
  await sendMail({
    to: user.email,
    subject: "Your Slipway password was changed",
    text: [
      `Hello ${user.name},`,
      "",
      "The password of your Slipway account was just changed, and every other device was signed out.",
      `If that was not you, get a one-time link at ${publicBaseUrl()}/sign-in, choose a new password under Your account, and tell your club administrator.`,
    ].join("\n"),
  });
  return changed;
}

/**
 * Writes a member's new name (already trimmed) and audits it as `member.renamed` by `actorId`, inside the
 * caller's write transaction; nothing is written when the name is unchanged.
 */
export async function renameUser(user: User, name: string, actorId: number, transaction: Transaction): Promise<void> {
  if (user.name === name) return;
  const from = user.name;
  await user.update({ name }, { transaction });
  await recordAudit(
    { clubId: user.clubId, actorId, action: "member.renamed", subjectType: "user", subjectId: user.id, details: { from, to: name } },
    transaction,
  );
}

/**
 * A member corrects their own name. Certificates already issued keep the name they were issued to (the
 * register is a record of what was signed; an admin can reissue those still holding, whose count is
 * returned); the roster, new certificates and the header use the new one.
 */
export async function changeOwnName(actor: Actor, name: string): Promise<{ name: string; certificatesUnderEarlierName: number }> {
  await databaseReady();
  const trimmed = name.trim();
  const today = await clubToday(actor.clubId);
  return writeTransaction(async (transaction) => {
    const user = await User.findByPk(actor.id, { transaction });
    if (!user || user.status !== "active") throw new NotFoundError("Your account is no longer active. Ask your club administrator.");
    await renameUser(user, trimmed, user.id, transaction);
    return { name: trimmed, certificatesUnderEarlierName: await countUnderEarlierName(user.id, trimmed, today, transaction) };
  });
}

/** An invitation nobody has accepted yet, as the club page lists it. */
export interface UnansweredInvitation {
  id: number;
  email: string;
  name: string;
  role: Role;
  sentAt: Date;
  expiresAt: Date;
  /** False once its 14 days are over: the link no longer works, and "Send again" is the way on. */
  open: boolean;
}

/** How long an expired invitation stays on the club page's list. */
export const expiredInvitationListDays = 30;

/**
 * The club's invitations not accepted yet: the newest one per address (sending again replaces the
 * earlier), leaving out addresses that have an account by now, and expired ones after 30 days.
 */
export async function listUnansweredInvitations(actor: Actor, now: Date = new Date()): Promise<UnansweredInvitation[]> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can see invitations.");
  const invitations = await Invitation.findAll({
    where: {
      clubId: actor.clubId,
      acceptedAt: null,
      expiresAt: { [Op.gt]: new Date(now.getTime() - expiredInvitationListDays * 86_400_000) },
    },
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
  });
  const newest = new Map<string, Invitation>();
  for (const invitation of invitations) if (!newest.has(invitation.email)) newest.set(invitation.email, invitation);
  const joined = new Set((await User.findAll({ where: { email: [...newest.keys()] }, attributes: ["email"] })).map((user) => user.email));
  return [...newest.values()]
    .filter((invitation) => !joined.has(invitation.email))
    .map((invitation) => ({
      id: invitation.id,
      email: invitation.email,
      name: invitation.name,
      role: invitation.role,
      sentAt: invitation.createdAt,
      expiresAt: invitation.expiresAt,
      open: invitation.expiresAt.getTime() > now.getTime(),
    }));
}

/**
 * An administrator withdraws an invitation not accepted yet (sent to a wrong address, say): its link
 * stops working at once and the address leaves the list. Its rows (this one and any earlier ones to the
 * address) are removed; the audit log keeps who and when.
 */
export async function withdrawInvitation(actor: Actor, invitationId: number): Promise<{ email: string }> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can withdraw invitations.");
  return writeTransaction(async (transaction) => {
    const invitation = await Invitation.findOne({ where: { id: invitationId, clubId: actor.clubId, acceptedAt: null }, transaction });
    if (!invitation) throw new NotFoundError("That invitation is not waiting any more: it was accepted or withdrawn.");
    const { email } = invitation;
    // Earlier invitations to the address (replaced or expired) go too, or the list would show the last of them again.
    await Invitation.destroy({ where: { clubId: actor.clubId, email, acceptedAt: null }, transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "member.invitation-withdrawn",
        subjectType: "invitation",
        subjectId: invitationId,
        details: { email },
      },
      transaction,
    );
    return { email };
  });
}
