import { describe, expect, it } from "vitest";

import { addDaysIso } from "@/lib/care/dates";
import { boatClassLabel, oarTypeOfClass, rowersInClass } from "@/lib/fleet/catalogue";
import { fieldErrorsFrom } from "@/lib/validations/issues";
import { cleaningRecordSchemaFor, raceDaySchemaFor } from "@/lib/validations/cleaning";
import { boatSchema, oarSetSchema } from "@/lib/validations/fleet";
import { rigPlanRouteSchema, savedRigPlanSchema } from "@/lib/validations/rig-plans";

function fieldsOf(result: { success: boolean; error?: Parameters<typeof fieldErrorsFrom>[0] }): string[] {
  return result.success || !result.error ? [] : Object.keys(fieldErrorsFrom(result.error));
}

describe("boat classes (the trade's shorthand)", () => {
  it("knows sculling from sweep and says the class in words", () => {
    expect(["1x", "2x", "4x", "8x"].map((c) => oarTypeOfClass(c as "1x"))).toEqual(["sculling", "sculling", "sculling", "sculling"]);
    expect(["2-", "2+", "4-", "4+", "8+"].map((c) => oarTypeOfClass(c as "2-"))).toEqual(["sweep", "sweep", "sweep", "sweep", "sweep"]);
    expect(boatClassLabel("2x")).toBe("double scull (2x)");
    expect(boatClassLabel("4+")).toBe("four with coxswain (4+)");
    expect(rowersInClass("8+")).toBe(8);
  });
});

describe("boatSchema", () => {
  it("takes a span for sculling boats and a spread for sweep boats", () => {
    expect(boatSchema.parse({ name: " Heron ", boatClass: "1x", spanCm: 160 })).toEqual({
      name: "Heron",
      boatClass: "1x",
      spanCm: 160,
      notes: "",
    });
    expect(boatSchema.safeParse({ name: "Grebe", boatClass: "8+", spreadCm: 84 }).success).toBe(true);
    expect(fieldsOf(boatSchema.safeParse({ name: "Grebe", boatClass: "8+", spanCm: 160 }))).toEqual(["spreadCm", "spanCm"]);
    expect(fieldsOf(boatSchema.safeParse({ name: "Heron", boatClass: "1x" }))).toEqual(["spanCm"]);
  });

  it("refuses physically impossible values and unknown classes", () => {
    expect(fieldsOf(boatSchema.safeParse({ name: "X", boatClass: "1x", spanCm: 139 }))).toEqual(["spanCm"]);
    expect(fieldsOf(boatSchema.safeParse({ name: "X", boatClass: "2-", spreadCm: 101 }))).toEqual(["spreadCm"]);
    expect(fieldsOf(boatSchema.safeParse({ name: "X", boatClass: "1x", spanCm: Number.NaN }))).toEqual(["spanCm"]);
    expect(fieldsOf(boatSchema.safeParse({ name: "", boatClass: "3x", spanCm: 160 }))).toEqual(["name", "boatClass"]);
  });
});

const sculls = {
  name: "Test sculls",
  oarType: "sculling",
  oarCount: 4,
  targetLengthCm: 288,
  targetInboardCm: 88,
  clickCm: 0.5,
  handleMechanism: "clamped-slide",
  boatIds: [1, 2],
};

describe("oarSetSchema", () => {
  it("accepts a usual set (L 288, I 88: typical sculls, from memory)", () => {
    expect(oarSetSchema.parse(sculls)).toMatchObject({ ...sculls, notes: "" });
    expect(oarSetSchema.safeParse({ ...sculls, oarType: "sweep", targetLengthCm: 374, targetInboardCm: 116 }).success).toBe(true);
  });

  it("refuses a 3 m scull, a 2 m sweep oar and an inboard of half the oar or more", () => {
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, targetLengthCm: 300 }))).toEqual(["targetLengthCm"]);
    // A typo is out of range, not "a sweep oar's length" or "a scull's length".
    expect(oarSetSchema.safeParse({ ...sculls, targetLengthCm: 2880, targetInboardCm: 88 }).error?.issues[0]?.message).toBe(
      "2880 cm is outside 250–300 cm: measure from the blade tip to the handle end.",
    );
    expect(
      oarSetSchema
        .safeParse({ ...sculls, oarType: "sweep", targetLengthCm: 37.4, targetInboardCm: 116 })
        .error?.issues.find((issue) => issue.path[0] === "targetLengthCm")?.message,
    ).toBe("37.4 cm is outside 330–400 cm: measure from the blade tip to the handle end.");
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, oarType: "sweep", targetLengthCm: 200, targetInboardCm: 80 }))).toEqual([
      "targetLengthCm",
    ]);
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, targetLengthCm: 260, targetInboardCm: 130 }))).toEqual(["targetInboardCm"]);
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, targetInboardCm: 40 }))).toEqual(["targetInboardCm"]);
  });

  it("refuses bad counts, clicks, mechanisms and repeated boats", () => {
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, oarCount: 2.5 }))).toEqual(["oarCount"]);
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, clickCm: 0 }))).toEqual(["clickCm"]);
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, handleMechanism: "glue" }))).toEqual(["handleMechanism"]);
    expect(fieldsOf(oarSetSchema.safeParse({ ...sculls, boatIds: [1, 1] }))).toEqual(["boatIds"]);
  });
});

describe("cleaningRecordSchemaFor and raceDaySchemaFor", () => {
  // The club's today, as clubToday gives it; a fixed day, so nothing here depends on the machine's clock.
  const today = "2026-12-02";
  const cleaningRecordSchema = cleaningRecordSchemaFor(today);
  const raceDaySchema = raceDaySchemaFor(today);
  it("takes today or an earlier day, never a future one", () => {
    expect(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: today, method: "wipe-down" }).success).toBe(true);
    expect(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: addDaysIso(today, -6), method: "detergent-brush" }).success).toBe(true);
    expect(fieldsOf(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: addDaysIso(today, 1), method: "wipe-down" }))).toEqual([
      "cleanedOn",
    ]);
    expect(fieldsOf(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: "2026-02-30", method: "wipe-down" }))).toEqual(["cleanedOn"]);
  });

  it("needs a note for another method and a set", () => {
    expect(fieldsOf(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: today, method: "other", note: " " }))).toEqual(["note"]);
    expect(cleaningRecordSchema.safeParse({ oarSetId: 1, cleanedOn: today, method: "other", note: "hot soapy water" }).success).toBe(true);
    expect(fieldsOf(cleaningRecordSchema.safeParse({ oarSetId: Number.NaN, cleanedOn: today, method: "wipe-down" }))).toEqual(["oarSetId"]);
  });

  it("takes race days from today on", () => {
    expect(raceDaySchema.safeParse({ raceDay: today }).success).toBe(true);
    expect(fieldsOf(raceDaySchema.safeParse({ raceDay: addDaysIso(today, -1) }))).toEqual(["raceDay"]);
    expect(fieldsOf(raceDaySchema.safeParse({ raceDay: addDaysIso(today, 800) }))).toEqual(["raceDay"]);
  });
});

describe("rigPlanRouteSchema and savedRigPlanSchema", () => {
  const request = { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 87 }, target: { lengthCm: 288, inboardCm: 88 } };
  it("refuses a handle move that would leave no inboard (the engine's RangeError)", () => {
    expect(
      fieldsOf(
        rigPlanRouteSchema.safeParse({ ...request, measured: { lengthCm: 299, inboardCm: 2 }, target: { lengthCm: 250, inboardCm: 88 } }),
      ),
    ).toEqual(["measured.inboardCm"]);
    expect(rigPlanRouteSchema.parse(request).clickCm).toBe(0.5);
  });

  it("blames only the length, not the inboard, when the measured length is a typo", () => {
    const result = rigPlanRouteSchema.safeParse({ ...request, measured: { lengthCm: 99999, inboardCm: 87 } });
    expect(fieldsOf(result)).toEqual(["measured.lengthCm"]);
  });

  it("needs a UUID, ids and a time that is neither in the future nor a month old", () => {
    const plan = { clientId: "0b6f3c1e-7a52-4c1e-9a0e-2f4b8d6a1c33", boatId: 1, oarSetId: 2, request, plannedAt: new Date().toISOString() };
    expect(savedRigPlanSchema.safeParse(plan).success).toBe(true);
    expect(fieldsOf(savedRigPlanSchema.safeParse({ ...plan, clientId: "abc" }))).toEqual(["clientId"]);
    expect(fieldsOf(savedRigPlanSchema.safeParse({ ...plan, plannedAt: new Date(Date.now() - 31 * 86_400_000).toISOString() }))).toEqual([
      "plannedAt",
    ]);
    expect(fieldsOf(savedRigPlanSchema.safeParse({ ...plan, request: { ...request, target: { lengthCm: 320, inboardCm: 88 } } }))).toEqual([
      "request.target.lengthCm",
    ]);
  });
});
