import "server-only";
import { UniqueConstraintError } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { rigSettingsFor } from "@/lib/data/fleet";
import { assertMayReviewRigPlans, assertVisible, type Actor } from "@/lib/auth/permissions";
import { NotFoundError, ValidationError } from "@/lib/http/errors";
import { oarTypeOfClass } from "@/lib/fleet/catalogue";
import { computeRigPlan, type RigPlanResponse } from "@/lib/fleet/plan-response";
import type { OarType } from "@/lib/rigging/types";
import type { SavedRigPlan } from "@/lib/validations/rig-plans";
import { Boat, OarSet, RigPlan, User } from "@/models";

export interface SavedPlanOutcome {
  id: number;
  /** False when the same plan (same phone id) was already recorded, e.g. sent again from the offline queue. */
  created: boolean;
}

/**
 * Records a plan an athlete saved. The boat and oar set must be the club's and suit the oar type; the
 * steps are worked out again here with the club's limits, never taken from the phone.
 */
export async function saveRigPlan(actor: Actor, input: SavedRigPlan): Promise<SavedPlanOutcome> {
  await databaseReady();
  const [boat, set] = await Promise.all([Boat.findByPk(input.boatId), OarSet.findByPk(input.oarSetId)]);
  if (!boat || boat.clubId !== actor.clubId)
    throw new NotFoundError("boatId: no such boat in your club.", { boatId: ["no such boat in your club"] });
  if (!set || set.clubId !== actor.clubId)
    throw new NotFoundError("oarSetId: no such oar set in your club.", { oarSetId: ["no such oar set in your club"] });
  const request = input.request;
  if (oarTypeOfClass(boat.boatClass) !== set.oarType || set.oarType !== request.oarType) {
    const message = `${set.name} (${set.oarType}) does not go with ${boat.name} (${boat.boatClass}).`;
    throw new ValidationError(message, { oarSetId: [message] });
  }
  const settings = await rigSettingsFor(actor);
  const result = computeRigPlan(request, settings.limits);
  const existing = await RigPlan.findOne({ where: { userId: actor.id, clientId: input.clientId } });
  if (existing) return { id: existing.id, created: false };
  try {
    const plan = await writeTransaction((transaction) =>
      RigPlan.create(
        {
          clubId: actor.clubId,
          userId: actor.id,
          boatId: boat.id,
          oarSetId: set.id,
          clientId: input.clientId,
          oarType: request.oarType,
          measuredLengthCm: request.measured.lengthCm,
          measuredInboardCm: request.measured.inboardCm,
          targetLengthCm: request.target.lengthCm,
          targetInboardCm: request.target.inboardCm,
          clickCm: request.clickCm,
          spanCm: request.spanCm ?? null,
          spreadCm: request.spreadCm ?? null,
          halfSwivelCm: request.halfSwivelCm ?? settings.halfSwivelCm,
          result,
          plannedAt: new Date(input.plannedAt),
        },
        { transaction },
      ),
    );
    return { id: plan.id, created: true };
  } catch (error) {
    // Two copies of one queued plan arriving together: the unique (user, clientId) index keeps one.
    if (error instanceof UniqueConstraintError) {
      const winner = await RigPlan.findOne({ where: { userId: actor.id, clientId: input.clientId } });
      if (winner) return { id: winner.id, created: false };
    }
    throw error;
  }
}

export interface RigPlanEntry {
  id: number;
  plannedAt: string;
  athleteName: string;
  boatId: number;
  boatName: string;
  boatClass: string;
  oarSetName: string;
  oarType: OarType;
  measured: { lengthCm: number; inboardCm: number };
  target: { lengthCm: number; inboardCm: number };
  clickCm: number;
  result: RigPlanResponse;
}

/**
 * The club's most recent saved plans, newest first, optionally for one boat of the club, archived or
 * not (coaches and admins). Any other boat is not found (404), so a mistyped id is never mistaken for a
 * boat without plans.
 */
export async function listRigPlans(actor: Actor, options: { boatId?: number; limit?: number } = {}): Promise<RigPlanEntry[]> {
  await databaseReady();
  assertMayReviewRigPlans(actor);
  if (options.boatId !== undefined) {
    const boat = await Boat.findByPk(options.boatId, { attributes: ["id", "clubId"] });
    assertVisible(boat !== null && boat.clubId === actor.clubId);
  }
  const plans = await RigPlan.findAll({
    where: { clubId: actor.clubId, ...(options.boatId !== undefined ? { boatId: options.boatId } : {}) },
    include: [
      { model: User, as: "user", attributes: ["name"] },
      { model: Boat, as: "boat", attributes: ["id", "name", "boatClass"] },
      { model: OarSet, as: "oarSet", attributes: ["name"] },
    ],
    order: [
      ["plannedAt", "DESC"],
      ["id", "DESC"],
    ],
    limit: Math.min(Math.max(options.limit ?? 50, 1), 200),
  });
  return plans.map((plan) => ({
    id: plan.id,
    plannedAt: plan.plannedAt.toISOString(),
    athleteName: plan.user?.name ?? "(former member)",
    boatId: plan.boatId,
    boatName: plan.boat?.name ?? "",
    boatClass: plan.boat?.boatClass ?? "",
    oarSetName: plan.oarSet?.name ?? "",
    oarType: plan.oarType,
    measured: { lengthCm: plan.measuredLengthCm, inboardCm: plan.measuredInboardCm },
    target: { lengthCm: plan.targetLengthCm, inboardCm: plan.targetInboardCm },
    clickCm: plan.clickCm,
    result: plan.result,
  }));
}
