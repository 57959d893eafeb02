import { readFileSync } from "node:fs";
import path from "node:path";
import { expect, test } from "@playwright/test";
import { expectAllRefusedNaming, type RefusalCase } from "./support/bad-input";

/**
 * Server actions over HTTP. Next decodes an action's request itself and answered every malformed one
 * with a 500 (a body that is not JSON, an argument list that is not a list, a reference React cannot
 * resolve, a broken multipart form, a body over its 1 MB limit, another site's Origin). The proxy now
 * refuses those first (lib/http/action-request.ts): a 4xx JSON message naming the header, the body or
 * the argument at fault. What the actions do with well-formed but wrong arguments is
 * tests/integration/bad-input-actions.test.ts.
 */

/** The id Next gave an action in this build (the client sends it as the Next-Action header). */
function actionId(exportedName: string): string {
  const manifestFile = path.join(process.cwd(), ".next/server/server-reference-manifest.json");
  const manifest = JSON.parse(readFileSync(manifestFile, "utf8")) as { node: Record<string, { exportedName?: string }> };
  const entry = Object.entries(manifest.node).find(([, action]) => action.exportedName === exportedName);
  if (!entry) throw new Error(`no server action ${exportedName} in this build`);
  return entry[0];
}

const boundary = "slipway-test-boundary";

/** A multipart body by hand, so a case can break it exactly where it wants. */
function multipartBody(parts: [name: string, value: string, fileName?: string][]): string {
  const lines = parts.map(([name, value, fileName]) =>
    [
      `--${boundary}`,
      `Content-Disposition: form-data; name="${name}"${fileName ? `; filename="${fileName}"` : ""}`,
      ...(fileName ? ["Content-Type: application/octet-stream"] : []),
      "",
      value,
    ].join("\r\n"),
  );
  return `${lines.join("\r\n")}\r\n--${boundary}--\r\n`;
}

test.describe("server actions refuse malformed requests before Next decodes them", () => {
  test("POST /sign-in with the sign-in link action", async ({ playwright, baseURL }) => {
    const session = await playwright.request.newContext({ baseURL });
    const origin = new URL(baseURL!).origin;
    const id = actionId("requestSignInLinkAction");
    const textCase = (label: string, body: string, field: string, status = 400): RefusalCase => ({
      label,
      field,
      status,
      headers: { "Next-Action": id, Origin: origin, "Content-Type": "text/plain;charset=UTF-8" },
      body,
    });
    const multipartCase = (
      label: string,
      body: string,
      field: string,
      headers: Record<string, string> = { "Next-Action": id },
    ): RefusalCase => ({
      label,
      field,
      status: 400,
      headers: { Origin: origin, "Content-Type": `multipart/form-data; boundary=${boundary}`, ...headers },
      body,
    });
    // Each a tag React's decoder reads as something no action of ours takes; several made Next answer 500.
    const refusedTags = [
      "$Q1",
      "$W1",
      "$@1",
      "$F1",
      "$h1",
      "$n12x",
      "$B1",
      "$R1",
      "$i1",
      "$S1",
      "$1",
      "$Z",
      "$T1",
      "$K1",
      "$",
      "$Dnot-a-date",
    ];
    const cases: RefusalCase[] = [
      textCase("not JSON", "{{{not json", "body"),
      textCase("empty body", "", "body"),
      textCase("truncated list", '[{"email":"ada@', "body"),
      textCase("an object, not a list", '{"email":"ada@lantern-reach.example"}', "body"),
      textCase("a string", '"ada@lantern-reach.example"', "body"),
      textCase("null", "null", "body"),
      textCase("a number", "42", "body"),
      textCase("true", "true", "body"),
      ...refusedTags.map((tag) => textCase(`the tag ${tag}`, JSON.stringify([{ email: tag }]), "body.0.email")),
      textCase("a tag nested deep", JSON.stringify([{ a: { b: [{ c: "$Q1" }] } }]), "body.0.a.b.0.c"),
      textCase("a tag as an argument", JSON.stringify(["$W1"]), "body.0"),
      textCase("over 1 MB", JSON.stringify([{ email: "x".repeat(1_100_000) }]), "body", 413),
      {
        ...textCase("sent as JSON", "[{}]", "content-type", 415),
        headers: { "Next-Action": id, Origin: origin, "Content-Type": "application/json" },
      },
      {
        ...textCase("sent as a form", "email=x", "content-type", 415),
        headers: { "Next-Action": id, Origin: origin, "Content-Type": "application/x-www-form-urlencoded" },
      },
      { ...textCase("without a content type", "[{}]", "content-type", 415), headers: { "Next-Action": id, Origin: origin } },
      {
        ...textCase("an action id that is not one", "[{}]", "next-action"),
        headers: { "Next-Action": "zz", Origin: origin, "Content-Type": "text/plain" },
      },
      {
        ...textCase("an action id too long", "[{}]", "next-action"),
        headers: { "Next-Action": `${id}00`, Origin: origin, "Content-Type": "text/plain" },
      },
      {
        ...textCase("an action id in capitals", "[{}]", "next-action"),
        headers: { "Next-Action": id.toUpperCase(), Origin: origin, "Content-Type": "text/plain" },
      },
      multipartCase("a multipart body that is not one", "garbage", "body"),
      {
        ...multipartCase("multipart without a boundary", multipartBody([["0", "[]"]]), "body"),
        headers: { "Next-Action": id, Origin: origin, "Content-Type": "multipart/form-data" },
      },
      multipartCase("multipart without the arguments", multipartBody([["1_email", "ada@lantern-reach.example"]]), "0"),
      multipartCase("multipart arguments that are not JSON", multipartBody([["0", "[{"]]), "0"),
      multipartCase("multipart arguments that are an object", multipartBody([["0", "{}"]]), "0"),
      multipartCase("multipart arguments with a map tag", multipartBody([["0", '["$Q1"]']]), "0.0"),
      multipartCase("multipart arguments sent as a file", multipartBody([["0", "[]", "arguments.json"]]), "0"),
      multipartCase("a broken form posted without JavaScript", "garbage", "body", {}),
      { ...multipartCase("a broken form posted to the home page", "garbage", "body", {}), url: "/" },
      { ...multipartCase("a broken form posted to a members' page", "garbage", "body", {}), url: "/learn/setting-inboard" },
    ];
    await expectAllRefusedNaming(session, { url: "/sign-in", method: "POST" }, cases);

    // The same action, well formed, still answers: as our client sends it, and as a form without JavaScript.
    const answer = await session.post("/sign-in", {
      headers: { "Next-Action": id, Origin: origin, "Content-Type": "text/plain;charset=UTF-8" },
      data: JSON.stringify([{ email: "not an address" }]),
    });
    expect(answer.status()).toBe(200);
    expect(await answer.text()).toContain('"ok":false');
    const withoutScript = await session.post("/sign-in", {
      headers: { Origin: origin },
      multipart: { [`$ACTION_ID_${id}`]: "", email: "not an address" },
    });
    expect(withoutScript.status()).toBe(200);
    await session.dispose();
  });

  test("another site's action request is 403, not Next's 500", async ({ playwright, baseURL }) => {
    const session = await playwright.request.newContext({ baseURL });
    const id = actionId("requestSignInLinkAction");
    const crossSite: Record<string, string>[] = [{ Origin: "https://elsewhere.example" }, { "Sec-Fetch-Site": "cross-site" }];
    for (const headers of crossSite) {
      const response = await session.post("/sign-in", {
        headers: { "Next-Action": id, "Content-Type": "text/plain;charset=UTF-8", ...headers },
        data: JSON.stringify([{ email: "ada@lantern-reach.example" }]),
      });
      expect(response.status()).toBe(403);
      expect(((await response.json()) as { error: string }).error).toBe("forbidden");
    }
    await session.dispose();
  });
});
