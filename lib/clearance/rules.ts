import type { ModuleStage } from "@/lib/learning/progress";
import { addMonthsIso, daysUntil } from "@/lib/clearance/dates";

/** A recorded practical pass of one module: the sign-off day and the day the pass expires. */
export interface ModulePass {
  moduleSlug: string;
  /** YYYY-MM-DD, the day the coach recorded every checklist item as met. */
  signedOffOn: string;
  /** YYYY-MM-DD, the first day the pass no longer counts. */
  expiresOn: string;
}

export interface ActiveSuspension {
  reason: string;
  /** YYYY-MM-DD */
  since: string;
}

/** A pass expires `clearanceMonths` calendar months after its sign-off day (stored with the pass). */
export function passExpiresOn(signedOffOn: string, clearanceMonths: number): string {
  if (!(Number.isInteger(clearanceMonths) && clearanceMonths >= 1)) {
    throw new RangeError(`clearanceMonths must be a whole number of at least 1, got ${clearanceMonths}`);
  }
  return addMonthsIso(signedOffOn, clearanceMonths);
}

/** A pass counts from its sign-off day up to the day before `expiresOn`; on `expiresOn` it has expired. */
export function isPassCurrent(pass: ModulePass, today: string): boolean {
  return pass.signedOffOn <= today && today < pass.expiresOn;
}

/** Each module's pass that lasts longest (ISO dates compare as text). */
export function latestPasses(passes: readonly ModulePass[]): Map<string, ModulePass> {
  const latest = new Map<string, ModulePass>();
  for (const pass of passes) {
    const held = latest.get(pass.moduleSlug);
    if (!held || pass.expiresOn > held.expiresOn) latest.set(pass.moduleSlug, pass);
  }
  return latest;
}

/** cleared: may rig unsupervised. expired: every required module was passed once, some pass ran out. */
export type ClearanceState = "cleared" | "suspended" | "expired" | "not-cleared";

export interface Clearance {
  state: ClearanceState;
  cleared: boolean;
  requiredModules: string[];
  /** Required modules with no pass at all. */
  missingModules: string[];
  /** Required modules whose latest pass has expired. */
  expiredModules: string[];
  /** While every required pass is current: the day the first of them expires. */
  expiresOn: string | null;
  suspension: ActiveSuspension | null;
}

export interface ClearanceInput {
  requiredModules: readonly string[];
  passes: readonly ModulePass[];
  suspension: ActiveSuspension | null;
  today: string;
}

/**
 * "May rig unsupervised": every module the club requires has a current pass (quiz passed and practical
 * signed off, not yet expired) and no coach has suspended the clearance. Never stored, always computed.
 * A club that requires no modules clears nobody: clearance has to mean something was checked.
 */
export function clearanceFor({ requiredModules, passes, suspension, today }: ClearanceInput): Clearance {
  const latest = latestPasses(passes);
  const required = [...new Set(requiredModules)];
  const missingModules: string[] = [];
  const expiredModules: string[] = [];
  let expiresOn: string | null = null;
  for (const slug of required) {
    const pass = latest.get(slug);
    if (!pass || pass.signedOffOn > today) missingModules.push(slug);
    else if (!isPassCurrent(pass, today)) expiredModules.push(slug);
    else if (expiresOn === null || pass.expiresOn < expiresOn) expiresOn = pass.expiresOn;
  }
  const allCurrent = required.length > 0 && missingModules.length === 0 && expiredModules.length === 0;
  let state: ClearanceState = "not-cleared";
  if (suspension) state = "suspended";
  else if (allCurrent) state = "cleared";
  else if (required.length > 0 && missingModules.length === 0) state = "expired";
  return {
    state,
    cleared: state === "cleared",
    requiredModules: required,
    missingModules,
    expiredModules,
    expiresOn: allCurrent ? expiresOn : null,
    suspension,
  };
}

/** A clearance that holds today and runs out within `days` days (inclusive). */
export function expiresWithin(clearance: Clearance, today: string, days: number): boolean {
  return clearance.cleared && clearance.expiresOn !== null && daysUntil(today, clearance.expiresOn) <= days;
}

export const clearanceStateLabels: Record<ClearanceState, { label: string; icon: string }> = {
  cleared: { label: "May rig unsupervised", icon: "✓" },
  suspended: { label: "Suspended by a coach", icon: "⊘" },
  expired: { label: "Clearance expired", icon: "◷" },
  "not-cleared": { label: "Rig with a coach", icon: "○" },
};

/** Where one athlete stands with one module, quiz and practical together. */
export type ModuleStatus =
  "not-started" | "lesson-read" | "quiz-failed" | "ready-for-sign-off" | "waiting-for-sign-off" | "not-yet" | "passed" | "expired";

export const moduleStatusLabels: Record<ModuleStatus, { label: string; icon: string }> = {
  "not-started": { label: "Not started", icon: "–" },
  "lesson-read": { label: "Lesson read", icon: "…" },
  "quiz-failed": { label: "Quiz not passed yet", icon: "↻" },
  "ready-for-sign-off": { label: "Quiz passed, practical to do", icon: "◐" },
  "waiting-for-sign-off": { label: "Waiting for sign-off", icon: "◔" },
  "not-yet": { label: "Practical: not yet", icon: "✕" },
  passed: { label: "Passed", icon: "✓" },
  expired: { label: "Pass expired", icon: "◷" },
};

export interface ModuleStatusInput {
  quizStage: ModuleStage;
  latestPass: ModulePass | null;
  openRequest: boolean;
  /** The coach's most recent decision on this module, if any. */
  latestDecision: { outcome: "passed" | "not-yet"; decidedOn: string } | null;
  today: string;
}

/**
 * A module is passed while its quiz is passed and a practical sign-off with every item met is current.
 * Otherwise: waiting when a sign-off is asked for, "not yet" after the coach's latest verdict, expired
 * when an old pass ran out, else the quiz stage.
 */
export function moduleStatus({ quizStage, latestPass, openRequest, latestDecision, today }: ModuleStatusInput): ModuleStatus {
  const quizPassed = quizStage === "quiz-passed";
  if (quizPassed && latestPass && isPassCurrent(latestPass, today)) return "passed";
  if (openRequest) return "waiting-for-sign-off";
  if (latestDecision?.outcome === "not-yet" && (!latestPass || latestDecision.decidedOn >= latestPass.signedOffOn)) {
    return "not-yet";
  }
  if (latestPass && quizPassed) return "expired";
  return quizPassed ? "ready-for-sign-off" : quizStage;
}

/** How many days before a pass expires the athlete may ask for a renewal sign-off. */
export const renewalWindowDays = 30;

export interface SignOffRequestCheck {
  quizPassed: boolean;
  openRequest: boolean;
  latestPass: ModulePass | null;
  today: string;
}

/** Why the athlete may not ask for a sign-off now, or null when they may. */
export function signOffRequestProblem({ quizPassed, openRequest, latestPass, today }: SignOffRequestCheck): string | null {
  if (!quizPassed) return "Pass the module's quiz first, then ask a coach to watch you.";
  if (openRequest) return "You have already asked; a coach will watch you soon.";
  if (latestPass && isPassCurrent(latestPass, today) && daysUntil(today, latestPass.expiresOn) > renewalWindowDays) {
    return "You have passed this module; you can renew it in the last 30 days before it expires.";
  }
  return null;
}
