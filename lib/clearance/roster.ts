import type { ClearanceState, ModuleStatus } from "@/lib/clearance/rules";
import { daysUntil } from "@/lib/clearance/dates";
import type { RosterFilter } from "@/lib/validations/certification";

/** One module column of the coach's roster. */
export interface RosterModule {
  slug: string;
  title: string;
  requiredForClearance: boolean;
}

/** One athlete row of the coach's roster, as the API sends it (plain JSON). */
export interface RosterRow {
  id: number;
  name: string;
  email: string;
  clearance: { state: ClearanceState; expiresOn: string | null; suspendedReason: string | null };
  modules: Record<string, { status: ModuleStatus; expiresOn: string | null }>;
  /** Sign-offs this athlete waits for that the viewing coach may take (asked of them or of any coach). */
  waitingForMe: number;
  passedCount: number;
}

export interface RosterMatrix {
  today: string;
  modules: RosterModule[];
  athletes: RosterRow[];
}

/** How close to expiry "expiring soon" means on the roster. */
export const expiringSoonDays = 30;

export const rosterFilterLabels: Record<RosterFilter, string> = {
  all: "Everyone",
  cleared: "Cleared to rig unsupervised",
  "waiting-for-me": "Waiting for my sign-off",
  "expiring-soon": `Clearance expiring within ${expiringSoonDays} days`,
  "not-cleared": "Not cleared",
};

/** Whether a row passes the roster's filter and name search (case- and accent-insensitive). */
export function rosterRowMatches(row: RosterRow, filter: RosterFilter, search: string, today: string): boolean {
  const needle = fold(search.trim());
  if (needle && !fold(row.name).includes(needle) && !fold(row.email).includes(needle)) return false;
  switch (filter) {
    case "all":
      return true;
    case "cleared":
      return row.clearance.state === "cleared";
    case "not-cleared":
      return row.clearance.state !== "cleared";
    case "waiting-for-me":
      return row.waitingForMe > 0;
    case "expiring-soon":
      return (
        row.clearance.state === "cleared" &&
        row.clearance.expiresOn !== null &&
        daysUntil(today, row.clearance.expiresOn) <= expiringSoonDays
      );
  }
}

function fold(text: string): string {
  return text
    .normalize("NFD")
    .replace(/\p{Diacritic}/gu, "")
    .toLowerCase();
}

/** Short words for the roster's narrow cells (the full words are in moduleStatusLabels). */
export const rosterCellLabels: Record<ModuleStatus, string> = {
  "not-started": "Not started",
  "lesson-read": "Reading",
  "quiz-failed": "Quiz again",
  "ready-for-sign-off": "Practical due",
  "waiting-for-sign-off": "Waiting",
  "not-yet": "Not yet",
  passed: "Passed",
  expired: "Expired",
};

/** The roster view's query string: only what differs from the defaults ("" for everyone, no search). */
export function rosterViewQuery(filter: RosterFilter, search: string): string {
  const params = new URLSearchParams();
  if (filter !== "all") params.set("filter", filter);
  if (search.trim() !== "") params.set("q", search.trim());
  return params.toString();
}
