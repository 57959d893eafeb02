import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";
import { PDFDocument, type PDFFont } from "pdf-lib";
import fontkit from "@pdf-lib/fontkit";
import { pdfFonts } from "@/lib/pdf/fonts";
import { renderCertificatePdf, type CertificatePdfInput } from "@/lib/pdf/certificate";
import { renderRegisterPdf } from "@/lib/pdf/register";
import { embedPlainFont, plainFeatures } from "@/lib/pdf/text";

const workDir = fs.mkdtempSync(path.join(os.tmpdir(), "slipway-pdf-fonts-"));
afterAll(() => fs.rmSync(workDir, { recursive: true, force: true }));

let fileCount = 0;
function writePdf(bytes: Uint8Array): string {
  fileCount += 1;
  const file = path.join(workDir, `${fileCount}.pdf`);
  fs.writeFileSync(file, bytes);
  return file;
}

/** pdftotext's reading of the PDF, one text line a line (no layout padding). */
function extractedLines(bytes: Uint8Array): string[] {
  return execFileSync("pdftotext", [writePdf(bytes), "-"], { encoding: "utf8" })
    .split("\n")
    .map((line) => line.trim());
}

// Invented names that need Latin-1, Latin Extended-A and Additional, Greek and Cyrillic glyphs.
const athleteName = "Łucja Ødegård-Şahin";
const coachName = "Φωτεινή Καλλιγά-Ψηλού";
const clubName = "Ñandú & Ærø Sculling Society";
const international: CertificatePdfInput = {
  kind: "module",
  clubName,
  athleteName,
  title: "Setting the inboard",
  lines: ["Ярина Лісова-Їжакевич checked the collar", "Nguyễn Thị Ánh Tuyết, Zoë Ďurišová, Ăvram Ţepeş"],
  coachName,
  issuedOn: "2026-11-20",
  expiresOn: "2027-11-20",
  serial: "TST-2026-0001",
  verifyUrl: "http://127.0.0.1:3000/verify/test-code",
  logo: null,
  revoked: false,
};

describe("PDF fonts", () => {
  it("certificate text with accented Latin, Greek and Cyrillic names comes back exactly from pdftotext", async () => {
    const bytes = await renderCertificatePdf(international, await pdfFonts());
    const lines = extractedLines(bytes);
    for (const expected of [
      clubName,
      athleteName,
      coachName,
      `✓ ${international.lines[0]}`,
      `✓ ${international.lines[1]}`,
      "TST-2026-0001",
    ]) {
      expect(lines).toContain(expected);
    }
  });

  it("embeds both Inter faces as subsets with a Unicode map, keeping the certificate small", async () => {
    const bytes = await renderCertificatePdf(international, await pdfFonts());
    const fonts = execFileSync("pdffonts", [writePdf(bytes)], { encoding: "utf8" })
      .trim()
      .split("\n")
      .slice(2)
      .map((line) => /^(\S+)\s+CID TrueType\s+Identity-H\s+(yes|no)\s+(?:yes|no)\s+(yes|no)\s/.exec(line));
    expect(fonts).toHaveLength(2);
    const byName = fonts.map((match) => ({
      face: match?.[1]?.replace(/-\w+$/, ""),
      embedded: match?.[2],
      unicode: match?.[3],
    }));
    expect(byName.sort((a, b) => String(a.face).localeCompare(String(b.face)))).toEqual([
      { face: "Inter-Bold", embedded: "yes", unicode: "yes" },
      { face: "Inter-Regular", embedded: "yes", unicode: "yes" },
    ]);
    // The whole faces made a 366 KB certificate; a subset of the few dozen glyphs used is a fraction.
    expect(bytes.byteLength).toBeLessThan(60_000);
  });

  it("register rows keep accented Latin, Greek and Cyrillic names through pdftotext", async () => {
    const bytes = await renderRegisterPdf(
      {
        clubName,
        filterSummary: "All modules",
        generatedOn: "2026-12-02",
        rows: [
          {
            serial: "TST-2026-0001",
            athleteName,
            title: "Setting the inboard",
            signedOffByName: "Φωτεινή Ψηλού",
            issuedOn: "2026-11-20",
            expiresOn: "2027-11-20",
            status: "Valid",
          },
        ],
      },
      await pdfFonts(),
    );
    const text = execFileSync("pdftotext", ["-layout", writePdf(bytes), "-"], { encoding: "utf8" });
    for (const expected of [`${clubName}: induction register`, athleteName, "Φωτεινή Ψηλού"]) {
      expect(text).toContain(expected);
    }
  });

  it("draws every character Inter maps the same from the subset as from the whole font", async () => {
    const fonts = await pdfFonts();
    for (const bytes of [fonts.regular, fonts.bold]) {
      // Controls, spaces and the soft hyphen draw nothing, so they cannot show a lost glyph.
      const characters = fontkit
        .create(bytes)
        .characterSet.filter(
          (codePoint) => codePoint > 0x20 && !(codePoint >= 0x7f && codePoint <= 0xa0) && codePoint !== 0xad,
        )
        .map((codePoint) => String.fromCodePoint(codePoint));
      expect(characters.length).toBeGreaterThan(2000);
      const grid = async (embed: (document: PDFDocument) => Promise<PDFFont>): Promise<Uint8Array> => {
        const document = await PDFDocument.create();
        document.registerFontkit(fontkit);
        const font = await embed(document);
        // One string a row: the subset's per-character encoding must place glyphs as the whole font does.
        const perRow = 40;
        const rowsPerPage = 50;
        let page = document.addPage([600, 800]);
        for (let start = 0; start < characters.length; start += perRow) {
          const row = (start / perRow) % rowsPerPage;
          if (start > 0 && row === 0) page = document.addPage([600, 800]);
          const text = characters.slice(start, start + perRow).join(" ");
          page.drawText(text, { x: 10, y: 780 - row * 15.5, size: 10, font });
        }
        return document.save();
      };
      const renders = await Promise.all(
        [
          grid((document) => embedPlainFont(document, bytes)),
          grid((document) => document.embedFont(bytes, { subset: false, features: plainFeatures })),
        ].map(async (pdf) => {
          const prefix = path.join(workDir, `grid-${(fileCount += 1)}`);
          execFileSync("pdftoppm", ["-r", "72", "-gray", writePdf(await pdf), prefix]);
          return fs
            .readdirSync(workDir)
            .filter((name) => name.startsWith(`${path.basename(prefix)}-`) && name.endsWith(".pgm"))
            .sort()
            .map((name) => fs.readFileSync(path.join(workDir, name)));
        }),
      );
      const [subset, whole] = renders as [Buffer[], Buffer[]];
      expect(subset.length).toBe(Math.ceil(characters.length / 2000));
      expect(subset.length).toBe(whole.length);
      subset.forEach((page, index) => expect(page.equals(whole[index]!)).toBe(true));
      // Not two blank pages agreeing: the first page is well inked.
      const pixels = subset[0]!.subarray(subset[0]!.length - 600 * 800);
      expect(pixels.filter((value) => value < 200).length / pixels.length).toBeGreaterThan(0.02);
    }
  });
});
