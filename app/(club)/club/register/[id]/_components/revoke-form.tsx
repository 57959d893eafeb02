"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { revokeCertificateSchema } from "@/lib/validations/certification";
import { revokeCertificateAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

/**
 * Revoke a certificate: the reason is kept in the audit log and the register. Revoking cannot be undone,
 * so a checked reason opens a dialog that asks once more (focus on "Keep it").
 */
export function RevokeCertificateForm({
  certificateId,
  serial,
  kind,
  revoked,
}: {
  certificateId: string;
  serial: string;
  kind: "module" | "clearance";
  revoked: boolean;
}) {
  const router = useRouter();
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const [confirming, setConfirming] = useState<z.output<typeof revokeCertificateSchema> | null>(null);
  const [busy, setBusy] = useState(false);
  const form = useForm<z.input<typeof revokeCertificateSchema>, unknown, z.output<typeof revokeCertificateSchema>>({
    resolver: zodResolver(revokeCertificateSchema),
    defaultValues: { reason: "" },
  });
  const onSubmit = form.handleSubmit((values) => {
    setResult(null);
    setConfirming(values);
  });
  const revoke = async (values: z.output<typeof revokeCertificateSchema>) => {
    setBusy(true);
    try {
      const outcome = await reachAction(() => revokeCertificateAction(certificateId, values));
      setResult(outcome);
      if (!outcome.ok && outcome.fieldErrors.reason) form.setError("reason", { message: outcome.fieldErrors.reason[0] });
      // Also after a refusal: it may have been revoked meanwhile, and the page must not keep calling it valid.
      else router.refresh();
    } finally {
      setBusy(false);
      setConfirming(null);
    }
  };
  const status = (
    <LiveStatus testId="revoke-status">{result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}</LiveStatus>
  );
  // The live region stays mounted after the refresh that marks the certificate revoked, so the message stays too.
  return (
    <>
      {!revoked && (
        <ClientForm onSubmit={onSubmit} noValidate className="space-y-3" data-testid="revoke-form">
          <p className="text-sm text-slate-700">
            {kind === "module"
              ? "Revoking withdraws this module's pass: the athlete needs a new practical sign-off, and a rigging clearance certificate that stands on it is revoked too."
              : "Revoking withdraws this document. To stop someone rigging without a coach, a coach suspends their clearance on the athlete's page."}
          </p>
          <TextField
            label="Reason for revoking"
            hint="Kept in the register and the audit log; not shown on the public check page."
            error={form.formState.errors.reason?.message}
            {...form.register("reason")}
          />
          <Button type="submit" variant="danger">
            Revoke certificate…
          </Button>
        </ClientForm>
      )}
      <Dialog
        open={confirming !== null}
        onClose={() => {
          if (!busy) setConfirming(null);
        }}
        title={`Revoke certificate ${serial}?`}
        description={
          <>
            <p>This cannot be undone; the public check page will say it is revoked.</p>
            {confirming && <p className="mt-2">Reason: “{confirming.reason}”</p>}
          </>
        }
        testId="revoke-dialog"
      >
        <div className="flex flex-wrap justify-end gap-2">
          <Button type="button" variant="secondary" autoFocus disabled={busy} onClick={() => setConfirming(null)}>
            Keep it
          </Button>
          <Button
            type="button"
            variant="danger"
            pending={busy}
            pendingLabel="Revoking…"
            onClick={() => {
              if (confirming) void revoke(confirming);
            }}
          >
            Yes, revoke it
          </Button>
        </div>
      </Dialog>
      {status}
    </>
  );
}
