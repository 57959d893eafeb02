"use client";

import { useState, type ReactNode } from "react";
import { Notice } from "@/components/ui/notice";
import { useOnline } from "@/components/ui/use-online";

interface Props {
  /** The server action itself, so the form still works before (or without) scripts. */
  action: (formData: FormData) => Promise<void>;
  children: ReactNode;
}

/**
 * The "I've read it" form. It stays a plain form action (the lesson works without JavaScript), but a
 * phone that knows it is offline is told so here, beside the lesson it is reading, instead of the click
 * giving way to the error page. A request that leaves and gets no answer still goes to the error page,
 * whose Try again brings the lesson back.
 */
export function FinishLessonForm({ action, children }: Props) {
  const online = useOnline();
  const [heldOffline, setHeldOffline] = useState(false);
  return (
    <form
      action={action}
      onSubmit={(event) => {
        if (navigator.onLine !== false) return;
        event.preventDefault();
        setHeldOffline(true);
      }}
      className="rounded-lg bg-white p-4 shadow-sm"
    >
      {children}
      <div role="alert" className="mt-3 empty:hidden">
        {heldOffline && !online && (
          <Notice tone="warning" title="No connection" testId="finish-lesson-offline">
            You are offline, so the quiz cannot start yet. The lesson stays here: press the button again once you have a connection.
          </Notice>
        )}
      </div>
    </form>
  );
}
