"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { endSession } from "@/lib/auth/sign-out";

export function SignOutButton() {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [failed, setFailed] = useState(false);
  return (
    <span className="inline-flex flex-col items-end">
      <button
        type="button"
        disabled={pending}
        onClick={async () => {
          setPending(true);
          setFailed(false);
          try {
            await endSession("/sign-in");
          } catch (error) {
            // Still signed in (a shared tablet must not look signed out): say so, and let them try again.
            console.warn("Sign-out did not reach the server", error);
            setPending(false);
            setFailed(true);
            return;
          }
          router.replace("/sign-in");
          router.refresh();
        }}
        className="inline-flex min-h-11 items-center rounded border border-river-200 px-3 font-semibold text-white hover:bg-river-800 disabled:opacity-70"
      >
        {pending ? "Signing out…" : "Sign out"}
      </button>
      <span role="status" className={`max-w-36 text-right text-xs text-amber-100 ${failed ? "mt-1" : ""}`} data-testid="sign-out-status">
        {failed ? "Still signed in: no answer. Try again." : ""}
      </span>
    </span>
  );
}
