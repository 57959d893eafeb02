import { z } from "zod";
import { roles, userStatuses } from "@/lib/auth/roles";

const memberId = z.coerce.number({ error: "Choose a member." }).int().positive({ error: "Choose a member." });
const role = z.enum(roles, { error: "Choose athlete, coach or admin." });
const status = z.enum(userStatuses, { error: "Choose active or deactivated." });

/** The route segment of /api/members/[id]. */
export const memberIdSchema = z.strictObject({ id: memberId });

/** PATCH /api/members/[id]: exactly one of a new role or a new status. */
export const memberUpdateSchema = z
  .strictObject({ role: role.optional(), status: status.optional() })
  .refine((update) => (update.role === undefined) !== (update.status === undefined), {
    error: "Send either a role or a status, not both.",
  });
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

/** The role form on the members page. */
export const changeRoleSchema = z.strictObject({ memberId, role });
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;

/** Deactivate and reactivate buttons on the members page. */
export const memberStatusSchema = z.strictObject({ memberId, status });
