import { describe, expect, it } from "vitest";
import { suspendedClearanceText } from "@/lib/clearance/athlete-summary";

describe("suspendedClearanceText", () => {
  it("ends a reason that already ends a sentence with one full stop, not two", () => {
    // The demo club's suspension reason (lib/seed), typed the way a coach types it: with a full stop.
    expect(suspendedClearanceText("Launched with a collar not seated in a click; re-check the securing steps with a coach first.")).toBe(
      "A coach has suspended your clearance: Launched with a collar not seated in a click; re-check the securing steps with a coach first. Rig with a coach until they lift it.",
    );
    expect(suspendedClearanceText("Collar left loose!")).toBe("A coach has suspended your clearance: Collar left loose! Rig with a coach until they lift it.");
    expect(suspendedClearanceText('Said "the screws are fine."')).not.toContain('."."');
  });

  it("adds the full stop a reason without one needs, and copes with no reason", () => {
    expect(suspendedClearanceText("  Handle screw missing  ")).toBe(
      "A coach has suspended your clearance: Handle screw missing. Rig with a coach until they lift it.",
    );
    expect(suspendedClearanceText(undefined)).toBe("A coach has suspended your clearance. Rig with a coach until they lift it.");
  });
});
