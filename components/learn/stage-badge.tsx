import { moduleStageLabels, type ModuleStage } from "@/lib/learning/progress";

const styles: Record<ModuleStage, { icon: string; classes: string }> = {
  "not-started": { icon: "○", classes: "border-slate-400 bg-white text-slate-800" },
  "lesson-read": { icon: "◐", classes: "border-river-500 bg-river-50 text-river-800" },
  "quiz-failed": { icon: "↻", classes: "border-signal-600 bg-signal-100 text-signal-800" },
  "quiz-passed": { icon: "✓", classes: "border-reed-600 bg-reed-100 text-reed-800" },
};

/** A module's stage in words with an icon (never colour alone). */
export function StageBadge({ stage, label }: { stage: ModuleStage; label?: string }) {
  const style = styles[stage];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-sm font-semibold ${style.classes}`}>
      <span aria-hidden="true">{style.icon}</span>
      {label ?? moduleStageLabels[stage]}
    </span>
  );
}
