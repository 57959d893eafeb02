"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { reachAction } from "@/lib/http/reach-action";
import { reissueCertificatesAction } from "../actions";

/**
 * For an admin: reissue the athlete's current certificates that carry an earlier spelling of their name.
 * The printed ones stop checking as valid, so a dialog asks once more (focus on "Not now"). The message
 * stays after the refresh that lists the new certificates.
 */
export function ReissueCertificatesForm({
  athleteId,
  currentName,
  outdated,
}: {
  athleteId: number;
  currentName: string;
  outdated: { serial: string; athleteName: string }[];
}) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const count = outdated.length;
  const reissue = async () => {
    setBusy(true);
    try {
      const outcome = await reachAction(() => reissueCertificatesAction(athleteId, { name: currentName }));
      setResult(outcome);
      // Also after a refusal: someone may have reissued or renamed meanwhile, and the list must show it.
      router.refresh();
    } finally {
      setBusy(false);
      setConfirming(false);
    }
  };
  return (
    <div className="space-y-3">
      {count > 0 && (
        <Notice tone="warning" title="Name corrected since these were issued" testId="reissue-panel">
          <p>
            {count === 1 ? "One current certificate carries" : `${count} current certificates carry`} an earlier spelling (
            {[...new Set(outdated.map((entry) => entry.athleteName))].map((name) => `“${name}”`).join(", ")}). Reissue{" "}
            {count === 1 ? "it" : "them"} under “{currentName}”: new serials and check codes, the same dates and sign-off.
          </p>
          <Button type="button" className="mt-3" onClick={() => setConfirming(true)} data-testid="reissue-open">
            Reissue under the current name…
          </Button>
        </Notice>
      )}
      <Dialog
        open={confirming}
        onClose={() => {
          if (!busy) setConfirming(false);
        }}
        title={`Reissue ${count === 1 ? "one certificate" : `${count} certificates`} under “${currentName}”?`}
        description={
          <>
            <p>
              {outdated.map((entry) => entry.serial).join(", ")} will be revoked as replaced: their printed copies stop checking as valid.
            </p>
            <p className="mt-2">Print the new certificates for the register afterwards.</p>
          </>
        }
        testId="reissue-dialog"
      >
        <div className="flex flex-wrap justify-end gap-2">
          <Button type="button" variant="secondary" autoFocus disabled={busy} onClick={() => setConfirming(false)}>
            Not now
          </Button>
          <Button type="button" pending={busy} pendingLabel="Reissuing…" onClick={() => void reissue()}>
            Yes, reissue
          </Button>
        </div>
      </Dialog>
      <LiveStatus testId="reissue-status">{result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}</LiveStatus>
    </div>
  );
}
