import type { ChecklistItem } from "@/lib/content/module-schema";

export const checklistVerdicts = ["met", "not-yet"] as const;
export type ChecklistVerdict = (typeof checklistVerdicts)[number];
export type AssessmentOutcome = "passed" | "not-yet";

export const checklistVerdictLabels: Record<ChecklistVerdict, string> = {
  met: "Met",
  "not-yet": "Not yet",
};

/** The practical is passed only when the coach saw every checklist item met; anything else is "not yet". */
export function assessmentOutcome(
  checklist: readonly ChecklistItem[],
  verdicts: Readonly<Record<string, ChecklistVerdict | undefined>>,
): AssessmentOutcome {
  if (checklist.length === 0) return "not-yet";
  return checklist.every((item) => verdicts[item.id] === "met") ? "passed" : "not-yet";
}
