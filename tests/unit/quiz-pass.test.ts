import { describe, expect, it } from "vitest";
import { firstQuizPass, stepAfterQuizPass } from "@/lib/learning/quiz-pass";
import type { AttemptSummary } from "@/lib/learning/progress";
import type { ModuleStatus } from "@/lib/clearance/rules";

const at = (iso: string) => new Date(iso);

describe("the first pass of a module's quiz", () => {
  it("is the earliest passing submission of that module, with its own score", () => {
    const attempts: AttemptSummary[] = [
      { moduleSlug: "setting-inboard", score: 1, passed: true, submittedAt: at("2026-11-20T10:00:00Z") },
      { moduleSlug: "setting-inboard", score: 0.875, passed: true, submittedAt: at("2026-11-12T18:30:00Z") },
      { moduleSlug: "setting-inboard", score: 0.25, passed: false, submittedAt: at("2026-11-10T18:00:00Z") },
      { moduleSlug: "overall-length", score: 1, passed: true, submittedAt: at("2026-11-01T09:00:00Z") },
    ];
    expect(firstQuizPass("setting-inboard", attempts)).toEqual({ submittedAt: at("2026-11-12T18:30:00Z"), score: 0.875 });
  });

  it("is null while only failed, open or other modules' attempts exist", () => {
    const attempts: AttemptSummary[] = [
      { moduleSlug: "grip-cleaning", score: 0.5, passed: false, submittedAt: at("2026-11-10T18:00:00Z") },
      { moduleSlug: "grip-cleaning", score: null, passed: null, submittedAt: null },
      { moduleSlug: "overall-length", score: 1, passed: true, submittedAt: at("2026-11-01T09:00:00Z") },
    ];
    expect(firstQuizPass("grip-cleaning", attempts)).toBeNull();
    expect(firstQuizPass("grip-cleaning", [])).toBeNull();
  });
});

describe("the step after a passed quiz", () => {
  it("goes to the certificates once a coach has signed the practical off", () => {
    expect(stepAfterQuizPass("setting-inboard", "passed")).toMatchObject({ href: "/learn/certificates", label: "See your certificates" });
  });

  it.each<[ModuleStatus, string]>([
    ["ready-for-sign-off", "Ask a coach for the practical"],
    ["waiting-for-sign-off", "See your sign-off request"],
    ["not-yet", "Read the coach's note"],
    ["expired", "Renew the practical"],
  ])("goes to the module's practical page while it is %s", (status, label) => {
    const step = stepAfterQuizPass("setting-inboard", status);
    expect(step).toMatchObject({ href: "/learn/setting-inboard/practical", label });
    expect(step.why.length).toBeGreaterThan(10);
  });
});
