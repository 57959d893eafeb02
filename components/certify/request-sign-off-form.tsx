"use client";

import { useId, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";

interface CoachOption {
  id: number;
  name: string;
}

/**
 * "Ask a coach to watch me": posts to /api/sign-offs (the same schema checks it there) and refreshes
 * the page, so the panel around it shows the waiting state.
 */
export function RequestSignOffForm({
  moduleSlug,
  coaches,
  canRequest = true,
}: {
  moduleSlug: string;
  coaches: CoachOption[];
  canRequest?: boolean;
}) {
  const router = useRouter();
  const selectId = useId();
  const [coachId, setCoachId] = useState("");
  const [pending, setPending] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; message: string } | null>(null);

  async function submit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPending(true);
    setResult(null);
    try {
      const response = await fetch("/api/sign-offs", {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify({ moduleSlug, coachId: coachId ? Number(coachId) : null }),
      });
      const body = (await response.json().catch(() => ({}))) as { message?: string };
      if (response.ok) {
        setResult({
          ok: true,
          message: "Asked. The coach has an e-mail and will watch you at the boat rack.",
        });
        router.refresh();
      } else {
        setResult({ ok: false, message: body.message ?? "That did not work. Try again." });
      }
    } catch {
      setResult({ ok: false, message: "No connection. Try again when you have signal." });
    } finally {
      setPending(false);
    }
  }

  return (
    <div className="space-y-3">
      {canRequest && (
        <form onSubmit={submit} data-testid="request-sign-off">
          <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
            <div className="flex flex-col gap-1 sm:flex-1">
              <label htmlFor={selectId} className="font-semibold text-slate-900">
                Which coach?
              </label>
              <select
                id={selectId}
                value={coachId}
                onChange={(event) => setCoachId(event.target.value)}
                className="min-h-11 w-full rounded-md border border-slate-500 bg-white px-3 py-2 text-base"
              >
                <option value="">Any coach</option>
                {coaches.map((coach) => (
                  <option key={coach.id} value={coach.id}>
                    {coach.name}
                  </option>
                ))}
              </select>
            </div>
            <Button type="submit" pending={pending} pendingLabel="Asking…">
              Ask for a sign-off
            </Button>
          </div>
        </form>
      )}
      {/* Outside the form, so the message survives the refresh that hides the form once asked. */}
      <LiveStatus testId="request-sign-off-status">
        {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
      </LiveStatus>
    </div>
  );
}
