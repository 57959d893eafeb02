import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { rigSettingsFor } from "@/lib/data/fleet";
import { BoatForm } from "../../_components/boat-form";

export const metadata: Metadata = { title: "Add a boat" };

export default async function NewBoatPage() {
  const actor = await requirePageActor("coach", "/roster/fleet/boats/new");
  const settings = await rigSettingsFor(actor);
  return (
    <div>
      <PageTitle lead="Its class, and its span (sculling) or spread (sweep).">Add a boat</PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="" />
      <section className="rounded-lg bg-white p-4 shadow-sm">
        <BoatForm halfSwivelCm={settings.halfSwivelCm} />
      </section>
    </div>
  );
}
