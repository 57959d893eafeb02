import { z } from "zod";
import { roles, userStatuses } from "@/lib/auth/roles";
import { recordIdValueSchema } from "@/lib/validations/ids";
import { emailAddressField, memberNameField } from "@/lib/validations/members";

/** A member id in a page address (text). The members page's actions get the number itself: recordIdValueSchema. */
const memberId = z.coerce.number({ error: "Choose a member." }).int().positive({ error: "Choose a member." });
const role = z.enum(roles, { error: "Choose athlete, coach or admin." });
const status = z.enum(userStatuses, { error: "Choose active or deactivated." });

/** The route segment of /api/members/[id]. */
export const memberIdSchema = z.strictObject({ id: memberId });

/**
 * PATCH /api/members/[id]: exactly one of a new role or a new status. Sending both, or neither, is
 * refused under both field names, so a client sees which two fields the rule is about.
 */
export const memberUpdateSchema = z.strictObject({ role: role.optional(), status: status.optional() }).superRefine((update, context) => {
  const given = [update.role, update.status].filter((value) => value !== undefined).length;
  if (given === 1) return;
  const message = given === 0 ? "Send a role or a status." : "Send either a role or a status, not both.";
  for (const field of ["role", "status"]) context.addIssue({ code: "custom", message, path: [field] });
});
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

/** The role form on the members page. */
export const changeRoleSchema = z.strictObject({ memberId: recordIdValueSchema, role });
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;

/** Deactivate and reactivate buttons on the members page. */
export const memberStatusSchema = z.strictObject({ memberId: recordIdValueSchema, status });

/** The "Withdraw" button of an invitation not yet accepted, on the club page. */
export const withdrawInvitationSchema = z.strictObject({ invitationId: recordIdValueSchema });

/** "Correct name" on the members page: how another member's name is written. */
export const renameMemberSchema = z.strictObject({
  memberId: recordIdValueSchema,
  name: memberNameField,
});

/** "Change e-mail" on the members page: a link goes to the new address, and the member's opening it makes the change. */
export const memberEmailChangeSchema = z.strictObject({
  memberId: recordIdValueSchema,
  newEmail: emailAddressField,
});
