import type { ClearanceState, ModuleStatus } from "@/lib/clearance/rules";
import { clearanceStateLabels, moduleStatusLabels } from "@/lib/clearance/rules";
import type { CertificateStatus } from "@/lib/certificates/status";
import { certificateStatusLabels } from "@/lib/certificates/status";

export type BadgeTone = "success" | "info" | "warning" | "danger" | "neutral";

const toneClasses: Record<BadgeTone, string> = {
  success: "border-reed-600 bg-reed-100 text-reed-800",
  info: "border-river-500 bg-river-50 text-river-800",
  warning: "border-signal-600 bg-signal-100 text-signal-800",
  danger: "border-alarm-600 bg-alarm-100 text-alarm-800",
  neutral: "border-slate-400 bg-white text-slate-800",
};

/** A status in words with an icon; the colour only repeats what the words say. */
export function StatusBadge({ tone, icon, label, testId }: { tone: BadgeTone; icon: string; label: string; testId?: string }) {
  return (
    <span
      data-testid={testId}
      className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-sm font-semibold ${toneClasses[tone]}`}
    >
      <span aria-hidden="true">{icon}</span>
      {label}
    </span>
  );
}

export const moduleStatusTones: Record<ModuleStatus, BadgeTone> = {
  "not-started": "neutral",
  "lesson-read": "neutral",
  "quiz-failed": "neutral",
  "ready-for-sign-off": "info",
  "waiting-for-sign-off": "info",
  "not-yet": "danger",
  passed: "success",
  expired: "warning",
};

export const clearanceTones: Record<ClearanceState, BadgeTone> = {
  cleared: "success",
  suspended: "danger",
  expired: "warning",
  "not-cleared": "neutral",
};

export const certificateTones: Record<CertificateStatus, BadgeTone> = {
  valid: "success",
  expired: "warning",
  revoked: "danger",
  suspended: "danger",
};

export function ModuleStatusBadge({ status, label }: { status: ModuleStatus; label?: string }) {
  const { icon, label: standard } = moduleStatusLabels[status];
  return <StatusBadge tone={moduleStatusTones[status]} icon={icon} label={label ?? standard} />;
}

export function ClearanceBadge({ state, testId }: { state: ClearanceState; testId?: string }) {
  const { icon, label } = clearanceStateLabels[state];
  return <StatusBadge tone={clearanceTones[state]} icon={icon} label={label} testId={testId} />;
}

export function CertificateStatusBadge({ status, testId }: { status: CertificateStatus; testId?: string }) {
  const { icon, label } = certificateStatusLabels[status];
  return <StatusBadge tone={certificateTones[status]} icon={icon} label={label} testId={testId} />;
}
