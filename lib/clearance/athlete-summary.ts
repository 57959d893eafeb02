import { moduleProgress, type AttemptSummary, type ModuleProgress } from "@/lib/learning/progress";
import { isoDateOf } from "@/lib/clearance/dates";
import {
  clearanceFor,
  latestPasses,
  moduleStatus,
  signOffRequestProblem,
  type ActiveSuspension,
  type Clearance,
  type ModulePass,
  type ModuleStatus,
} from "@/lib/clearance/rules";

/** A practical sign-off as the rules see it. */
export interface AssessmentFact {
  moduleSlug: string;
  status: "waiting" | "passed" | "not-yet" | "withdrawn";
  requestedAt: Date;
  assessedAt: Date | null;
}

/** A coach's suspension that has not been lifted, as recorded. */
export interface SuspensionFact {
  reason: string;
  suspendedAt: Date;
}

/** Everything recorded about one athlete that decides their modules and clearance. */
export interface AthleteFacts {
  lessonReads: readonly string[];
  attempts: readonly AttemptSummary[];
  assessments: readonly AssessmentFact[];
  /** From the athlete's module certificates that are not revoked. */
  passes: readonly ModulePass[];
  suspension: SuspensionFact | null;
}

/**
 * The club's calendar: `today` there, and the time zone that turns a recorded instant (a decision, a
 * suspension) into the club's day, the same way sign-off days were written.
 */
export interface ClubDay {
  today: string;
  timeZone: string;
}

export interface ModuleStanding {
  slug: string;
  status: ModuleStatus;
  progress: ModuleProgress;
  latestPass: ModulePass | null;
  openRequest: boolean;
  /** Why a sign-off cannot be asked for now, or null when it can. */
  requestProblem: string | null;
}

export interface AthleteStanding {
  modules: ModuleStanding[];
  clearance: Clearance;
}

/**
 * Each module's status (quiz and practical together) and the clearance, from the recorded facts, on the
 * club's `today`; a coach's decision and a suspension count from their day in the club's time zone.
 */
export function athleteStanding(
  moduleSlugs: readonly string[],
  requiredModules: readonly string[],
  facts: AthleteFacts,
  { today, timeZone }: ClubDay,
): AthleteStanding {
  const reads = new Set(facts.lessonReads);
  const latest = latestPasses(facts.passes);
  const modules = moduleSlugs.map((slug): ModuleStanding => {
    const progress = moduleProgress(slug, reads.has(slug), facts.attempts);
    const mine = facts.assessments.filter((assessment) => assessment.moduleSlug === slug);
    const openRequest = mine.some((assessment) => assessment.status === "waiting");
    const decided = mine
      .filter((assessment) => (assessment.status === "passed" || assessment.status === "not-yet") && assessment.assessedAt)
      .sort((a, b) => b.assessedAt!.getTime() - a.assessedAt!.getTime())[0];
    const latestDecision = decided
      ? {
          outcome: decided.status as "passed" | "not-yet",
          decidedOn: isoDateOf(decided.assessedAt!, timeZone),
        }
      : null;
    const latestPass = latest.get(slug) ?? null;
    return {
      slug,
      status: moduleStatus({ quizStage: progress.stage, latestPass, openRequest, latestDecision, today }),
      progress,
      latestPass,
      openRequest,
      requestProblem: signOffRequestProblem({ quizPassed: progress.passed, openRequest, latestPass, today }),
    };
  });
  const suspension: ActiveSuspension | null = facts.suspension && {
    reason: facts.suspension.reason,
    since: isoDateOf(facts.suspension.suspendedAt, timeZone),
  };
  const clearance = clearanceFor({ requiredModules, passes: [...latest.values()], suspension, today });
  return { modules, clearance };
}

/**
 * What the athlete reads while a coach's suspension stands: the coach's reason as typed, ending in one
 * full stop (a reason that already ends in ".", "!" or "?" gets none added), then what to do.
 */
export function suspendedClearanceText(reason: string | undefined): string {
  const said = (reason ?? "").trim();
  if (said === "") return "A coach has suspended your clearance. Rig with a coach until they lift it.";
  const sentence = /[.!?…]["'”’)]*$/.test(said) ? said : `${said}.`;
  return `A coach has suspended your clearance: ${sentence} Rig with a coach until they lift it.`;
}

/**
 * What a not-yet-cleared athlete still has to do, counted over the required modules: those whose quiz
 * is still to pass, and those with the quiz passed that wait for a coach's practical sign-off.
 */
export function notClearedText(modules: readonly ModuleStanding[], requiredModules: readonly string[]): string {
  const remaining = modules.filter((entry) => requiredModules.includes(entry.slug) && entry.status !== "passed");
  const quizPassed = remaining.filter((entry) => entry.progress.passed).length;
  const quizToPass = remaining.length - quizPassed;
  const parts: string[] = [];
  if (quizToPass > 0) parts.push(`${quizToPass} ${quizToPass === 1 ? "needs its" : "need their"} quiz passed, then a practical sign-off`);
  if (quizPassed > 0) {
    parts.push(
      `${quizPassed} ${quizPassed === 1 ? "has its quiz passed and needs" : "have their quiz passed and need"} a coach's practical sign-off`,
    );
  }
  const until = "Until then, rig with a coach beside you.";
  if (remaining.length === 0) return until;
  return `${remaining.length} of ${requiredModules.length} required modules still to pass: ${parts.join("; ")}. ${until}`;
}
