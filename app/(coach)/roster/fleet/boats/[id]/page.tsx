import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { getBoatForEdit, listFleet, rigSettingsFor } from "@/lib/data/fleet";
import { orNotFound } from "@/lib/http/page-not-found";
import { recordIdSchema } from "@/lib/validations/fleet";
import { BoatForm } from "../../_components/boat-form";

export const metadata: Metadata = { title: "Edit a boat" };

export default async function EditBoatPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("coach", `/roster/fleet/boats/${id}`);
  const boatId = recordIdSchema.safeParse(id);
  if (!boatId.success) notFound();
  const [boat, fleet, settings] = await Promise.all([
    orNotFound(getBoatForEdit(actor, boatId.data)),
    listFleet(actor),
    rigSettingsFor(actor),
  ]);
  const linkedSets = fleet.oarSets.filter((set) => boat.oarSetIds.includes(set.id));
  return (
    <div>
      <PageTitle
        lead={boat.archived ? "Archived: hidden from athletes until restored." : "Changes apply to the next plan an athlete works out."}
      >
        Edit {boat.name}
      </PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="" />
      <section className="rounded-lg bg-white p-4 shadow-sm">
        <BoatForm
          boatId={boat.id}
          initial={{
            name: boat.name,
            boatClass: boat.boatClass,
            ...(boat.spanCm !== null ? { spanCm: boat.spanCm } : {}),
            ...(boat.spreadCm !== null ? { spreadCm: boat.spreadCm } : {}),
            notes: boat.notes,
          }}
          linkedSets={linkedSets}
          halfSwivelCm={settings.halfSwivelCm}
        />
      </section>
    </div>
  );
}
