import { describe, expect, it, vi } from "vitest";
import { route } from "@/lib/http/route";
import nextConfig from "@/next.config";

const origin = "http://127.0.0.1:3000";

function handled() {
  const handler = vi.fn(async () => Response.json({ ok: true }));
  return { handler, wrapped: route(handler) };
}

function post(headers: Record<string, string>): Request {
  return new Request(`${origin}/api/invitations`, { method: "POST", headers: { host: "127.0.0.1:3000", ...headers }, body: "{}" });
}

describe("route() refuses cross-origin writes", () => {
  it.each([
    ["Origin of another site", { origin: "https://evil.example" }],
    ["Sec-Fetch-Site: cross-site", { "sec-fetch-site": "cross-site" }],
    ["Sec-Fetch-Site: same-site (a sibling subdomain)", { "sec-fetch-site": "same-site" }],
    ["Origin: null (sandboxed frame, file://)", { origin: "null" }],
    ["same host, other port", { origin: "http://127.0.0.1:4000" }],
  ])("403 for %s, and the handler never runs", async (_label, headers) => {
    const { handler, wrapped } = handled();
    const response = await wrapped(post(headers), undefined);
    expect(response.status).toBe(403);
    expect(await response.json()).toMatchObject({ error: "forbidden" });
    expect(handler).not.toHaveBeenCalled();
  });

  it.each([
    ["its own origin", { origin, "sec-fetch-site": "same-origin" }],
    ["a request typed in the address bar", { "sec-fetch-site": "none" }],
    ["a non-browser client without Origin", {}],
  ])("accepts %s", async (_label, headers) => {
    const { handler, wrapped } = handled();
    expect((await wrapped(post(headers), undefined)).status).toBe(200);
    expect(handler).toHaveBeenCalledOnce();
  });

  it("lets safe methods through from anywhere (they change nothing)", async () => {
    const { wrapped } = handled();
    const request = new Request(`${origin}/api/roster`, { headers: { origin: "https://evil.example", "sec-fetch-site": "cross-site" } });
    expect((await wrapped(request, undefined)).status).toBe(200);
  });
});

describe("next.config.ts", () => {
  it("keeps Next's own origin check for server actions (no extra allowed origins)", () => {
    const experimental = (nextConfig.experimental ?? {}) as { serverActions?: { allowedOrigins?: string[] } };
    expect(experimental.serverActions?.allowedOrigins ?? []).toEqual([]);
  });

  it("sends the security headers on every path, API included", async () => {
    const rules = await nextConfig.headers!();
    const everything = rules.find((rule) => rule.source === "/:path*");
    const headers = Object.fromEntries(everything!.headers.map(({ key, value }) => [key.toLowerCase(), value]));
    expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  });
});
