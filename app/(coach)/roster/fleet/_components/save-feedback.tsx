import Link from "next/link";
import { LiveStatus, Notice } from "@/components/ui/notice";

export interface SaveOutcome {
  ok: boolean;
  message?: string;
  warnings: string[];
}

function WarningList({ warnings }: { warnings: readonly string[] }) {
  return (
    <ul className="list-disc pl-5">
      {warnings.map((warning) => (
        <li key={warning}>{warning}</li>
      ))}
    </ul>
  );
}

/**
 * What the boat and oar-set forms show under their fields: the club-limit warnings while typing, and
 * the saved (or refused) outcome in a live region. `testIdPrefix` keeps each form's test ids.
 */
export function SaveFeedback({
  testIdPrefix,
  liveWarnings,
  outcome,
}: {
  testIdPrefix: string;
  liveWarnings: readonly string[];
  outcome: SaveOutcome | null;
}) {
  return (
    <>
      {liveWarnings.length > 0 && (
        <Notice tone="warning" title="Check before saving" testId={`${testIdPrefix}-warnings`}>
          <WarningList warnings={liveWarnings} />
        </Notice>
      )}
      <LiveStatus testId={`${testIdPrefix}-status`}>
        {outcome && (
          <Notice tone={outcome.ok ? (outcome.warnings.length ? "warning" : "success") : "error"} title={outcome.message}>
            {outcome.warnings.length > 0 && <WarningList warnings={outcome.warnings} />}
            {outcome.ok && (
              <Link href="/roster/fleet" className="font-semibold underline">
                Back to boats and oar sets
              </Link>
            )}
          </Notice>
        )}
      </LiveStatus>
    </>
  );
}
