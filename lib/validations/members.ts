import { z } from "zod";
import { roles } from "@/lib/auth/roles";
import { fitsPasswordHash, maxPasswordLength, minPasswordLength, newPasswordTooLongMessage } from "@/lib/auth/password-rules";
import { oneLineTextMessage, oneLineTextPattern } from "@/lib/validations/text";

/** A one-time token as lib/auth/tokens.ts makes them (invitations, sign-in links): 32 random bytes, base64url. */
export const oneTimeTokenPattern = /^[A-Za-z0-9_-]{43}$/;

/** A person's name as certificates and the register print it: one line of 1–120 characters, trimmed. */
function personNameField(messages: { empty: string; tooLong: string }) {
  return z
    .string({ error: messages.empty })
    .trim()
    .min(1, { error: messages.empty })
    .max(120, { error: messages.tooLong })
    .regex(oneLineTextPattern, { error: oneLineTextMessage });
}

/** Another member's name, as an administrator types it (invitations, "Correct name"). */
export const memberNameField = personNameField({ empty: "Enter the member's name.", tooLong: "Keep the name under 120 characters." });

/** A member's own name (accepting an invitation, Your account). */
const ownNameField = personNameField({ empty: "Enter your name.", tooLong: "Keep your name under 120 characters." });

/** An e-mail address as a member or admin types it; stored trimmed and in lower case (normaliseEmail). */
export const emailAddressField = z
  .email({ error: "Enter an e-mail address like name@example.org." })
  .max(254, { error: "An e-mail address has at most 254 characters." });

export const invitationSchema = z.strictObject({
  email: emailAddressField,
  name: memberNameField,
  role: z.enum(roles, { error: "Choose athlete, coach or admin." }),
});
export type InvitationFormInput = z.input<typeof invitationSchema>;

/** A password being chosen: long enough, and within what bcrypt reads. */
const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(minPasswordLength, { error: `Use at least ${minPasswordLength} characters.` })
  .refine(fitsPasswordHash, { error: newPasswordTooLongMessage });

export const acceptInvitationSchema = z.strictObject({
  token: z.string({ error: "Open the link from the invitation e-mail." }).regex(oneTimeTokenPattern, {
    error: "Not an invitation link: copy the whole link from the e-mail.",
  }),
  name: ownNameField,
  password: newPasswordField,
});

/** A member correcting their own name. */
export const changeOwnNameSchema = z.strictObject({ name: ownNameField });

/**
 * A member changing their own password. The current one may be left empty only in a session started
 * with an e-mail link a few minutes ago (the server decides that, not this schema).
 */
export const changePasswordSchema = z.strictObject({
  currentPassword: z
    .string({ error: "Enter your current password." })
    .max(maxPasswordLength, { error: "That is not your current password." }),
  newPassword: newPasswordField,
});

/** A member asking to sign in with another address; the current password is checked as for a password change. */
export const requestEmailChangeSchema = z.strictObject({
  newEmail: emailAddressField,
  currentPassword: z
    .string({ error: "Enter your current password." })
    .max(maxPasswordLength, { error: "That is not your current password." }),
});

/** The token of the link sent to the new address. */
export const confirmEmailChangeSchema = z.strictObject({
  token: z.string({ error: "Open the link from the e-mail." }).regex(oneTimeTokenPattern, {
    error: "Not a confirmation link: copy the whole link from the e-mail.",
  }),
});

export const signInSchema = z.strictObject({
  email: z.email({ error: "Enter the e-mail address you signed up with." }).max(254),
  password: z.string().min(1, { error: "Enter your password." }).max(maxPasswordLength),
});

export const signInLinkSchema = z.strictObject({
  email: z.email({ error: "Enter the e-mail address you signed up with." }).max(254),
});
