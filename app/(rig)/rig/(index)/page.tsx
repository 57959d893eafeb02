import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, memberRigLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { isCoach } from "@/lib/auth/permissions";
import { listFleet, rigSettingsFor } from "@/lib/data/fleet";
import { recordIdSchema } from "@/lib/validations/fleet";
import { boatClassLabel } from "@/lib/fleet/catalogue";
import { RigHelper } from "../_components/rig-helper";

export const metadata: Metadata = { title: "Change boats" };

export default async function RigPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requirePageActor("member", "/rig");
  const params = await searchParams;
  const boatParam = recordIdSchema.safeParse(params.boat);
  const [fleet, settings] = await Promise.all([listFleet(actor), rigSettingsFor(actor)]);
  return (
    <div>
      <PageTitle lead="Pick the boat you are moving to, measure your oar, and follow the steps in order.">Change boats</PageTitle>
      <RigNav label="Rig" links={memberRigLinks(isCoach(actor))} current="/rig" />
      {fleet.boats.length === 0 ? (
        <p>No boats are recorded for your club yet. A coach or club administrator can add them under Fleet.</p>
      ) : (
        <RigHelper
          boats={fleet.boats}
          oarSets={fleet.oarSets}
          limits={settings.limits}
          halfSwivelCm={settings.halfSwivelCm}
          userId={actor.id}
          initialBoatId={boatParam.success ? boatParam.data : undefined}
        />
      )}
      {fleet.boats.length > 0 && (
        <section aria-labelledby="boats-heading" className="mt-8">
          <h2 id="boats-heading" className="mb-2 text-lg font-semibold">
            The club&apos;s boats
          </h2>
          <p className="mb-3 text-slate-700">Each boat&apos;s span or spread, its oar sets and their settings, in plain words.</p>
          <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="rig-boats">
            {fleet.boats.map((boat) => (
              <li key={boat.id}>
                <Link href={`/rig/boats/${boat.id}`} className="flex min-h-11 flex-wrap items-center gap-x-2 px-4 py-2 hover:bg-river-50">
                  <span className="font-semibold text-river-800 underline">{boat.name}</span>
                  <span className="text-sm text-slate-700">{boatClassLabel(boat.boatClass)}</span>
                  <PendingMark />
                </Link>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
