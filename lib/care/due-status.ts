import { addDaysIso, daysBetweenIso } from "@/lib/care/dates";
import { formatIsoDate } from "@/lib/care/calendar";
import type { CleaningDueState } from "@/lib/care/cleaning-due";

export interface DueStatus {
  due: boolean;
  /** Shown beside the words so the status never rests on colour alone. */
  icon: "⚠" | "✓";
  /** A few words: "Overdue", "Due before the race", "Clean". */
  label: string;
  /** One sentence saying why, with the dates. */
  detail: string;
}

/** A cleaning due state in words for coaches and athletes (and the digest). */
export function dueStatus(state: CleaningDueState, today: string, lastCleanedOn: string | null): DueStatus {
  const last = lastCleanedOn === null ? "" : ` Last cleaned ${formatIsoDate(lastCleanedOn)}.`;
  switch (state.reason) {
    case "never-cleaned":
      return { due: true, icon: "⚠", label: "Due now", detail: "No cleaning on record." };
    case "over-7-days": {
      const since = state.nextDueOn ?? today;
      const overdue = daysBetweenIso(since, today) > 0;
      return {
        due: true,
        icon: "⚠",
        label: overdue ? "Overdue" : "Due today",
        detail: overdue
          ? `A week since the last clean ran out on ${formatIsoDate(since)}.${last}`
          : `A week has passed since the last clean.${last}`,
      };
    }
    case "race-day-next": {
      const race = addDaysIso(state.nextDueOn ?? today, 1);
      return {
        due: true,
        icon: "⚠",
        label: "Due before the race",
        detail: `Race day ${formatIsoDate(race)}: clean the handles the day before or on the day.${last}`,
      };
    }
    case "humid-spell":
      return {
        due: true,
        icon: "⚠",
        label: "Due today (humid spell)",
        detail: `During a humid spell handles are cleaned every day.${last}`,
      };
    case "ok":
      return {
        due: false,
        icon: "✓",
        label: "Clean",
        detail: `Next clean due ${state.nextDueOn ? formatIsoDate(state.nextDueOn) : "soon"}.${last}`,
      };
  }
}
