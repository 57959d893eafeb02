import "server-only";
import { Op, type Transaction } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { activeSelf, checkCurrentPassword, normaliseEmail } from "@/lib/data/users";
import { assertAllowed, assertVisible, canManageClub, type Actor } from "@/lib/auth/permissions";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { consumeOrRefuse, namedLimiter } from "@/lib/auth/throttle";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/http/errors";
import { publicBaseUrl } from "@/lib/env";
import { sendMail } from "@/lib/mail/send";
import { EmailChange, SignInLink, User } from "@/models";

/** How long the confirmation link sent to the new address works. */
export const emailChangeLinkHours = 24;
/** Confirmation e-mails one member may have sent in an hour (each one goes to an address they typed). */
export const emailChangesPerHour = 5;

/** The change a member asked for and has not confirmed yet, as Your account shows it. */
export interface PendingEmailChange {
  newEmail: string;
  expiresAt: Date;
}

export async function pendingEmailChange(actor: Actor, now: Date = new Date()): Promise<PendingEmailChange | null> {
  await databaseReady();
  const pending = await EmailChange.findOne({
    where: { userId: actor.id, usedAt: null, expiresAt: { [Op.gt]: now } },
    order: [["id", "DESC"]],
  });
  return pending ? { newEmail: pending.newEmail, expiresAt: pending.expiresAt } : null;
}

async function throttleConfirmationMails(memberId: number): Promise<void> {
  await consumeOrRefuse(namedLimiter("email-change", emailChangesPerHour, 3600), String(memberId), (msBeforeNext) => {
    const minutes = Math.max(1, Math.ceil(msBeforeNext / 60_000));
    return `${emailChangesPerHour} confirmation links were sent for this account in the last hour. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`;
  });
}

/**
 * Replaces the member's waiting change with one to `newEmail` (audited, with who asked) and mails the
 * link there. Nothing about the account changes until the link is used.
 */
async function sendConfirmationLink(member: User, newEmail: string, askedBy: { id: number; name: string } | null): Promise<void> {
  const token = newToken();
  await writeTransaction(async (transaction) => {
    await EmailChange.destroy({ where: { userId: member.id, usedAt: null }, transaction });
    await EmailChange.create(
      {
        userId: member.id,
        newEmail,
        requestedById: askedBy?.id ?? null,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + emailChangeLinkHours * 3_600_000),
      },
      { transaction },
    );
    await recordAudit(
      {
        clubId: member.clubId,
        actorId: askedBy?.id ?? member.id,
        action: "member.email-change-requested",
        subjectType: "user",
        subjectId: member.id,
        details: { to: newEmail },
      },
      transaction,
    );
  });
  await sendMail({
    to: newEmail,
    subject: "Confirm your new Slipway e-mail address",
    text: [
      `Hello ${member.name},`,
      "",
      askedBy ? `${askedBy.name}, an administrator of your club, asked to move your Slipway account to this address.` : null,
      `Open this link within ${emailChangeLinkHours} hours${askedBy ? "" : ", signed in to Slipway as you are now,"} to sign in with this address from now on. It works once.`,
      `${publicBaseUrl()}/confirm-email?token=${token}`,
      "",
      `Until then you sign in with ${member.email}. If you are not ${member.name}, or did not ask for this, ignore this message.`,
    ]
      .filter((line) => line !== null)
      .join("\n"),
  });
}

/**
 * A member asks to move their account to `newEmail`. The current password is checked as for a password
 * change; then a link is mailed to the new address, and nothing changes until it is used. Asking again
 * replaces the earlier link. An address that already has an account gets a note instead of a link, and
 * the member is told the same as for any other address, so that the form does not say who has an account.
 */
export async function requestEmailChange(
  actor: Actor,
  input: { newEmail: string; currentPassword: string },
  options: { address: string; withoutCurrent: boolean },
): Promise<{ newEmail: string }> {
  await databaseReady();
  const user = await activeSelf(actor);
  const newEmail = normaliseEmail(input.newEmail);
  if (newEmail === user.email) {
    const same = "That is the address you sign in with already.";
    throw new ValidationError(same, { newEmail: [same] });
  }
  await checkCurrentPassword(user, input.currentPassword, options);
  await throttleConfirmationMails(user.id);
  if (await User.findOne({ where: { email: newEmail }, attributes: ["id"] })) {
    await writeTransaction((transaction) =>
      recordAudit(
        {
          clubId: user.clubId,
          actorId: user.id,
          action: "member.email-change-requested",
          subjectType: "user",
          subjectId: user.id,
          details: { to: newEmail, refused: "address has an account" },
        },
        transaction,
      ),
    );
    await sendMail({
      to: newEmail,
      subject: "Your Slipway account's address was not changed",
      text: [
        "Hello,",
        "",
        "Someone signed in to Slipway asked to move their account to this address. This address already has a Slipway account, so nothing was changed.",
        "If it was you, sign in with this address instead, or ask your club administrator to help.",
      ].join("\n"),
    });
    return { newEmail };
  }
  await sendConfirmationLink(user, newEmail, null);
  return { newEmail };
}

/**
 * An admin starts the move for another member of their club (who has lost the old mailbox, say): the
 * same link goes to the new address, and only the member opening it makes the change. Admins already
 * learn whether an address has an account when they invite, so a taken one is refused by name here.
 * 403 for non-admins and for the admin's own account (Your account is the way), 404 outside the club.
 */
export async function requestMemberEmailChange(
  actor: Actor,
  memberId: number,
  email: string,
): Promise<{ newEmail: string; currentEmail: string }> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change members.");
  const member = await User.findByPk(memberId);
  assertVisible(member !== null && member.clubId === actor.clubId);
  if (member.id === actor.id) throw new ForbiddenError("Change your own e-mail address under Your account.");
  if (member.status !== "active") throw new ConflictError(`${member.name} is deactivated: reactivate them first.`);
  const newEmail = normaliseEmail(email);
  if (newEmail === member.email) {
    const same = `That is the address ${member.name} signs in with already.`;
    throw new ValidationError(same, { newEmail: [same] });
  }
  if (await User.findOne({ where: { email: newEmail }, attributes: ["id"] })) {
    const taken = "That address already has a Slipway account.";
    throw new ValidationError(taken, { newEmail: [taken] });
  }
  await throttleConfirmationMails(member.id);
  await sendConfirmationLink(member, newEmail, { id: actor.id, name: actor.name });
  return { newEmail, currentEmail: member.email };
}

/** What the confirmation page shows of a link that still works; null for any other token (no hints). */
export interface EmailChangeLink {
  memberName: string;
  newEmail: string;
  /** The member asked: only they, signed in, may confirm. False when an admin started it. */
  needsMemberSignedIn: boolean;
  /** Whether the visitor is signed in as that member. */
  signedInAsMember: boolean;
}

async function openChangeFor(token: string, now: Date, transaction?: Transaction) {
  const change = await EmailChange.findOne({ where: { tokenHash: hashToken(token) }, transaction });
  const user = change ? await User.findByPk(change.userId, { transaction }) : null;
  if (!change || !user || change.usedAt || change.expiresAt.getTime() <= now.getTime() || user.status !== "active") return null;
  return { change, user };
}

export async function emailChangeLink(token: string, actor: Actor | null): Promise<EmailChangeLink | null> {
  await databaseReady();
  const open = await openChangeFor(token, new Date());
  if (!open) return null;
  return {
    memberName: open.user.name,
    newEmail: open.change.newEmail,
    needsMemberSignedIn: open.change.requestedById === null,
    signedInAsMember: actor?.id === open.user.id,
  };
}

/**
 * The link from the new address is used: the account signs in with it from now on. A change the member
 * asked for needs the member signed in (`actor`); one an admin started does not (the admin vouched).
 * Every session ends (the token version moves on), other unconfirmed links of the member stop working
 * (and sign-in links mailed to the old address), and the old address is told, in case it was not them.
 */
export async function confirmEmailChange(token: string, actor: Actor | null): Promise<{ email: string }> {
  await databaseReady();
  const now = new Date();
  const changed = await writeTransaction(async (transaction) => {
    const open = await openChangeFor(token, now, transaction);
    if (!open) {
      throw new NotFoundError("This link is no longer valid. Ask for a new one under Your account.", {
        token: ["no open e-mail change has this token"],
      });
    }
    const { change, user } = open;
    // A member's own request is confirmed by the member, signed in: whoever reads a mistyped address cannot.
    if (change.requestedById === null && actor?.id !== user.id) {
      throw new ForbiddenError(`Sign in as ${user.name}, with the address you use now, and open the link again.`);
    }
    if (await User.findOne({ where: { email: change.newEmail }, transaction })) {
      throw new ConflictError("That address has a Slipway account of its own by now, so yours was not moved to it.");
    }
    const from = user.email;
    await user.update({ email: change.newEmail, tokenVersion: user.tokenVersion + 1 }, { transaction });
    await change.update({ usedAt: now }, { transaction });
    await EmailChange.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    // A one-time sign-in link mailed to the old address must not open the account any more.
    await SignInLink.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    await recordAudit(
      {
        clubId: user.clubId,
        actorId: user.id,
        action: "member.email-changed",
        subjectType: "user",
        subjectId: user.id,
        details: { from, to: change.newEmail },
      },
      transaction,
    );
    return { from, to: change.newEmail, name: user.name };
  });
  await sendMail({
    to: changed.from,
    subject: "Your Slipway e-mail address was changed",
    text: [
      `Hello ${changed.name},`,
      "",
      `Your Slipway account now signs in with ${changed.to}, not this address, and every device was signed out.`,
      "If that was not you, tell your club administrator at once.",
    ].join("\n"),
  });
  return { email: changed.to };
}
