import { describe, expect, it } from "vitest";

import { rigPlanRequestSchema } from "@/lib/validations/rig";
import type { RigPlanRequestInput } from "@/lib/validations/rig";

const good: RigPlanRequestInput = {
  oarType: "sculling",
  measured: { lengthCm: 287, inboardCm: 87 },
  target: { lengthCm: 288, inboardCm: 88 },
  spanCm: 159,
};

function issuePaths(input: unknown): string[] {
  const result = rigPlanRequestSchema.safeParse(input);
  if (result.success) return [];
  return result.error.issues.map((issue) => issue.path.join("."));
}

describe("rigPlanRequestSchema", () => {
  it("accepts a good sculling request and defaults the click to 0.5 cm", () => {
    const result = rigPlanRequestSchema.safeParse(good);
    expect(result.success).toBe(true);
    expect(result.data?.clickCm).toBe(0.5);
  });

  it("accepts a good sweep request with every option", () => {
    const result = rigPlanRequestSchema.safeParse({
      oarType: "sweep",
      measured: { lengthCm: 372, inboardCm: 115 },
      target: { lengthCm: 374, inboardCm: 116 },
      clickCm: 1,
      spreadCm: 85,
      halfSwivelCm: 2,
    });
    expect(result.success).toBe(true);
  });

  it.each([
    ["oarType", { ...good, oarType: "canoe" }],
    ["measured.lengthCm", { ...good, measured: { lengthCm: -1, inboardCm: 87 } }],
    ["measured.lengthCm", { ...good, measured: { lengthCm: Number.POSITIVE_INFINITY, inboardCm: 87 } }],
    ["measured.inboardCm", { ...good, measured: { lengthCm: 287, inboardCm: "87" } }],
    ["target.inboardCm", { ...good, target: { lengthCm: 288, inboardCm: 0 } }],
    ["target.lengthCm", { ...good, target: { lengthCm: Number.NaN, inboardCm: 88 } }],
    ["clickCm", { ...good, clickCm: 0.05 }],
    ["clickCm", { ...good, clickCm: 2.5 }],
    ["spanCm", { ...good, spanCm: 139 }],
    ["spanCm", { ...good, spanCm: 181 }],
    ["spreadCm", { ...good, spreadCm: 69 }],
    ["spreadCm", { ...good, spreadCm: 101 }],
    ["halfSwivelCm", { ...good, halfSwivelCm: -1 }],
  ])("names %s when it is bad", (path, input) => {
    expect(issuePaths(input)).toContain(path);
  });

  it("refuses unknown keys (strict objects)", () => {
    const result = rigPlanRequestSchema.safeParse({ ...good, colour: "red" });
    expect(result.success).toBe(false);
    const nested = rigPlanRequestSchema.safeParse({
      ...good,
      measured: { lengthCm: 287, inboardCm: 87, extra: 1 },
    });
    expect(nested.success).toBe(false);
    expect(nested.error?.issues[0]?.path).toEqual(["measured"]);
  });

  it("requires the inboard to be shorter than the length, naming the inboard", () => {
    expect(issuePaths({ ...good, measured: { lengthCm: 287, inboardCm: 287 } })).toEqual(["measured.inboardCm"]);
  });

  it("rejects a scull of 300 cm or more as the wrong oar type, naming the length", () => {
    const result = rigPlanRequestSchema.safeParse({ ...good, target: { lengthCm: 300, inboardCm: 88 } });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join("."))).toEqual(["target.lengthCm"]);
    expect(result.error?.issues[0]?.message).toMatch(/sweep oar's length/);
  });

  it("rejects a sweep oar of 300 cm or less as the wrong oar type, naming the length", () => {
    const result = rigPlanRequestSchema.safeParse({
      oarType: "sweep",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 374, inboardCm: 116 },
    });
    expect(result.error?.issues.map((i) => i.path.join("."))).toEqual(["measured.lengthCm"]);
    expect(result.error?.issues[0]?.message).toMatch(/scull's length/);
  });

  it("keeps lengths in a sane range for the type", () => {
    expect(issuePaths({ ...good, measured: { lengthCm: 249, inboardCm: 87 } })).toEqual(["measured.lengthCm"]);
    expect(issuePaths({ ...good, measured: { lengthCm: 250, inboardCm: 87 } })).toEqual([]);
    expect(issuePaths({ ...good, measured: { lengthCm: 299.9, inboardCm: 87 } })).toEqual([]);
    const sweep = {
      oarType: "sweep",
      measured: { lengthCm: 374, inboardCm: 116 },
      target: { lengthCm: 374, inboardCm: 116 },
    };
    expect(issuePaths({ ...sweep, target: { lengthCm: 329, inboardCm: 116 } })).toEqual(["target.lengthCm"]);
    expect(issuePaths({ ...sweep, target: { lengthCm: 401, inboardCm: 116 } })).toEqual(["target.lengthCm"]);
    expect(issuePaths({ ...sweep, target: { lengthCm: 400, inboardCm: 116 } })).toEqual([]);
  });

  it("calls a typo such as 28.7 or 2870 cm out of range, not the other oar type's length", () => {
    const messageFor = (input: unknown) => rigPlanRequestSchema.safeParse(input).error?.issues.map((issue) => issue.message) ?? [];
    const sweep = { oarType: "sweep", target: { lengthCm: 374, inboardCm: 116 } };
    expect(messageFor({ ...sweep, measured: { lengthCm: 28.7, inboardCm: 8.7 } })).toEqual([
      "A measured length of 28.7 cm is outside 330–400 cm: re-measure from the blade tip to the handle end",
    ]);
    expect(messageFor({ ...good, measured: { lengthCm: 2870, inboardCm: 87 } })).toEqual([
      "A measured length of 2870 cm is outside 250–300 cm: re-measure from the blade tip to the handle end",
    ]);
    // Lengths of the other oar type still say so.
    expect(messageFor({ ...good, measured: { lengthCm: 400, inboardCm: 87 } })[0]).toMatch(/sweep oar's length/);
    expect(messageFor({ ...good, measured: { lengthCm: 401, inboardCm: 87 } })[0]).toMatch(/outside 250–300 cm/);
    expect(messageFor({ ...sweep, measured: { lengthCm: 250, inboardCm: 88 } })[0]).toMatch(/scull's length/);
    expect(messageFor({ ...sweep, measured: { lengthCm: 249, inboardCm: 88 } })[0]).toMatch(/outside 330–400 cm/);
  });

  it("reports several bad fields at once", () => {
    const paths = issuePaths({ ...good, clickCm: 5, spanCm: 10 });
    expect(paths).toEqual(expect.arrayContaining(["clickCm", "spanCm"]));
  });
});
