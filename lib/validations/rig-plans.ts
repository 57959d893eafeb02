import { z } from "zod";

import { roundTo } from "@/lib/rigging/round";
import { wholeNumberParam } from "@/lib/validations/paging";
import { oarLengthProblem, rigPlanRequestSchema } from "@/lib/validations/rig";

/**
 * The rig-plan request as the plan route and the helper accept it: rigPlanRequestSchema plus the one case
 * the engine would refuse with a RangeError, a handle move longer than the measured inboard.
 */
export const rigPlanRouteSchema = rigPlanRequestSchema.superRefine((request, ctx) => {
  // A measured length that is no oar's (a typo) is already reported; blaming the inboard too would mislead.
  if (oarLengthProblem(request.oarType, request.measured.lengthCm) !== null) return;
  const inboardAfterHandleCm = request.measured.inboardCm + roundTo(request.target.lengthCm - request.measured.lengthCm, 1);
  if (inboardAfterHandleCm <= 0) {
    ctx.addIssue({
      code: "custom",
      path: ["measured", "inboardCm"],
      message: "Moving the handle to the target length would leave no inboard: measure the inboard and the length again",
    });
  }
});

/** How long a plan kept on a phone while offline may wait before it is too old to record. */
export const pendingPlanMaxAgeDays = 30;
const clockSkewMs = 10 * 60_000;

/** A plan an athlete saves: which boat and oar set, the request they planned with, when, and a once-only id. */
export const savedRigPlanSchema = z
  .strictObject({
    clientId: z.uuid({ error: "clientId must be a UUID" }),
    boatId: z.number({ error: "Choose a boat." }).int().positive(),
    oarSetId: z.number({ error: "Choose an oar set." }).int().positive(),
    request: rigPlanRouteSchema,
    plannedAt: z.iso.datetime({ offset: true, error: "plannedAt must be an ISO date and time" }),
  })
  .superRefine((plan, ctx) => {
    const plannedMs = Date.parse(plan.plannedAt);
    const now = Date.now();
    if (plannedMs > now + clockSkewMs) {
      ctx.addIssue({ code: "custom", path: ["plannedAt"], message: "The plan's time is in the future: check the phone's clock" });
    } else if (plannedMs < now - pendingPlanMaxAgeDays * 86_400_000) {
      ctx.addIssue({
        code: "custom",
        path: ["plannedAt"],
        message: `The plan is more than ${pendingPlanMaxAgeDays} days old and is no longer recorded`,
      });
    }
  });

export type SavedRigPlanInput = z.input<typeof savedRigPlanSchema>;
export type SavedRigPlan = z.output<typeof savedRigPlanSchema>;

/** What the athlete types in the boat-change helper: the oar as they measured it. */
export const measuredOarSchema = z.strictObject({
  lengthCm: z
    .number({ error: "Enter the overall length you measured, in centimetres (for example 287.5)." })
    .positive({ error: "The overall length must be more than 0 cm." }),
  inboardCm: z
    .number({ error: "Enter the inboard you measured, in centimetres (for example 88)." })
    .positive({ error: "The inboard must be more than 0 cm." }),
});

export type MeasuredOarInput = z.input<typeof measuredOarSchema>;

/**
 * The saved-plans list's query: `?boat=<id>` for one boat, or nothing for all. Strict, like every API
 * query: a repeated, misspelt or unknown parameter is refused naming it rather than ignored.
 */
export const savedRigPlansQuerySchema = z.strictObject({
  boat: wholeNumberParam(1, 999_999_999).optional(),
});
