import type { DueStatus } from "@/lib/care/due-status";

/** A cleaning status in words and an icon (never colour alone). */
export function DueBadge({ status }: { status: DueStatus }) {
  return (
    <span
      data-testid="due-badge"
      className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-sm font-semibold ${
        status.due ? "border-signal-600 bg-signal-100 text-signal-800" : "border-reed-600 bg-reed-100 text-reed-800"
      }`}
    >
      <span aria-hidden="true">{status.icon}</span>
      {status.label}
    </span>
  );
}
