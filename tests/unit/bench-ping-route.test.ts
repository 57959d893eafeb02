import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/bench/ping/route";

describe("GET /api/bench/ping", () => {
  it("answers a static { ok: true } without a session or cookie", async () => {
    const response = await GET(new Request("http://127.0.0.1/api/bench/ping"), undefined);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ ok: true });
    expect(response.headers.get("set-cookie")).toBeNull();
    expect(response.headers.get("cache-control")).toBe("no-store");
  });

  it("takes no parameters: any is 400 naming it", async () => {
    const response = await GET(new Request("http://127.0.0.1/api/bench/ping?n=1"), undefined);
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string[]> }).fields).toHaveProperty("n");
  });
});
