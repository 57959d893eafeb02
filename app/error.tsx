"use client";

import { useEffect } from "react";
import { useOnline } from "@/components/ui/use-online";

/**
 * A page that could not be shown. `retry` fetches the page again from the server (Next 16.3); `reset`
 * only re-rendered what the browser already had, so "Try again" after a server error showed it again.
 */
export default function ErrorPage({ error, retry }: { error: Error & { digest?: string }; retry: () => void }) {
  const online = useOnline();
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="space-y-4" role="alert">
      <h1 className="text-2xl font-bold text-river-900">{online ? "Something went wrong" : "No connection"}</h1>
      <p>
        {online
          ? "This page could not be shown. What you saved before is kept; the last change you made may not have been. Try again, and tell a coach if it keeps happening."
          : "This page needs a connection to Slipway. What you saved before is kept; the last change you made may not have been. Try again once you have a signal."}
      </p>
      {error.digest && <p className="text-sm text-slate-700">Reference: {error.digest}</p>}
      <button type="button" onClick={retry} className="min-h-11 rounded-md bg-river-700 px-4 font-semibold text-white">
        Try again
      </button>
    </div>
  );
}
