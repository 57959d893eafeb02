import { planRigChange, type RigPlan } from "@/lib/rigging/plan";
import type { ClubOarLimits } from "@/lib/rigging/limits";
import type { CollarDirection, LengthAction } from "@/lib/rigging/types";
import type { RigPlanRequest } from "@/lib/validations/rig";

/** The answer of POST /api/rig/plan: the steps' numbers and the figures of the target settings. */
export interface RigPlanResponse {
  length: { changeCm: number; action: LengthAction };
  inboard: { changeCm: number; clicks: number; direction: CollarDirection; residualCm: number };
  outboardCm: number;
  leverRatio: number;
  spanGearing?: number;
  overlapCm?: number;
  warnings: string[];
}

/** The public answer's shape from a plan: only the documented fields, optional ones only when known. */
export function toRigPlanResponse(plan: RigPlan): RigPlanResponse {
  const response: RigPlanResponse = {
    length: { changeCm: plan.length.changeCm, action: plan.length.action },
    inboard: {
      changeCm: plan.inboard.changeCm,
      clicks: plan.inboard.clicks,
      direction: plan.inboard.direction,
      residualCm: plan.inboard.residualCm,
    },
    outboardCm: plan.outboardCm,
    leverRatio: plan.leverRatio,
    warnings: plan.warnings,
  };
  if (plan.spanGearing !== undefined) response.spanGearing = plan.spanGearing;
  if (plan.overlapCm !== undefined) response.overlapCm = plan.overlapCm;
  return response;
}

/**
 * Plans a validated request against a club's limits for the oar type: the same computation on the server
 * and, when the network is gone, in the athlete's browser.
 */
export function computeRigPlan(request: RigPlanRequest, limits: ClubOarLimits): RigPlanResponse {
  return toRigPlanResponse(
    planRigChange({
      oarType: request.oarType,
      measured: request.measured,
      target: request.target,
      clickCm: request.clickCm,
      spanCm: request.spanCm,
      spreadCm: request.spreadCm,
      halfSwivelCm: request.halfSwivelCm,
      limits: limits[request.oarType],
    }),
  );
}
