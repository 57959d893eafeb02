"use client";

import { useRef, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { roleLabels, type Role } from "@/lib/auth/roles";
import { reachAction } from "@/lib/http/reach-action";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { inviteMemberAction, withdrawInvitationAction } from "../actions";

export interface InvitationRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  /** Formatted on the server in the club's time zone. */
  sentLabel: string;
  expiresLabel: string;
  open: boolean;
}

/**
 * The club page's invitations not accepted yet, each with "Send again" (a fresh 14-day link; the earlier
 * one stops working) and "Withdraw". The outcome is said above the list, since a withdrawn row leaves it.
 */
export function UnansweredInvitations({ invitations, emptyText }: { invitations: InvitationRow[]; emptyText: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [working, setWorking] = useState<{ email: string; kind: "send" | "withdraw" } | null>(null);
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  // A withdrawn row takes its focused button with it: focus goes to the list, where the outcome is said.
  const listRef = useRef<HTMLDivElement>(null);

  function run(invitation: InvitationRow, kind: "send" | "withdraw") {
    setOutcome(null);
    setWorking({ email: invitation.email, kind });
    startTransition(async () => {
      const result = await reachAction(() =>
        kind === "send"
          ? inviteMemberAction({ email: invitation.email, name: invitation.name, role: invitation.role })
          : withdrawInvitationAction({ invitationId: invitation.id }),
      );
      const gone = !result.ok && Boolean(result.fieldErrors.invitationId);
      setOutcome({
        ok: result.ok,
        message: gone
          ? `The invitation to ${invitation.email} is not waiting any more: it was accepted or withdrawn.`
          : (result.message ?? (result.ok ? "Done." : "That did not work.")),
      });
      setWorking(null);
      if ((kind === "withdraw" && result.ok) || gone) listRef.current?.focus();
      if (result.ok || gone) router.refresh();
    });
  }

  const busy = (invitation: InvitationRow, kind: "send" | "withdraw") =>
    pending && working?.email === invitation.email && working.kind === kind;

  return (
    <div ref={listRef} tabIndex={-1} className="space-y-3 rounded" data-testid="invitations">
      <LiveStatus testId="invitations-status">
        {outcome && <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message} />}
      </LiveStatus>
      {invitations.length === 0 ? (
        <p>{emptyText}</p>
      ) : (
        <ul className="divide-y divide-slate-200">
          {invitations.map((invitation) => (
            <li key={invitation.email} className="space-y-2 py-3" data-testid={`invitation-${invitation.email}`}>
              <p>
                <span className="font-semibold">{invitation.name}</span> · {roleLabels[invitation.role]}
                <span className="block break-all text-sm text-slate-700">{invitation.email}</span>
                <span className="block text-sm">
                  Sent {invitation.sentLabel} ·{" "}
                  {invitation.open ? (
                    <>link works until {invitation.expiresLabel}</>
                  ) : (
                    <span className="font-semibold text-signal-800">
                      <span aria-hidden="true">◷ </span>expired {invitation.expiresLabel}
                    </span>
                  )}
                </span>
              </p>
              <div className="flex flex-wrap gap-2">
                <Button
                  type="button"
                  variant="secondary"
                  pending={busy(invitation, "send")}
                  pendingLabel="Sending…"
                  disabled={pending}
                  onClick={() => run(invitation, "send")}
                >
                  Send again<span className="sr-only"> to {invitation.email}</span>
                </Button>
                <Button
                  type="button"
                  variant="danger"
                  pending={busy(invitation, "withdraw")}
                  pendingLabel="Withdrawing…"
                  disabled={pending}
                  onClick={() => run(invitation, "withdraw")}
                >
                  Withdraw<span className="sr-only"> the invitation to {invitation.email}</span>
                </Button>
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
