"use client";

import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { LiveStatus } from "@/components/ui/notice";
import { setBoatArchivedAction, setOarSetArchivedAction } from "../actions";

/** Archives (or restores) a boat or an oar set; nothing is deleted, so saved plans and cleanings keep their record. */
export function ArchiveButton({ kind, id, name, archived }: { kind: "boat" | "oar-set"; id: number; name: string; archived: boolean }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  const action = kind === "boat" ? setBoatArchivedAction : setOarSetArchivedAction;
  return (
    <span className="inline-flex flex-col">
      <Button
        type="button"
        variant="secondary"
        pending={pending}
        pendingLabel={archived ? "Restoring…" : "Archiving…"}
        aria-label={`${archived ? "Restore" : "Archive"} ${name}`}
        onClick={() =>
          startTransition(async () => {
            const outcome = await action({ id, archived: !archived });
            setMessage(outcome.ok ? null : outcome.message);
            if (outcome.ok) router.refresh();
          })
        }
      >
        {archived ? "Restore" : "Archive"}
      </Button>
      <LiveStatus>{message && <span className="text-sm font-semibold text-alarm-800">{message}</span>}</LiveStatus>
    </span>
  );
}
