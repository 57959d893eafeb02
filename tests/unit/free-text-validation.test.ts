import { describe, expect, it } from "vitest";
import { checkRoster } from "@/lib/members/roster-import";
import {
  assessmentSchemaFor,
  liftSuspensionSchema,
  revokeCertificateSchema,
  suspendClearanceSchema,
} from "@/lib/validations/certification";
import { cleaningRecordSchemaFor } from "@/lib/validations/cleaning";
import { boatSchema, oarSetSchema } from "@/lib/validations/fleet";
import { acceptInvitationSchema, invitationSchema } from "@/lib/validations/members";

// NUL, an escape sequence, DEL and a C1 control (NEL): invisible when pasted, trouble in mail, PDFs and CSV.
const controls = ["\u0000", "\u001b[2J", "\u007f", "\u0085"];

const boat = { name: "Heron", boatClass: "1x", spanCm: 160 };
const sculls = {
  name: "Sculls",
  oarType: "sculling",
  oarCount: 2,
  targetLengthCm: 288,
  targetInboardCm: 88,
  clickCm: 0.5,
  handleMechanism: "end-screw",
};
const invitation = { email: "rowan@example.org", name: "Rowan Tidewell", role: "athlete" };
const acceptance = { token: "A".repeat(43), name: "Rowan Tidewell", password: "tidewater heron slipway" };

/** Each single-line name: the schema and a valid input to put the name into. */
const names: [string, { safeParse: (input: unknown) => { success: boolean } }, Record<string, unknown>][] = [
  ["a boat's name", boatSchema, boat],
  ["an oar set's name", oarSetSchema, sculls],
  ["an invited member's name", invitationSchema, invitation],
  ["the name given on joining", acceptInvitationSchema, acceptance],
];

/** Each note or reason, which may span lines. */
const notes: [string, { safeParse: (input: unknown) => { success: boolean } }, Record<string, unknown>, string][] = [
  ["a boat's notes", boatSchema, boat, "notes"],
  ["an oar set's notes", oarSetSchema, sculls, "notes"],
  ["a cleaning's note", cleaningRecordSchemaFor("2026-12-02"), { oarSetId: 1, cleanedOn: "2026-12-02", method: "wipe-down" }, "note"],
  [
    "an assessment's note",
    assessmentSchemaFor([{ id: "seats-collar", label: "Seats the collar" }]),
    { items: { "seats-collar": "met" } },
    "note",
  ],
  ["a suspension's reason", suspendClearanceSchema, {}, "reason"],
  ["a lifted suspension's note", liftSuspensionSchema, {}, "note"],
  ["a revocation's reason", revokeCertificateSchema, {}, "reason"],
];

describe("free text", () => {
  it.each(names)("%s is one line without control characters", (_label, schema, valid) => {
    expect(schema.safeParse({ ...valid, name: "  Wren  Halloway-Ashby " }).success).toBe(true);
    expect(schema.safeParse({ ...valid, name: "Wren Halloway\n" }).success, "a trailing line break is trimmed").toBe(true);
    expect(schema.safeParse({ ...valid, name: "Wren\nHalloway" }).success).toBe(false);
    expect(schema.safeParse({ ...valid, name: "Wren\tHalloway" }).success).toBe(false);
    for (const control of controls)
      expect(schema.safeParse({ ...valid, name: `Wren${control}Halloway` }).success, JSON.stringify(control)).toBe(false);
  });

  it.each(notes)("%s may have line breaks and tabs, no other control characters", (_label, schema, valid, key) => {
    expect(schema.safeParse({ ...valid, [key]: "Grips worn at bow.\r\nReplace\tsoon." }).success).toBe(true);
    for (const control of controls)
      expect(schema.safeParse({ ...valid, [key]: `Grips worn${control} at bow.` }).success, JSON.stringify(control)).toBe(false);
  });

  it("a roster row's name is refused with control characters, as the invitation form refuses it", () => {
    const check = checkRoster("name,email\nWren\u0007Halloway,wren@example.org\nRowan Tidewell,rowan@example.org\n");
    expect(check.entries.map((entry) => entry.email)).toEqual(["rowan@example.org"]);
    expect(check.problems).toEqual([{ row: 2, field: "name", message: "Name with control characters (invisible characters): retype it." }]);
  });
});
