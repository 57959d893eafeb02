import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { lookUpBy } from "@/lib/http/look-up";
import { readJson, route } from "@/lib/http/route";
import { requestSignOff, signOffQueue } from "@/lib/data/sign-offs";
import { signOffRequestSchema } from "@/lib/validations/certification";

export const dynamic = "force-dynamic";

/** Coaches and admins: the sign-offs their club's athletes wait for, oldest first. */
export const GET = route(async () => {
  const actor = await requireActor();
  return NextResponse.json({ signOffs: await signOffQueue(actor) });
});

/**
 * An athlete who passed a module's quiz asks for its practical sign-off: 201 with the sign-off's id;
 * 404 naming moduleSlug for a module the course does not have, 409 naming it when asking is not yet due.
 */
export const POST = route(async (request) => {
  const actor = await requireActor();
  const input = await readJson(request, signOffRequestSchema);
  const { assessmentId } = await lookUpBy("moduleSlug", "module", () => requestSignOff(actor, input));
  return NextResponse.json({ assessmentId }, { status: 201 });
});
