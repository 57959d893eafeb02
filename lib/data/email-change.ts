import "server-only";
import { Op } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { activeSelf, checkCurrentPassword, normaliseEmail } from "@/lib/data/users";
import type { Actor } from "@/lib/auth/permissions";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { consumeOrRefuse, namedLimiter } from "@/lib/auth/throttle";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/http/errors";
import { publicBaseUrl } from "@/lib/env";
import { sendMail } from "@/lib/mail/send";
import { EmailChange, User } from "@/models";

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
  await consumeOrRefuse(namedLimiter("email-change", emailChangesPerHour, 3600), String(user.id), (msBeforeNext) => {
    const minutes = Math.max(1, Math.ceil(msBeforeNext / 60_000));
    return `You asked for ${emailChangesPerHour} confirmation links in the last hour. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`;
  });
  const taken = await User.findOne({ where: { email: newEmail }, attributes: ["id"] });
  const token = newToken();
  await writeTransaction(async (transaction) => {
    await EmailChange.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    if (!taken) {
      await EmailChange.create(
        { userId: user.id, newEmail, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + emailChangeLinkHours * 3_600_000) },
        { transaction },
      );
    }
    await recordAudit(
      {
        clubId: user.clubId,
        actorId: user.id,
        action: "member.email-change-requested",
        subjectType: "user",
        subjectId: user.id,
        details: { to: newEmail, ...(taken && { refused: "address has an account" }) },
      },
      transaction,
    );
  });
  await sendMail(
    taken
      ? {
          to: newEmail,
          subject: "Your Slipway account's address was not changed",
          text: [
            "Hello,",
            "",
            "Someone signed in to Slipway asked to move their account to this address. This address already has a Slipway account, so nothing was changed.",
            "If it was you, sign in with this address instead, or ask your club administrator to help.",
          ].join("\n"),
        }
      : {
          to: newEmail,
          subject: "Confirm your new Slipway e-mail address",
          text: [
            `Hello ${user.name},`,
            "",
            `Open this link within ${emailChangeLinkHours} hours to sign in to Slipway with this address from now on. It works once.`,
            `${publicBaseUrl()}/confirm-email?token=${token}`,
            "",
            `Until then you sign in with ${user.email}. If you did not ask for this, ignore this message.`,
          ].join("\n"),
        },
  );
  return { newEmail };
}

/**
 * The link from the new address is used: the account signs in with it from now on. Every session ends
 * (the token version moves on), other unconfirmed links of the member stop working, and the old address
 * is told, in case it was not them.
 */
export async function confirmEmailChange(token: string): Promise<{ email: string }> {
  await databaseReady();
  const now = new Date();
  const changed = await writeTransaction(async (transaction) => {
    const change = await EmailChange.findOne({ where: { tokenHash: hashToken(token) }, transaction });
    const user = change ? await User.findByPk(change.userId, { transaction }) : null;
    if (!change || !user || change.usedAt || change.expiresAt.getTime() <= now.getTime() || user.status !== "active") {
      throw new NotFoundError("This link is no longer valid. Ask for a new one under Your account.", {
        token: ["no open e-mail change has this token"],
      });
    }
    if (await User.findOne({ where: { email: change.newEmail }, transaction })) {
      throw new ConflictError("That address has a Slipway account of its own by now, so yours was not moved to it.");
    }
    const from = user.email;
    await user.update({ email: change.newEmail, tokenVersion: user.tokenVersion + 1 }, { transaction });
    await change.update({ usedAt: now }, { transaction });
    await EmailChange.destroy({ where: { userId: user.id, usedAt: null }, transaction });
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
