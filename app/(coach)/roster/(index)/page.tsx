import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { clubOf } from "@/lib/data/members";
import { signOffQueue } from "@/lib/data/sign-offs";
import { RosterMatrixView } from "../_components/roster-matrix";

export const metadata: Metadata = { title: "Roster" };

export default async function RosterPage() {
  const actor = await requirePageActor("coach", "/roster");
  const [club, queue] = await Promise.all([clubOf(actor), signOffQueue(actor)]);
  const forMe = queue.filter((entry) => entry.forMe).length;
  return (
    <div className="space-y-4">
      <PageTitle lead={`${club.name}: who may rig unsupervised, and where everyone is with each module.`}>Roster</PageTitle>
      <p>
        <Link
          href="/roster/sign-offs"
          className="inline-flex min-h-11 items-center font-semibold text-river-700 underline"
          data-testid="sign-off-queue-link"
        >
          <span aria-hidden="true">◔&nbsp;</span>Sign-offs waiting for you: {forMe}
        </Link>
      </p>
      <RosterMatrixView />
    </div>
  );
}
