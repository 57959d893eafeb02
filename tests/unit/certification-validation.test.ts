import { describe, expect, it } from "vitest";
import {
  assessmentSchemaFor,
  registerDownloadProblems,
  registerFilterSchema,
  rosterQuerySchema,
  signOffRequestSchema,
  suspendClearanceSchema,
} from "@/lib/validations/certification";
import { clubSettingsFormSchema, formToSettings, settingsToForm } from "@/lib/validations/club-settings-form";
import { readClubSettings } from "@/lib/validations/club-settings";

const checklist = [
  { id: "screws-tight", label: "Screws tight" },
  { id: "collar-seated", label: "Collar seated" },
];
const schema = assessmentSchemaFor(checklist);
const evidenceId = "8c0a3f8e-6b0e-4d0a-9c55-2f1f1d7f6a11";

describe("practical assessment schema", () => {
  it("accepts a verdict for every item with a note and photo ids", () => {
    const parsed = schema.safeParse({
      items: { "screws-tight": "met", "collar-seated": "met" },
      note: " Tidy work ",
      evidenceIds: [evidenceId],
    });
    expect(parsed.success).toBe(true);
    expect(parsed.data?.note).toBe("Tidy work");
  });

  it("refuses a missing verdict, an unknown item and a made-up verdict", () => {
    const missing = schema.safeParse({ items: { "screws-tight": "met" }, note: "" });
    expect(missing.error?.issues[0]?.path).toEqual(["items", "collar-seated"]);
    expect(missing.error?.issues[0]?.message).toBe("Choose met or not yet");
    expect(schema.safeParse({ items: { "screws-tight": "met", "collar-seated": "met", extra: "met" }, note: "" }).success).toBe(false);
    expect(schema.safeParse({ items: { "screws-tight": "met", "collar-seated": "sort of" }, note: "" }).success).toBe(false);
  });

  it("needs a note when anything is not yet met", () => {
    const parsed = schema.safeParse({
      items: { "screws-tight": "met", "collar-seated": "not-yet" },
      note: " ",
    });
    expect(parsed.error?.issues.map((issue) => issue.path.join("."))).toEqual(["note"]);
  });

  it("bounds the photos and the note", () => {
    const items = { "screws-tight": "met", "collar-seated": "met" };
    expect(schema.safeParse({ items, note: "", evidenceIds: [evidenceId, evidenceId, evidenceId, evidenceId] }).success).toBe(false);
    expect(schema.safeParse({ items, note: "", evidenceIds: ["../x.jpg"] }).success).toBe(false);
    expect(schema.safeParse({ items, note: "x".repeat(2001) }).success).toBe(false);
  });
});

describe("other certification inputs", () => {
  it("sign-off requests name a module and optionally a coach", () => {
    expect(signOffRequestSchema.parse({ moduleSlug: "overall-length" })).toEqual({
      moduleSlug: "overall-length",
      coachId: null,
    });
    expect(signOffRequestSchema.safeParse({ moduleSlug: "../etc" }).success).toBe(false);
    expect(signOffRequestSchema.safeParse({ moduleSlug: "a".repeat(60) }).success).toBe(true);
    expect(signOffRequestSchema.safeParse({ moduleSlug: "a".repeat(61) }).error?.issues[0]?.path).toEqual(["moduleSlug"]);
  });

  it("suspensions need a reason", () => {
    expect(suspendClearanceSchema.safeParse({ reason: "  " }).success).toBe(false);
    expect(suspendClearanceSchema.parse({ reason: " Collar loose on launch " }).reason).toBe("Collar loose on launch");
  });

  it("query strings fall back to 'all' on nonsense", () => {
    expect(rosterQuerySchema.parse({ filter: "bogus", q: "ada" })).toEqual({ filter: "all", q: "ada" });
    expect(
      registerFilterSchema.parse({
        status: "revoked",
        from: "2026-01-01",
        to: "not a date",
        module: "Bad Slug",
      }),
    ).toEqual({
      module: "",
      kind: "all",
      status: "revoked",
      from: "2026-01-01",
      to: "",
    });
  });

  it("says which register filters its downloads would refuse, in the page's words", () => {
    const slugs = ["overall-length", "setting-inboard"];
    const filter = (input: Record<string, string>) => registerFilterSchema.parse(input);
    expect(registerDownloadProblems(filter({}), slugs)).toEqual([]);
    expect(registerDownloadProblems(filter({ module: "overall-length", from: "2026-01-01", to: "2026-01-01" }), slugs)).toEqual([]);
    expect(registerDownloadProblems(filter({ from: "2026-12-01", to: "2026-11-01" }), slugs)).toEqual([
      "“Issued to” is before “Issued from”: swap the two dates.",
    ]);
    expect(registerDownloadProblems(filter({ module: "no-such-module" }), slugs)).toEqual([
      "The course has no such module: choose one from the list.",
    ]);
  });
});

describe("club settings form", () => {
  it("round-trips the stored settings and keeps what the form does not show", () => {
    const stored = readClubSettings({ raceDays: ["2026-07-04"], passMark: 0.85 });
    const form = settingsToForm(stored);
    expect(form.passMarkPercent).toBe(85);
    expect(clubSettingsFormSchema.safeParse(form).success).toBe(true);
    const saved = formToSettings({ ...form, clearanceMonths: 6 }, stored);
    expect(saved).toMatchObject({ passMark: 0.85, clearanceMonths: 6, raceDays: ["2026-07-04"] });
  });

  it("refuses a minimum above the maximum, no clearance modules, and empty numbers", () => {
    const form = settingsToForm(readClubSettings({}));
    const inverted = clubSettingsFormSchema.safeParse({
      ...form,
      limits: { ...form.limits, sweep: { ...form.limits.sweep, minInboardCm: 121 } },
    });
    expect(inverted.error?.issues[0]?.path).toEqual(["limits", "sweep", "maxInboardCm"]);
    expect(clubSettingsFormSchema.safeParse({ ...form, clearanceModules: [] }).success).toBe(false);
    expect(clubSettingsFormSchema.safeParse({ ...form, clickCm: Number.NaN }).error?.issues[0]?.message).toBe("Enter a number");
  });
});
