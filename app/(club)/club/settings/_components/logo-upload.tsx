"use client";

import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";

const maxLogoBytes = 2 * 1024 * 1024;

/** Upload or remove the club's logo (PNG or JPEG, at most 2 MB; the server sniffs the bytes). */
export function LogoUpload({ hasLogo: initiallyHasLogo }: { hasLogo: boolean }) {
  const inputId = useId();
  const [hasLogo, setHasLogo] = useState(initiallyHasLogo);
  const [version, setVersion] = useState(0);
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  async function upload(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = "";
    if (!file) return;
    if (file.size > maxLogoBytes) {
      setMessage({ ok: false, text: "The logo must be 2 MB or smaller." });
      return;
    }
    setPending(true);
    try {
      const body = new FormData();
      body.append("file", file);
      const response = await fetch("/api/club/logo", { method: "POST", body });
      const answer = (await response.json().catch(() => ({}))) as { message?: string };
      if (response.ok) {
        setHasLogo(true);
        setVersion((value) => value + 1);
        setMessage({ ok: true, text: "Logo saved. New and re-downloaded certificates show it." });
      } else setMessage({ ok: false, text: answer.message ?? "The logo could not be saved." });
    } catch {
      setMessage({ ok: false, text: "No connection; the logo was not saved." });
    } finally {
      setPending(false);
    }
  }

  async function remove() {
    setPending(true);
    const response = await fetch("/api/club/logo", { method: "DELETE" }).catch(() => null);
    setPending(false);
    if (!response) setMessage({ ok: false, text: "No connection; the logo was not removed." });
    else if (response.ok) {
      setHasLogo(false);
      setMessage({ ok: true, text: "Logo removed." });
    } else setMessage({ ok: false, text: "The logo could not be removed." });
  }

  return (
    <div className="space-y-3">
      {hasLogo && (
        // eslint-disable-next-line @next/next/no-img-element -- a private, permission-checked image
        <img
          src={`/api/club/logo?v=${version}`}
          alt="The club's current logo"
          className="max-h-20 max-w-48 rounded border border-slate-300 bg-white object-contain p-1"
        />
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor={inputId} className="font-semibold">
          {hasLogo ? "Replace the logo" : "Upload a logo"}
        </label>
        <p id={`${inputId}-hint`} className="text-sm text-slate-700">
          PNG or JPEG, at most 2 MB. It appears at the top of every certificate.
        </p>
        <input
          id={inputId}
          type="file"
          accept="image/png,image/jpeg"
          aria-describedby={`${inputId}-hint`}
          disabled={pending}
          onChange={upload}
          className="min-h-11 text-base"
        />
      </div>
      {hasLogo && (
        <Button type="button" variant="secondary" onClick={remove} pending={pending} pendingLabel="Working…">
          Remove the logo
        </Button>
      )}
      <LiveStatus testId="logo-status">{message && <Notice tone={message.ok ? "success" : "error"} title={message.text} />}</LiveStatus>
    </div>
  );
}
