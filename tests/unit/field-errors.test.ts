import { describe, expect, it } from "vitest";
import { showFieldErrors } from "@/components/ui/field-errors";

describe("showFieldErrors", () => {
  it("puts the first message of each known field beside it and leaves the others to the status line", () => {
    const set: [string, unknown][] = [];
    showFieldErrors<{ newEmail: string; currentPassword: string }>(
      (name, error) => set.push([name, error]),
      {
        newEmail: ["Enter an e-mail address like name@example.org.", "a second message"],
        memberId: ["no such member"],
        currentPassword: [],
      },
      ["newEmail", "currentPassword"],
    );
    expect(set).toEqual([["newEmail", { message: "Enter an e-mail address like name@example.org." }]]);
  });
});
