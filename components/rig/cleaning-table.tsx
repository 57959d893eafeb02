import { DueBadge } from "@/components/rig/due-badge";
import type { OarSetCleaning } from "@/lib/data/cleaning";

/** Each oar set with its cleaning status, the reason, and who cleaned it last. */
export function CleaningTable({ oarSets, caption }: { oarSets: OarSetCleaning[]; caption: string }) {
  return (
    <div className="relative overflow-x-auto rounded-lg bg-white shadow-sm">
      <table className="w-full text-left" data-testid="cleaning-table">
        <caption className="px-4 pt-3 text-left font-semibold">{caption}</caption>
        <thead>
          <tr className="border-b border-slate-200 text-sm text-slate-700">
            <th scope="col" className="px-4 py-2">
              Oar set
            </th>
            <th scope="col" className="px-4 py-2">
              Status
            </th>
            <th scope="col" className="px-4 py-2">
              Why
            </th>
          </tr>
        </thead>
        <tbody>
          {oarSets.map((set) => (
            <tr key={set.oarSetId} data-testid="cleaning-row" data-set={set.name} className="border-b border-slate-100 align-top">
              <th scope="row" className="px-4 py-3 font-semibold">
                {set.name}
              </th>
              <td className="px-4 py-3">
                <DueBadge status={set.status} />
              </td>
              <td className="px-4 py-3 text-sm">
                {set.status.detail}
                {set.lastCleanedBy && <span className="block text-slate-700">By {set.lastCleanedBy}.</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
