"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { endSession } from "@/lib/auth/sign-out";

export function SignOutButton() {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      disabled={pending}
      onClick={async () => {
        setPending(true);
        try {
          await endSession("/sign-in");
        } catch (error) {
          setPending(false); // still signed in: let them try again
          throw error;
        }
        router.replace("/sign-in");
        router.refresh();
      }}
      className="inline-flex min-h-11 items-center rounded border border-river-200 px-3 font-semibold text-white hover:bg-river-800 disabled:opacity-70"
    >
      {pending ? "Signing out…" : "Sign out"}
    </button>
  );
}
