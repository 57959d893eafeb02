import { describe, expect, it } from "vitest";
import { z } from "zod";
import { recordIdValueSchema, uuidValueSchema } from "@/lib/validations/ids";
import { fieldErrorsFrom, parseActionArgument, parseActionInput } from "@/lib/validations/issues";

const note = z.strictObject({ note: z.string().default(""), limits: z.strictObject({ minCm: z.number() }).optional() });

describe("fieldErrorsFrom", () => {
  it("names an unknown key under its own path, as the route handlers' refusals do", () => {
    const parsed = note.safeParse(JSON.parse('{"note": "", "sneaky": 1, "__proto__": {}, "limits": {"minCm": 1, "maxCm": 2}}'));
    const fields = fieldErrorsFrom(parsed.error!);
    expect(Object.keys(fields).sort()).toEqual(["__proto__", "limits.maxCm", "sneaky"]);
    expect(Object.hasOwn(fields, "__proto__")).toBe(true);
    expect(fields.sneaky).toEqual(["Not a field of this form."]);
  });

  it("keeps other whole-input issues under _", () => {
    expect(Object.keys(fieldErrorsFrom(note.safeParse("hello").error!))).toEqual(["_"]);
  });
});

describe("parseActionInput", () => {
  it("parses a plain object, from JSON or with no prototype", () => {
    expect(parseActionInput(note, { note: "ok" })).toEqual({ success: true, data: { note: "ok" } });
    expect(parseActionInput(note, Object.assign(Object.create(null) as object, { note: "ok" }))).toEqual({
      success: true,
      data: { note: "ok" },
    });
  });

  it("refuses anything else as a whole, though zod would read a Map or a Date as an object without fields", () => {
    expect(note.safeParse(new Map([["note", "ok"]])).success).toBe(true);
    for (const input of [new Map([["note", "ok"]]), new Set(), new Date(), new FormData(), [], null, undefined, "note=ok", 1n]) {
      expect(parseActionInput(note, input)).toEqual({ success: false, fieldErrors: { _: ["Send the form's fields as one object."] } });
    }
  });
});

describe("parseActionArgument and the id schemas", () => {
  it("takes ids as numbers, never text or anything Number() would turn into one", () => {
    expect(parseActionArgument("boatId", recordIdValueSchema, 7)).toEqual({ success: true, data: 7 });
    for (const value of ["7", " 7 ", "0x7", true, [7], new Date(7), 7n, 0, -7, 7.5, 2 ** 31, Number.NaN, Number.POSITIVE_INFINITY]) {
      const checked = parseActionArgument("boatId", recordIdValueSchema, value);
      expect(checked.success, String(value)).toBe(false);
      expect(Object.keys(checked.success ? {} : checked.fieldErrors)).toEqual(["boatId"]);
    }
  });

  it("takes UUIDs exactly", () => {
    const id = "8c0a3f8e-6b0e-4d0a-9c55-2f1f1d7f6a11";
    expect(parseActionArgument("certificateId", uuidValueSchema, id)).toEqual({ success: true, data: id });
    for (const value of [`${id} `, `{${id}}`, `${id}\u0000`, [id], 42, null]) {
      expect(parseActionArgument("certificateId", uuidValueSchema, value).success, String(value)).toBe(false);
    }
  });
});
