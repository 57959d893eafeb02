import { redirect } from "next/navigation";
import { currentActor } from "@/lib/auth/session";
import { homePathFor } from "@/lib/auth/permissions";

/** Sends each role to its own landing page after sign-in. */
export default async function HomeRedirect() {
  const actor = await currentActor();
  redirect(actor ? homePathFor(actor.role) : "/sign-in");
}
