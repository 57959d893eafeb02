import { describe, expect, it } from "vitest";
import { validationErrorFrom } from "@/lib/validations/issues";
import { memberUpdateSchema } from "@/lib/validations/member-admin";

describe("memberUpdateSchema", () => {
  it("takes a role or a status", () => {
    expect(memberUpdateSchema.parse({ role: "coach" })).toEqual({ role: "coach" });
    expect(memberUpdateSchema.parse({ status: "deactivated" })).toEqual({ status: "deactivated" });
  });

  it("refuses both at once under both field names", () => {
    const error = validationErrorFrom(memberUpdateSchema.safeParse({ role: "coach", status: "active" }).error!);
    expect(error.fieldErrors).toEqual({
      role: ["Send either a role or a status, not both."],
      status: ["Send either a role or a status, not both."],
    });
  });

  it("refuses neither under both field names", () => {
    const error = validationErrorFrom(memberUpdateSchema.safeParse({}).error!);
    expect(Object.keys(error.fieldErrors!)).toEqual(["role", "status"]);
    expect(error.message).toMatch(/^role: Send a role or a status/);
  });
});
