"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import Link from "next/link";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { reachAction } from "@/lib/http/reach-action";
import { confirmEmailChangeAction } from "../actions";

/** A button press uses the link, so a mail scanner that opens it changes nothing. */
export function ConfirmEmailButton({ token }: { token: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [outcome, setOutcome] = useState<{ ok: boolean; message?: string } | null>(null);
  return (
    <div className="space-y-4">
      {!outcome?.ok && (
        <Button
          type="button"
          pending={pending}
          pendingLabel="Confirming…"
          className="w-full"
          onClick={async () => {
            setPending(true);
            setOutcome(null);
            const result = await reachAction(() => confirmEmailChangeAction({ token }));
            setPending(false);
            setOutcome(result);
            // Every session ended with the change: the header should say so.
            if (result.ok) router.refresh();
          }}
        >
          Confirm the new address
        </Button>
      )}
      <LiveStatus testId="confirm-email-status">
        {outcome && (
          <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message}>
            <Link href="/sign-in" className="underline">
              {outcome.ok ? "Sign in" : "Go to sign-in"}
            </Link>
          </Notice>
        )}
      </LiveStatus>
    </div>
  );
}
