import { NextResponse } from "next/server";
import { optionalActorFromRequest } from "@/lib/auth/request-actor";
import { clientAddress, consumeOrRefuse, publicLimiter } from "@/lib/auth/throttle";
import { rigSettingsFor } from "@/lib/data/fleet";
import { computeRigPlan, type RigPlanResponse } from "@/lib/fleet/plan-response";
import { ValidationError } from "@/lib/http/errors";
import { readJson, route } from "@/lib/http/route";
import { defaultClubOarLimits, type ClubOarLimits } from "@/lib/rigging/limits";
import type { RigPlanRequest } from "@/lib/validations/rig";
import { rigPlanRouteSchema } from "@/lib/validations/rig-plans";

export const dynamic = "force-dynamic";

/** Plan requests a minute from one address; enough for a crew changing boats together, not for a script. */
export const rigPlanRequestsPerMinute = 60;

async function throttle(request: Request): Promise<void> {
  await consumeOrRefuse(
    publicLimiter("rig-plan", rigPlanRequestsPerMinute),
    clientAddress(request.headers),
    () => "Too many plans asked for from this address. Wait a minute and try again.",
  );
}

/** The engine refuses impossible settings with a RangeError; here that is the caller's input, so a 400. */
function planOrInvalid(input: RigPlanRequest, limits: ClubOarLimits): RigPlanResponse {
  try {
    return computeRigPlan(input, limits);
  } catch (error) {
    if (error instanceof RangeError) {
      throw new ValidationError(`measured: ${error.message}`, { measured: [error.message] });
    }
    throw error;
  }
}

/**
 * Public: plans a boat change (length first, then collar clicks) with the rigging engine. Anyone may ask;
 * a signed-in member's plan is checked against their club's limits, anyone else's against the defaults.
 */
export const POST = route(async (request) => {
  await throttle(request);
  const input = await readJson(request, rigPlanRouteSchema);
  const actor = await optionalActorFromRequest(request);
  const limits = actor ? (await rigSettingsFor(actor)).limits : defaultClubOarLimits;
  return NextResponse.json(planOrInvalid(input, limits));
});
