import type { ReactNode } from "react";

type Tone = "info" | "success" | "warning" | "error";

const tones: Record<Tone, { classes: string; word: string; icon: string }> = {
  info: { classes: "border-river-500 bg-white text-slate-900", word: "Note", icon: "ℹ" },
  success: { classes: "border-reed-600 bg-reed-100 text-reed-800", word: "Done", icon: "✓" },
  warning: { classes: "border-signal-600 bg-signal-100 text-signal-800", word: "Careful", icon: "!" },
  error: { classes: "border-alarm-600 bg-alarm-100 text-alarm-800", word: "Problem", icon: "✕" },
};

/** A message box that says its kind in words and an icon, never by colour alone. */
export function Notice({ tone = "info", title, children, testId }: { tone?: Tone; title?: string; children?: ReactNode; testId?: string }) {
  const style = tones[tone];
  return (
    <div data-testid={testId} className={`rounded-md border-l-4 p-3 ${style.classes}`}>
      <p className="font-semibold">
        <span aria-hidden="true">{style.icon} </span>
        {title ?? style.word}
      </p>
      {children && <div className="mt-1">{children}</div>}
    </div>
  );
}

/** A polite live region for status messages from forms. */
export function LiveStatus({ children, testId }: { children?: ReactNode; testId?: string }) {
  return (
    <div aria-live="polite" role="status" data-testid={testId}>
      {children}
    </div>
  );
}
