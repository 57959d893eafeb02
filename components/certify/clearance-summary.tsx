import Link from "next/link";
import type { Actor } from "@/lib/auth/permissions";
import { clearanceOf } from "@/lib/data/clearance";
import { formatLongDate, lastValidDay } from "@/lib/clearance/dates";
import { notClearedText, suspendedClearanceText } from "@/lib/clearance/athlete-summary";
import { ClearanceBadge } from "@/components/certify/status-badge";

/**
 * The athlete's "may rig unsupervised" state with what is still missing, for the learning page and the
 * certificates page (which passes `onCertificatesPage`, so the box does not link to the page it is on).
 */
export async function ClearanceSummary({ actor, onCertificatesPage = false }: { actor: Actor; onCertificatesPage?: boolean }) {
  const { standing } = await clearanceOf(actor);
  const { clearance } = standing;
  return (
    <section aria-labelledby="clearance-heading" className="space-y-2 rounded-lg bg-white p-4 shadow-sm" data-testid="clearance-summary">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="clearance-heading" className="text-lg font-semibold">
          Rigging without a coach
        </h2>
        <ClearanceBadge state={clearance.state} testId="clearance-state" />
      </div>
      {clearance.state === "cleared" && clearance.expiresOn && (
        <p>
          You may rig your own oars within the club&apos;s limits up to and including {formatLongDate(lastValidDay(clearance.expiresOn))}.
          Check every collar and screw before each outing.
        </p>
      )}
      {clearance.state === "suspended" && <p>{suspendedClearanceText(clearance.suspension?.reason)}</p>}
      {clearance.state === "expired" && <p>A module pass has run out. Ask a coach to sign it off again; until then rig with a coach.</p>}
      {clearance.state === "not-cleared" && <p>{notClearedText(standing.modules, clearance.requiredModules)}</p>}
      {!onCertificatesPage && (
        <p>
          <Link href="/learn/certificates" className="font-semibold text-river-700 underline">
            Your certificates
          </Link>
        </p>
      )}
    </section>
  );
}
