"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import Link from "next/link";
import { startSession } from "@/lib/auth/start-session";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";

export function LinkSignInButton({ token }: { token: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [failed, setFailed] = useState(false);
  const [unreached, setUnreached] = useState(false);
  return (
    <div className="space-y-4">
      <Button
        type="button"
        pending={pending}
        pendingLabel="Signing in…"
        className="w-full"
        onClick={async () => {
          setPending(true);
          setFailed(false);
          setUnreached(false);
          const result = await startSession("link", { token });
          if (result.ok) {
            router.replace("/home");
            router.refresh();
            return;
          }
          if (result.reason === "unreached") {
            setPending(false);
            setUnreached(true);
            return;
          }
          setPending(false);
          setFailed(true);
        }}
      >
        Sign in to Slipway
      </Button>
      <LiveStatus>
        {unreached && (
          <Notice tone="error" title="Slipway could not be reached, so you are not signed in yet. Try again once you have a connection." />
        )}
        {failed && (
          <Notice tone="error" title="This link has expired or was already used.">
            <Link href="/sign-in" className="underline">
              Ask for a new link
            </Link>
          </Notice>
        )}
      </LiveStatus>
    </div>
  );
}
