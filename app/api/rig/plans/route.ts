import { NextResponse } from "next/server";
import { assertMayReviewRigPlans } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { listRigPlans, saveRigPlan } from "@/lib/data/rig-plans";
import { lookUpBy } from "@/lib/http/look-up";
import { readJson, readQuery, route } from "@/lib/http/route";
import { savedRigPlanSchema, savedRigPlansQuerySchema } from "@/lib/validations/rig-plans";

export const dynamic = "force-dynamic";

/** A signed-in athlete records a plan: 201 when new, 200 when this plan (same clientId) was already recorded. */
export const POST = route(async (request) => {
  const actor = await requireActor();
  const input = await readJson(request, savedRigPlanSchema);
  const outcome = await saveRigPlan(actor, input);
  return NextResponse.json(outcome, { status: outcome.created ? 201 : 200 });
});

/**
 * Coaches and admins: the club's recent plans, newest first; `?boat=<id>` for one boat. 400 naming the
 * parameter for a malformed, repeated or unknown one; 404 naming `boat` for a boat not of the club.
 */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMayReviewRigPlans(actor);
  const { boat } = readQuery(request, savedRigPlansQuerySchema);
  const plans = await lookUpBy("boat", "boat in your club", () => listRigPlans(actor, { boatId: boat }));
  return NextResponse.json({ plans });
});
