"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";

export function LinkSignInButton({ token }: { token: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [failed, setFailed] = useState(false);
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
          const result = await signIn("link", { token, redirect: false });
          if (result?.ok && !result.error) {
            router.replace("/home");
            router.refresh();
            return;
          }
          setPending(false);
          setFailed(true);
        }}
      >
        Sign in to Slipway
      </Button>
      <LiveStatus>
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
