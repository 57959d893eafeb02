import { formatIsoDate } from "@/lib/care/calendar";
import type { CleaningDueState } from "@/lib/care/cleaning-due";
import { dueStatus } from "@/lib/care/due-status";

/** Short cleaning cautions (common practice; trisodium phosphate per ICSC 1178), shared by pages and mail. */
export const cleaningCautions = [
  "Use a mild detergent (for example sugar soap) and a soft brass brush or pot scourer, never a steel brush, then rinse and let the handles dry.",
  "Trisodium phosphate burns skin and eyes: wear gloves and eye protection, and rinse eyes with plenty of water for several minutes if it splashes.",
  "Never mix cleaners (bleach with ammonia is dangerous), keep solvents and thinners off the grips, and follow the product label and your club's and local rules.",
  "A torn grip cannot be cleaned properly: tell your coach so it can be repaired or replaced.",
] as const;

export interface DigestOarSet {
  name: string;
  lastCleanedOn: string | null;
  state: CleaningDueState;
}

export interface CleaningDigestInput {
  clubName: string;
  /** The date the digest describes (YYYY-MM-DD). */
  today: string;
  /** e.g. "2026-W49". */
  isoWeek: string;
  oarSets: DigestOarSet[];
  /** Race days today or later (YYYY-MM-DD). */
  raceDays: string[];
  humidSpell: boolean;
  /** Where coaches see the list, e.g. "https://club.example/roster/fleet/care". */
  careUrl: string;
}

/**
 * The weekly cleaning digest for coaches: the oar sets due (overdue first, oldest first), the ones up to
 * date, the race days ahead, the humid spell, the cautions and a link to the list.
 */
export function buildCleaningDigest(input: CleaningDigestInput): { subject: string; text: string } {
  const due = input.oarSets
    .filter((set) => set.state.due)
    .sort((a, b) => (a.state.nextDueOn ?? "").localeCompare(b.state.nextDueOn ?? "") || a.name.localeCompare(b.name));
  const fine = input.oarSets.filter((set) => !set.state.due).sort((a, b) => a.name.localeCompare(b.name));
  const upcomingRaces = input.raceDays.filter((day) => day >= input.today).sort();

  const lines = [
    "Hello,",
    "",
    `This is the weekly grip-cleaning digest for ${input.clubName} (week ${input.isoWeek}, ${formatIsoDate(input.today)}).`,
    "",
  ];
  if (due.length === 0) {
    lines.push("No oar set is due for cleaning.");
  } else {
    lines.push(`Due for cleaning (${due.length}):`);
    for (const set of due) {
      const status = dueStatus(set.state, input.today, set.lastCleanedOn);
      lines.push(`- ${set.name}: ${status.label.toLowerCase()}. ${status.detail}`);
    }
  }
  if (fine.length > 0) {
    lines.push("", `Up to date (${fine.length}):`);
    for (const set of fine) {
      lines.push(`- ${set.name}: next clean due ${set.state.nextDueOn ? formatIsoDate(set.state.nextDueOn) : "soon"}.`);
    }
  }
  lines.push(
    "",
    upcomingRaces.length > 0
      ? `Race days ahead: ${upcomingRaces.map(formatIsoDate).join(", ")}. Handles are due the day before each.`
      : "No race days ahead in the club calendar.",
    input.humidSpell ? "Humid spell: on. Handles are due every day until it is switched off." : "Humid spell: off.",
    "",
    "Cautions:",
    ...cleaningCautions.map((caution) => `- ${caution}`),
    "",
    `Record cleanings and see the list: ${input.careUrl}`,
  );
  const subject =
    due.length === 0
      ? `Slipway: no oar sets due for cleaning at ${input.clubName} (${input.isoWeek})`
      : `Slipway: ${due.length} oar ${due.length === 1 ? "set" : "sets"} due for cleaning at ${input.clubName} (${input.isoWeek})`;
  return { subject, text: lines.join("\n") };
}
