import { useId, type ReactNode } from "react";

type CalloutKind = "caution" | "tip" | "coach-check";

interface CalloutProps {
  /** Replaces the default heading word ("Caution", "Tip", "Coach check"). */
  title?: string;
  children: ReactNode;
}

const STYLES: Record<CalloutKind, { heading: string; box: string; icon: string }> = {
  // Dark text on pale tints: all pairs are well above the WCAG AA 4.5:1 ratio.
  caution: {
    heading: "Caution",
    box: "border-signal-600 bg-signal-100 text-slate-900",
    icon: "text-signal-800",
  },
  tip: {
    heading: "Tip",
    box: "border-reed-600 bg-reed-100 text-slate-900",
    icon: "text-reed-800",
  },
  "coach-check": {
    heading: "Coach check",
    box: "border-river-700 bg-river-100 text-slate-900",
    icon: "text-river-800",
  },
};

function CalloutIcon({ kind }: { kind: CalloutKind }) {
  const common = {
    "aria-hidden": true,
    focusable: false,
    viewBox: "0 0 24 24",
    className: "h-5 w-5 shrink-0",
    fill: "none",
    stroke: "currentColor",
    strokeWidth: 2,
    strokeLinecap: "round" as const,
    strokeLinejoin: "round" as const,
  };
  if (kind === "caution") {
    return (
      <svg {...common}>
        <path d="M12 3 2.5 20h19L12 3Z" />
        <path d="M12 10v4.5" />
        <path d="M12 17.5h.01" />
      </svg>
    );
  }
  if (kind === "tip") {
    return (
      <svg {...common}>
        <path d="M9 18h6M10 21h4" />
        <path d="M12 3a6 6 0 0 0-3.6 10.8c.7.6 1.1 1.3 1.1 2.2h5c0-.9.4-1.6 1.1-2.2A6 6 0 0 0 12 3Z" />
      </svg>
    );
  }
  return (
    <svg {...common}>
      <rect x="5" y="4" width="14" height="17" rx="2" />
      <path d="M9 4V3h6v1" />
      <path d="m8.5 13 2.5 2.5 4.5-5" />
    </svg>
  );
}

function Callout({ kind, title, children }: CalloutProps & { kind: CalloutKind }) {
  const headingId = useId();
  const style = STYLES[kind];
  return (
    <div role="note" aria-labelledby={headingId} className={`my-6 rounded-r-lg border-l-4 px-4 py-3 ${style.box}`}>
      <p id={headingId} className="flex items-center gap-2 text-base font-bold">
        <span className={style.icon}>
          <CalloutIcon kind={kind} />
        </span>
        {title ?? style.heading}
      </p>
      <div className="mt-1 text-base leading-7 [&>p]:my-2 [&>ul]:my-2 [&>ul]:list-disc [&>ul]:pl-6">{children}</div>
    </div>
  );
}

/** A safety warning: something that could hurt someone or leave a boat out of control. */
export function Caution(props: CalloutProps) {
  return <Callout kind="caution" {...props} />;
}

/** A helpful hint that makes the job easier; never safety-critical. */
export function Tip(props: CalloutProps) {
  return <Callout kind="tip" {...props} />;
}

/** What the coach will watch for at the practical sign-off, or a point where you stop and ask. */
export function CoachCheck(props: CalloutProps) {
  return <Callout kind="coach-check" {...props} />;
}
