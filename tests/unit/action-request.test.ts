import { describe, expect, it } from "vitest";
import { argumentListProblem } from "@/lib/http/action-request";

const text = { multipart: false, field: "body" };
const multipart = { multipart: true, field: "0" };

function fieldsOf(problem: ReturnType<typeof argumentListProblem>): string[] {
  return Object.keys(problem?.fieldErrors ?? {});
}

describe("argumentListProblem (the proxy's check of a server action's arguments)", () => {
  it("passes what our client sends: plain values, escaped dollars, undefined, non-finite numbers, dates", () => {
    const args = [
      { email: "ada@lantern-reach.example", note: "$$5 for the tape", spanCm: 159, humid: "$undefined" },
      "$NaN",
      "$-0",
      "$D2026-12-02T10:00:00.000Z",
    ];
    expect(argumentListProblem(JSON.stringify(args), text)).toBeNull();
    expect(argumentListProblem('["$undefined","$K1"]', multipart)).toBeNull();
  });

  it("names the argument that carries a tag no action takes", () => {
    expect(fieldsOf(argumentListProblem('[{"boat":{"ids":["$Q1"]}}]', text))).toEqual(["body.0.boat.ids.0"]);
    expect(fieldsOf(argumentListProblem('["$K1"]', text))).toEqual(["body.0"]);
    expect(fieldsOf(argumentListProblem('["$Dyesterday"]', multipart))).toEqual(["0.0"]);
  });

  it("refuses a body that is not JSON, or not a list", () => {
    expect(fieldsOf(argumentListProblem("[{", text))).toEqual(["body"]);
    expect(fieldsOf(argumentListProblem('{"email":"x"}', text))).toEqual(["body"]);
    expect(argumentListProblem("null", text)?.message).toContain("must be a list");
  });

  it("walks a deeply nested list without running out of stack", () => {
    const depth = 5000;
    const nested = `${"[".repeat(depth)}"$Q1"${"]".repeat(depth)}`;
    const problem = argumentListProblem(nested, text);
    expect(fieldsOf(problem)[0]).toMatch(/^body(\.0){5000}$/);
  });
});
