import { expect, test } from "@playwright/test";
import { demo } from "./support/auth";
import { apiSession } from "./support/api-session";
import { expectAllRefusedNaming, type MultipartValue, type RefusalCase } from "./support/bad-input";
import { tinyPngBase64 } from "../support/route-guard-table";

/**
 * Uploads and the roster import: every malformed request is refused with a 4xx JSON message naming the
 * field (the file part, the Content-Type, the sign-off id, a roster row's column), never 5xx.
 */

const png = Buffer.from(tinyPngBase64, "base64");
const gif = Buffer.from("R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7", "base64");
// A RIFF/WEBP header: an allowed evidence photo type, not an allowed logo type.
const webp = Buffer.concat([
  Buffer.from("RIFF"),
  Buffer.from([0x1a, 0, 0, 0]),
  Buffer.from("WEBPVP8L"),
  Buffer.from([0x0d, 0, 0, 0, 0x2f, 0, 0, 0, 0x10, 0x07, 0x10, 0x11, 0x11, 0x88, 0x88, 0xfe, 0x07, 0]),
]);
const pdf = Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="1" height="1"><script>alert(1)</script></svg>');
const randomBytes = Buffer.from(Array.from({ length: 1024 }, (_, index) => (index * 73 + 41) % 256));

function filePart(buffer: Buffer, name = "photo.png", mimeType = "image/png"): MultipartValue {
  return { name, mimeType, buffer };
}

/** A hand-built multipart body, for boundaries and parts no client library would send. */
function rawMultipart(label: string, body: string | Buffer, contentType: string, field = "file", status?: number): RefusalCase {
  return {
    label,
    field,
    body: typeof body === "string" ? Buffer.from(body) : body,
    headers: { "Content-Type": contentType },
    ...(status ? { status } : {}),
  };
}

const crlf = "\r\n";
const pngPart = (boundary: string, name = "file") =>
  Buffer.concat([
    Buffer.from(
      `--${boundary}${crlf}Content-Disposition: form-data; name="${name}"; filename="a.png"${crlf}Content-Type: image/png${crlf}${crlf}`,
    ),
    png,
    Buffer.from(`${crlf}--${boundary}--${crlf}`),
  ]);

/** Malformed uploads every multipart image endpoint must refuse, for a file of at most `maxBytes`. */
function uploadCases(options: { maxBytes: number; notAllowed: Buffer[] }): RefusalCase[] {
  const cases: RefusalCase[] = [
    { label: "no body, no content type", field: "content-type", status: 415 },
    { label: "PNG bytes as the raw body", field: "content-type", status: 415, body: png, headers: { "Content-Type": "image/png" } },
    {
      label: "JSON body",
      field: "content-type",
      status: 415,
      body: JSON.stringify({ file: tinyPngBase64 }),
      headers: { "Content-Type": "application/json" },
    },
    { label: "plain text body", field: "content-type", status: 415, body: "file=photo.png", headers: { "Content-Type": "text/plain" } },
    {
      label: "form encoded",
      field: "content-type",
      status: 415,
      body: `file=${encodeURIComponent(tinyPngBase64)}`,
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
    },
    rawMultipart("multipart/mixed", pngPart("b0undary"), "multipart/mixed; boundary=b0undary", "content-type", 415),
    { label: "no file part (only a note)", field: "file", multipart: { note: "a photo of the collar" } },
    { label: "wrong field name (photo)", field: "file", multipart: { photo: filePart(png) } },
    { label: "wrong field name (File)", field: "file", multipart: { File: filePart(png) } },
    { label: "wrong field name (files[])", field: "file", multipart: { "files[]": filePart(png) } },
    { label: "file sent as a text value", field: "file", multipart: { file: tinyPngBase64 } },
    { label: "empty file", field: "file", multipart: { file: filePart(Buffer.alloc(0)) } },
    { label: "empty file of no type", field: "file", multipart: { file: filePart(Buffer.alloc(0), "empty", "application/octet-stream") } },
    { label: "text named .png", field: "file", status: 415, multipart: { file: filePart(Buffer.from("not an image at all")) } },
    {
      label: "PNG signature, then not a PNG",
      field: "file",
      status: 415,
      multipart: { file: filePart(Buffer.concat([png.subarray(0, 8), Buffer.from("the rest is not an image")])) },
    },
    { label: "PDF named .png", field: "file", status: 415, multipart: { file: filePart(pdf) } },
    { label: "SVG with a script", field: "file", status: 415, multipart: { file: filePart(svg, "logo.svg", "image/svg+xml") } },
    { label: "random bytes", field: "file", status: 415, multipart: { file: filePart(randomBytes, "photo.jpg", "image/jpeg") } },
    { label: "NUL bytes", field: "file", status: 415, multipart: { file: filePart(Buffer.alloc(64)) } },
    {
      label: "HTML named .jpg",
      field: "file",
      status: 415,
      multipart: { file: filePart(Buffer.from("<html><body>hi</body></html>"), "a.jpg", "image/jpeg") },
    },
    {
      label: "path in the file name, text inside",
      field: "file",
      status: 415,
      multipart: { file: filePart(Buffer.from("root:x:0:0"), "../../etc/passwd", "image/png") },
    },
    ...options.notAllowed.map((bytes, index): RefusalCase => ({
      label: `image of a type not allowed (${index + 1})`,
      field: "file",
      status: 415,
      multipart: { file: filePart(bytes) },
    })),
    {
      label: "file over the limit",
      field: "file",
      status: 413,
      multipart: { file: filePart(Buffer.concat([png, Buffer.alloc(options.maxBytes + 1024)])) },
    },
    { label: "huge text field, no file", field: "file", multipart: { note: "n".repeat(200_000) } },
    {
      label: "a thousand parts, no file",
      field: "file",
      multipart: Object.fromEntries(Array.from({ length: 1000 }, (_, index) => [`part${index}`, "x"])),
    },
    rawMultipart("no boundary parameter", pngPart("b0undary"), "multipart/form-data"),
    rawMultipart("empty boundary parameter", pngPart("b0undary"), "multipart/form-data; boundary="),
    rawMultipart("boundary that is not in the body", pngPart("b0undary"), "multipart/form-data; boundary=another-boundary"),
    rawMultipart(
      "body cut off before the closing boundary",
      pngPart("b0undary").subarray(0, 120),
      "multipart/form-data; boundary=b0undary",
    ),
    rawMultipart("only the closing boundary", `--b0undary--${crlf}`, "multipart/form-data; boundary=b0undary"),
    rawMultipart("garbage body", randomBytes, "multipart/form-data; boundary=b0undary"),
    rawMultipart("empty body", "", "multipart/form-data; boundary=b0undary"),
    rawMultipart(
      "part without a Content-Disposition",
      `--b0undary${crlf}Content-Type: image/png${crlf}${crlf}abc${crlf}--b0undary--${crlf}`,
      "multipart/form-data; boundary=b0undary",
    ),
    rawMultipart(
      "boundary of 200 characters, text inside",
      `--${"b".repeat(200)}${crlf}Content-Disposition: form-data; name="file"; filename="a.png"${crlf}${crlf}text${crlf}--${"b".repeat(200)}--${crlf}`,
      `multipart/form-data; boundary=${"b".repeat(200)}`,
      "file",
      415,
    ),
    rawMultipart(
      "huge part header",
      Buffer.concat([
        Buffer.from(`--b0undary${crlf}Content-Disposition: form-data; name="file"; filename="${"a".repeat(20_000)}.png"${crlf}${crlf}`),
        Buffer.from("text"),
        Buffer.from(`${crlf}--b0undary--${crlf}`),
      ]),
      "multipart/form-data; boundary=b0undary",
    ),
  ];
  return cases;
}

test.describe("uploads and imports refuse bad input with 4xx JSON naming the field", () => {
  test("POST /api/sign-offs/{id}/evidence", async ({ baseURL }) => {
    test.setTimeout(120_000);
    const session = await apiSession(baseURL!, demo.coach);
    const queue = (await (await session.get("/api/sign-offs")).json()) as {
      signOffs: { id: string; athleteName: string; moduleSlug: string }[];
    };
    // Jonah Treloar's waiting sign-off (lib/seed/demo-certification.ts): none of these may add a photo to it.
    const signOffId = queue.signOffs.find((entry) => entry.athleteName === "Jonah Treloar" && entry.moduleSlug === "grip-cleaning")!.id;
    const url = `/api/sign-offs/${signOffId}/evidence`;
    const withPng = { file: filePart(png) };
    const cases: RefusalCase[] = [
      ...uploadCases({ maxBytes: 8 * 1024 * 1024, notAllowed: [gif] }),
      {
        label: "unknown sign-off id",
        field: "sign-off",
        status: 404,
        url: "/api/sign-offs/00000000-0000-4000-8000-000000000000/evidence",
        multipart: withPng,
      },
      { label: "sign-off id not a UUID", field: "id", status: 400, url: "/api/sign-offs/not-a-uuid/evidence", multipart: withPng },
      {
        label: "sign-off id SQL-looking",
        field: "id",
        status: 400,
        url: `/api/sign-offs/${encodeURIComponent("' OR '1'='1")}/evidence`,
        multipart: withPng,
      },
      { label: "sign-off id huge", field: "id", status: 400, url: `/api/sign-offs/${"9".repeat(2000)}/evidence`, multipart: withPng },
      { label: "sign-off id a number", field: "id", status: 400, url: "/api/sign-offs/-1/evidence", multipart: withPng },
      { label: "sign-off id with a NUL", field: "id", status: 400, url: `/api/sign-offs/${signOffId}%00/evidence`, multipart: withPng },
    ];
    await expectAllRefusedNaming(session, { url, method: "POST" }, cases);
    await session.dispose();
  });

  test("POST /api/club/logo", async ({ baseURL }) => {
    test.setTimeout(120_000);
    const session = await apiSession(baseURL!, demo.admin);
    const cases: RefusalCase[] = [
      ...uploadCases({ maxBytes: 2 * 1024 * 1024, notAllowed: [gif, webp] }),
      {
        label: "two files, neither an image",
        field: "file",
        status: 415,
        body: Buffer.concat([
          Buffer.from(
            `--b0undary${crlf}Content-Disposition: form-data; name="file"; filename="a.png"${crlf}${crlf}text${crlf}--b0undary${crlf}Content-Disposition: form-data; name="file"; filename="b.png"${crlf}${crlf}more${crlf}--b0undary--${crlf}`,
          ),
        ]),
        headers: { "Content-Type": "multipart/form-data; boundary=b0undary" },
      },
    ];
    await expectAllRefusedNaming(session, { url: "/api/club/logo", method: "POST" }, cases);
    // Nothing was stored: the club still has no logo.
    expect((await session.get("/api/club/logo")).status()).toBe(404);
    await session.dispose();
  });

  test("POST /api/members/import", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    const csv = (label: string, body: string | Buffer, field: string, status?: number, contentType = "text/csv"): RefusalCase => ({
      label,
      field,
      body: typeof body === "string" ? Buffer.from(body) : body,
      headers: { "Content-Type": contentType },
      ...(status ? { status } : {}),
    });
    const header = "name,email,role\n";
    const manyRows = Array.from({ length: 501 }, (_, index) => `Bulk Person ${index},bulk.${index}@roster.example,athlete`).join("\n");
    const cases: RefusalCase[] = [
      csv("JSON body", JSON.stringify({ csv: `${header}A,a@roster.example` }), "content-type", 415, "application/json"),
      csv("no content type", `${header}A,a@roster.example`, "content-type", 415, ""),
      csv("multipart upload", `${header}A,a@roster.example`, "content-type", 415, "multipart/form-data; boundary=x"),
      csv("octet stream", `${header}A,a@roster.example`, "content-type", 415, "application/octet-stream"),
      csv("HTML", `<table><tr><td>name</td></tr></table>`, "content-type", 415, "text/html"),
      csv("spreadsheet bytes", Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0xff, 0xfe]), "file", 415),
      csv("PNG bytes as text/csv", png, "file", 415),
      csv("NUL bytes in the text", `name,email\nA\u0000B,a@roster.example\n`, "file", 415),
      csv("Latin-1 text", Buffer.from([...Buffer.from("name,email\nJos"), 0xe9, ...Buffer.from(",jose@roster.example\n")]), "file", 415),
      csv("over 200 KB", `${header}${"x".repeat(210 * 1024)},big@roster.example,athlete\n`, "file", 413),
      csv("empty file", "", "file"),
      csv("only blank lines", "\n\n\r\n   \n", "file"),
      csv("header only", header, "file"),
      csv("header with a BOM only", `\uFEFF${header}`, "file"),
      csv("no header row", "Ada Person,ada.person@roster.example,athlete\n", "file"),
      csv("wrong header names", "first,last,mail\nA,B,ab@roster.example\n", "file"),
      csv("email column missing", "name,role\nA Person,athlete\n", "file"),
      csv("name column missing", "email\na.person@roster.example\n", "file"),
      csv("JSON sent as CSV", JSON.stringify([{ name: "A", email: "a@roster.example" }]), "file"),
      csv("more than 500 rows", `${header}${manyRows}\n`, "file"),
      csv("bad e-mail", `${header}Ada Person,not-an-address,athlete\n`, "rows.2.email"),
      csv("e-mail with two @", `${header}Ada Person,a@b@roster.example,athlete\n`, "rows.2.email"),
      csv("e-mail with spaces", `${header}Ada Person,ada person@roster.example,athlete\n`, "rows.2.email"),
      csv("e-mail of 300 characters", `${header}Ada Person,${"a".repeat(290)}@roster.example,athlete\n`, "rows.2.email"),
      csv("SQL-looking e-mail", `${header}Ada Person,x@roster.example'; DROP TABLE users;--,athlete\n`, "rows.2.email"),
      csv("missing e-mail", `${header}Ada Person,,athlete\n`, "rows.2.email"),
      csv("missing name", `${header},ada.person@roster.example,athlete\n`, "rows.2.name"),
      csv("name of 150 KB", `${header}${"N".repeat(150 * 1024)},huge.name@roster.example,athlete\n`, "rows.2.name"),
      csv("unknown role", `${header}Ada Person,ada.person@roster.example,captain\n`, "rows.2.role"),
      csv("role as a number", `${header}Ada Person,ada.person@roster.example,1\n`, "rows.2.role"),
      csv("role with SQL", `${header}Ada Person,ada.person@roster.example,admin' --\n`, "rows.2.role"),
      csv("an existing member", `${header}Ada,${demo.athlete},athlete\n`, "rows.2.email"),
      csv("an existing member twice", `${header}Ada,${demo.athlete},athlete\nAda Again,${demo.athlete},athlete\n`, "rows.3.email"),
      csv("duplicate bad rows", `${header}Ada Person,nope,athlete\nAda Person,nope,athlete\n`, "rows.2.email"),
      csv("unclosed quote", `${header}"Ada Person,ada.quote@roster.example,athlete\n`, "rows.2"),
      csv("only delimiters", "name,email\n,\n,\n", "file"),
    ];
    await expectAllRefusedNaming(session, { url: "/api/members/import", method: "POST" }, cases);
    await session.dispose();
  });
});
