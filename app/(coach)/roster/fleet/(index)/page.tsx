import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { buttonClasses } from "@/components/ui/button-classes";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { formatCm } from "@/components/lessons/lesson-format";
import { requirePageActor } from "@/lib/auth/session";
import { listFleet, type BoatSummary, type OarSetSummary } from "@/lib/data/fleet";
import { boatClassLabel, handleMechanismLabels, oarTypeLabels } from "@/lib/fleet/catalogue";
import { ArchiveButton } from "../_components/archive-button";

export const metadata: Metadata = { title: "Fleet" };

function BoatRow({ boat, sets }: { boat: BoatSummary; sets: Map<number, OarSetSummary> }) {
  const width = boat.oarType === "sculling" ? `span ${formatCm(boat.spanCm ?? 0)} cm` : `spread ${formatCm(boat.spreadCm ?? 0)} cm`;
  const names = boat.oarSetIds.map((id) => sets.get(id)?.name).filter(Boolean);
  return (
    <li className="flex flex-wrap items-start justify-between gap-3 px-4 py-3" data-testid="fleet-boat" data-name={boat.name}>
      <div>
        <Link href={`/rig/boats/${boat.id}`} className="font-semibold text-river-800 underline">
          {boat.name}
          <PendingMark />
        </Link>{" "}
        <span className="text-sm text-slate-700">
          {boatClassLabel(boat.boatClass)} · {width}
        </span>
        <span className="block text-sm">{names.length ? `Oar sets: ${names.join(", ")}` : "No oar set linked yet."}</span>
      </div>
      <div className="flex flex-wrap gap-2">
        <Link href={`/roster/fleet/boats/${boat.id}`} className={buttonClasses("secondary")} aria-label={`Edit ${boat.name}`}>
          Edit
          <PendingMark />
        </Link>
        <ArchiveButton kind="boat" id={boat.id} name={boat.name} archived={boat.archived} />
      </div>
    </li>
  );
}

function OarSetRow({ set, boats }: { set: OarSetSummary; boats: Map<number, BoatSummary> }) {
  const names = set.boatIds.map((id) => boats.get(id)?.name).filter(Boolean);
  return (
    <li className="flex flex-wrap items-start justify-between gap-3 px-4 py-3" data-testid="fleet-oar-set" data-name={set.name}>
      <div>
        <span className="font-semibold">{set.name}</span>{" "}
        <span className="text-sm text-slate-700">
          {set.oarCount} {oarTypeLabels[set.oarType].toLowerCase()} · {formatCm(set.targetLengthCm)} cm, inboard{" "}
          {formatCm(set.targetInboardCm)} cm · clicks {formatCm(set.clickCm)} cm
        </span>
        <span className="block text-sm">{handleMechanismLabels[set.handleMechanism]}.</span>
        <span className="block text-sm">{names.length ? `Used in: ${names.join(", ")}` : "Not linked to a boat."}</span>
      </div>
      <div className="flex flex-wrap gap-2">
        <Link href={`/roster/fleet/oar-sets/${set.id}`} className={buttonClasses("secondary")} aria-label={`Edit ${set.name}`}>
          Edit
          <PendingMark />
        </Link>
        <ArchiveButton kind="oar-set" id={set.id} name={set.name} archived={set.archived} />
      </div>
    </li>
  );
}

export default async function FleetPage() {
  const actor = await requirePageActor("coach", "/roster/fleet");
  const fleet = await listFleet(actor, { includeArchived: true });
  const boats = new Map(fleet.boats.map((boat) => [boat.id, boat]));
  const sets = new Map(fleet.oarSets.map((set) => [set.id, set]));
  const activeBoats = fleet.boats.filter((boat) => !boat.archived);
  const activeSets = fleet.oarSets.filter((set) => !set.archived);
  const archivedBoats = fleet.boats.filter((boat) => boat.archived);
  const archivedSets = fleet.oarSets.filter((set) => set.archived);
  return (
    <div className="space-y-8">
      <PageTitle lead="The club's boats and oar sets, the targets athletes rig to, and which sets go in which boats.">Fleet</PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="/roster/fleet" />
      <section aria-labelledby="boats-heading" className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="boats-heading" className="text-lg font-semibold">
            Boats ({activeBoats.length})
          </h2>
          <Link href="/roster/fleet/boats/new" className={buttonClasses("primary")}>
            Add a boat
          </Link>
        </div>
        {activeBoats.length === 0 ? (
          <p>No boats yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="fleet-boats">
            {activeBoats.map((boat) => (
              <BoatRow key={boat.id} boat={boat} sets={sets} />
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="sets-heading" className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="sets-heading" className="text-lg font-semibold">
            Oar sets ({activeSets.length})
          </h2>
          <Link href="/roster/fleet/oar-sets/new" className={buttonClasses("primary")}>
            Add an oar set
          </Link>
        </div>
        {activeSets.length === 0 ? (
          <p>No oar sets yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="fleet-oar-sets">
            {activeSets.map((set) => (
              <OarSetRow key={set.id} set={set} boats={boats} />
            ))}
          </ul>
        )}
      </section>
      {(archivedBoats.length > 0 || archivedSets.length > 0) && (
        <section aria-labelledby="archived-heading" className="space-y-3">
          <h2 id="archived-heading" className="text-lg font-semibold">
            Archived
          </h2>
          <p className="text-sm text-slate-700">
            Archived boats and sets are hidden from athletes; their saved plans and cleanings are kept.
          </p>
          <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="fleet-archived">
            {archivedBoats.map((boat) => (
              <BoatRow key={`boat-${boat.id}`} boat={boat} sets={sets} />
            ))}
            {archivedSets.map((set) => (
              <OarSetRow key={`set-${set.id}`} set={set} boats={boats} />
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
