import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { listRigPlans, saveRigPlan } from "@/lib/data/rig-plans";
import { readJson, route } from "@/lib/http/route";
import { recordIdSchema } from "@/lib/validations/fleet";
import { savedRigPlanSchema } from "@/lib/validations/rig-plans";
import { ValidationError } from "@/lib/http/errors";

export const dynamic = "force-dynamic";

/** A signed-in athlete records a plan: 201 when new, 200 when this plan (same clientId) was already recorded. */
export const POST = route(async (request) => {
  const actor = await requireActor();
  const input = await readJson(request, savedRigPlanSchema);
  const outcome = await saveRigPlan(actor, input);
  return NextResponse.json(outcome, { status: outcome.created ? 201 : 200 });
});

/** Coaches and admins: the club's recent plans, newest first; `?boat=<id>` for one boat. */
export const GET = route(async (request) => {
  const actor = await requireActor();
  const boatParam = new URL(request.url).searchParams.get("boat");
  let boatId: number | undefined;
  if (boatParam !== null) {
    const parsed = recordIdSchema.safeParse(boatParam);
    if (!parsed.success) throw new ValidationError("boat: must be a boat id", { boat: ["must be a boat id"] });
    boatId = parsed.data;
  }
  const plans = await listRigPlans(actor, { boatId });
  return NextResponse.json({ plans });
});
