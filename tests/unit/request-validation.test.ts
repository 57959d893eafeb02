import { describe, expect, it } from "vitest";
import { z } from "zod";
import { lookUpBy } from "@/lib/http/look-up";
import { readQuery } from "@/lib/http/route";
import { NotFoundError, ValidationError } from "@/lib/http/errors";
import { validationErrorFrom } from "@/lib/validations/issues";
import { registerQuerySchemaFor, rosterExportQuerySchema } from "@/lib/validations/certification";
import { pageQuerySchema } from "@/lib/validations/paging";

function refusal(work: () => unknown): ValidationError {
  try {
    work();
  } catch (error) {
    if (error instanceof ValidationError) return error;
    throw error;
  }
  throw new Error("expected a ValidationError");
}

const get = (query: string) => new Request(`http://127.0.0.1/api/x${query}`);

describe("validationErrorFrom", () => {
  const schema = z.strictObject({ request: z.strictObject({ lengthCm: z.number() }) });

  it("names an unknown key under its own path", () => {
    const parsed = schema.safeParse({ request: { lengthCm: 1, limits: {} }, sneaky: true });
    const error = validationErrorFrom(parsed.error!);
    expect(error.fieldErrors).toEqual({ "request.limits": ["not a field of this request"], sneaky: ["not a field of this request"] });
    expect(error.message).toMatch(/^(request\.limits|sneaky): /);
  });

  it("names a wrong whole body as the root it is given", () => {
    expect(validationErrorFrom(schema.safeParse(null).error!).message).toMatch(/^body: /);
    expect(Object.keys(validationErrorFrom(schema.safeParse([]).error!, "query").fieldErrors!)).toEqual(["query"]);
  });
});

describe("readQuery", () => {
  it("refuses a repeated parameter, naming it", () => {
    const error = refusal(() => readQuery(get("?filter=all&filter=cleared"), rosterExportQuerySchema));
    expect(error.fieldErrors).toEqual({ filter: ["given more than once"] });
  });

  it("refuses unknown parameters, __proto__ included", () => {
    expect(Object.keys(refusal(() => readQuery(get("?sort=name"), rosterExportQuerySchema)).fieldErrors!)).toEqual(["sort"]);
    expect(Object.keys(refusal(() => readQuery(get("?__proto__=x"), rosterExportQuerySchema)).fieldErrors!)).toEqual(["__proto__"]);
  });

  it("reads good values and defaults, an empty search included", () => {
    expect(readQuery(get("?filter=cleared&q=%20ada%20"), rosterExportQuerySchema)).toEqual({ filter: "cleared", q: "ada" });
    expect(readQuery(get("?q="), rosterExportQuerySchema)).toEqual({ filter: "all", q: "" });
    expect(readQuery(get(""), rosterExportQuerySchema)).toEqual({ filter: "all", q: "" });
  });

  it("checks the register's module against the course and from against to", () => {
    const schema = registerQuerySchemaFor(["overall-length"]);
    expect(refusal(() => readQuery(get("?module=no-such-module"), schema)).fieldErrors).toEqual({ module: ["no such module"] });
    expect(Object.keys(refusal(() => readQuery(get("?from=2026-06-01&to=2026-05-01"), schema)).fieldErrors!)).toEqual(["to"]);
    expect(Object.keys(refusal(() => readQuery(get("?from=2026-02-30"), schema)).fieldErrors!)).toEqual(["from"]);
    expect(readQuery(get("?module=overall-length&from=2026-01-01&to=2026-01-01"), schema)).toEqual({
      module: "overall-length",
      kind: "all",
      status: "all",
      from: "2026-01-01",
      to: "2026-01-01",
    });
  });
});

describe("pageQuerySchema", () => {
  it("reads the largest offset nine digits can write and refuses what no digit pattern would pass", () => {
    expect(readQuery(get("?offset=999999999"), pageQuerySchema)).toEqual({ limit: 100, offset: 999_999_999 });
    expect(refusal(() => readQuery(get("?offset=1000000000"), pageQuerySchema)).fieldErrors).toHaveProperty("offset");
    expect(refusal(() => readQuery(get("?limit=501"), pageQuerySchema)).fieldErrors).toHaveProperty("limit");
  });
});

describe("lookUpBy", () => {
  const failing = (error: Error) => () => Promise.reject(error);

  it("names the parameter when the look-up finds nothing", async () => {
    const error = await lookUpBy("id", "attempt", failing(new NotFoundError())).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(NotFoundError);
    expect((error as NotFoundError).message).toBe("id: no such attempt.");
    expect((error as NotFoundError).fieldErrors).toEqual({ id: ["no such attempt"] });
  });

  it("keeps a not-found that already names its own field", async () => {
    const own = new NotFoundError("moduleSlug: no such module.", { moduleSlug: ["no such module"] });
    await expect(lookUpBy("id", "member", failing(own))).rejects.toBe(own);
  });

  it("passes other errors and results through", async () => {
    const refused = new ValidationError("role: not a role", { role: ["not a role"] });
    await expect(lookUpBy("id", "member", failing(refused))).rejects.toBe(refused);
    await expect(lookUpBy("id", "member", () => Promise.resolve(7))).resolves.toBe(7);
  });
});
