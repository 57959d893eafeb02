"use client";

import { useEffect } from "react";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="space-y-4" role="alert">
      <h1 className="text-2xl font-bold text-river-900">Something went wrong</h1>
      <p>This page could not be shown. Nothing you saved has been lost. Try again, and tell a coach if it keeps happening.</p>
      {error.digest && <p className="text-sm text-slate-700">Reference: {error.digest}</p>}
      <button type="button" onClick={reset} className="min-h-11 rounded-md bg-river-700 px-4 font-semibold text-white">
        Try again
      </button>
    </div>
  );
}
