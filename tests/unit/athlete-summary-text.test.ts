import { describe, expect, it } from "vitest";
import { notClearedText, suspendedClearanceText, type ModuleStanding } from "@/lib/clearance/athlete-summary";

describe("suspendedClearanceText", () => {
  it("ends a reason that already ends a sentence with one full stop, not two", () => {
    // The demo club's suspension reason (lib/seed), typed the way a coach types it: with a full stop.
    expect(suspendedClearanceText("Launched with a collar not seated in a click; re-check the securing steps with a coach first.")).toBe(
      "A coach has suspended your clearance: Launched with a collar not seated in a click; re-check the securing steps with a coach first. Rig with a coach until they lift it.",
    );
    expect(suspendedClearanceText("Collar left loose!")).toBe(
      "A coach has suspended your clearance: Collar left loose! Rig with a coach until they lift it.",
    );
    expect(suspendedClearanceText('Said "the screws are fine."')).not.toContain('."."');
  });

  it("adds the full stop a reason without one needs, and copes with no reason", () => {
    expect(suspendedClearanceText("  Handle screw missing  ")).toBe(
      "A coach has suspended your clearance: Handle screw missing. Rig with a coach until they lift it.",
    );
    expect(suspendedClearanceText(undefined)).toBe("A coach has suspended your clearance. Rig with a coach until they lift it.");
  });
});

/** A module's standing with only what notClearedText reads. */
function standing(slug: string, status: ModuleStanding["status"], quizPassed: boolean): ModuleStanding {
  return { slug, status, progress: { passed: quizPassed } } as ModuleStanding;
}

describe("notClearedText", () => {
  const required = ["a", "b", "c"];

  it("tells an athlete who has passed every quiz that only the coach's sign-offs are left", () => {
    // carys in the demo club: every quiz passed, no practical yet.
    expect(
      notClearedText(
        [standing("a", "ready-for-sign-off", true), standing("b", "ready-for-sign-off", true), standing("c", "ready-for-sign-off", true)],
        required,
      ),
    ).toBe(
      "3 of 3 required modules still to pass: 3 have their quiz passed and need a coach's practical sign-off. Until then, rig with a coach beside you.",
    );
  });

  it("counts quizzes still to pass apart from sign-offs still to get, and leaves out modules not required or passed", () => {
    const modules = [
      standing("a", "passed", true),
      standing("b", "not-started", false),
      standing("c", "waiting-for-sign-off", true),
      standing("extra", "not-started", false),
    ];
    expect(notClearedText(modules, required)).toBe(
      "2 of 3 required modules still to pass: 1 needs its quiz passed, then a practical sign-off; 1 has its quiz passed and needs a coach's practical sign-off. Until then, rig with a coach beside you.",
    );
  });
});
