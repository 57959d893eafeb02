import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { afterAll, describe, expect, it, vi } from "vitest";
import { PDFDocument, type PDFFont } from "pdf-lib";
import fontkit from "@pdf-lib/fontkit";
import { pdfFonts } from "@/lib/pdf/fonts";
import { embedPlainFont, plainFeatures, textWidth } from "@/lib/pdf/text";
import { isDefaultIgnorable, plainFontkit } from "@/lib/pdf/plain-fontkit";
import { renderCertificatePdf, type CertificatePdfInput } from "@/lib/pdf/certificate";
import { renderRegisterPdf, type RegisterPdfInput } from "@/lib/pdf/register";

/** Whole faces, as the renderers embedded them before subsetting: the reference for every picture. */
function embedWholeFace(document: PDFDocument, bytes: Uint8Array): Promise<PDFFont> {
  document.registerFontkit(fontkit);
  return document.embedFont(bytes, { subset: false, features: plainFeatures });
}

const reference = vi.hoisted(() => ({ wholeFaces: false }));
vi.mock("@/lib/pdf/text", async (importOriginal) => {
  const original = await importOriginal<typeof import("@/lib/pdf/text")>();
  return {
    ...original,
    embedPlainFont: (document: PDFDocument, bytes: Uint8Array) =>
      reference.wholeFaces ? embedWholeFace(document, bytes) : original.embedPlainFont(document, bytes),
  };
});

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

/** Every page rasterised in grey at 72 dpi, as PGM files' bytes. */
function pagePictures(bytes: Uint8Array): Buffer[] {
  const prefix = path.join(workDir, `pages-${(fileCount += 1)}`);
  execFileSync("pdftoppm", ["-r", "72", "-gray", writePdf(bytes), prefix]);
  return fs
    .readdirSync(workDir)
    .filter((name) => name.startsWith(`${path.basename(prefix)}-`) && name.endsWith(".pgm"))
    .sort()
    .map((name) => fs.readFileSync(path.join(workDir, name)));
}

/** Share of a PGM page's pixels that are clearly not white. */
function inkedShare(page: Buffer, width: number, height: number): number {
  const pixels = page.subarray(page.length - width * height);
  return pixels.filter((value) => value < 200).length / pixels.length;
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
  status: "valid",
};

const internationalRegister: RegisterPdfInput = {
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

  it("extracts each document's own character where Inter draws two with one glyph (’ and ʼ), though the font is parsed once", async () => {
    // The font is shared between documents in the process: the first certificate's ʼ must not become
    // the label of the glyph the second one uses for ’.
    const first = await renderCertificatePdf({ ...international, athleteName: "Tarasʼ Vellowen" }, await pdfFonts());
    const second = await renderCertificatePdf({ ...international, athleteName: "Noor O’Daventry" }, await pdfFonts());
    expect(extractedLines(first)).toContain("Tarasʼ Vellowen");
    expect(extractedLines(second)).toContain("Noor O’Daventry");
  });

  it("does not draw zero-width characters pasted into a name, nor leave a space for them", async () => {
    const pasted = "Ada\u200bKent\u00ad-\u200dMoor\ufeff";
    const fonts = await pdfFonts();
    const withThem = await renderCertificatePdf({ ...international, athleteName: pasted }, fonts);
    const without = await renderCertificatePdf({ ...international, athleteName: "AdaKent-Moor" }, fonts);
    expect(extractedLines(withThem)).toContain("AdaKent-Moor");
    const document = await PDFDocument.create();
    const font = await embedPlainFont(document, fonts.regular);
    expect(textWidth(font, pasted, 12)).toBe(textWidth(font, "AdaKent-Moor", 12));
    expect(font.encodeText(pasted).asString()).toBe(font.encodeText("AdaKent-Moor").asString());
    expect(pagePictures(withThem)).toEqual(pagePictures(without));
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
    const bytes = await renderRegisterPdf(internationalRegister, await pdfFonts());
    const text = execFileSync("pdftotext", ["-layout", writePdf(bytes), "-"], { encoding: "utf8" });
    for (const expected of [`${clubName}: induction register`, athleteName, "Φωτεινή Ψηλού"]) {
      expect(text).toContain(expected);
    }
  });

  it("prints a long name whole, on the certificate and in the register, instead of cutting it", async () => {
    // Invented; 37 characters, the kind of double-barrelled name a club meets.
    const longName = "Alexandra Konstantinopoulou-Whitfield";
    const longCoach = "Bartholomew Fitzwilliam-Ashcombe";
    const certificate = await renderCertificatePdf({ ...international, athleteName: longName, coachName: longCoach }, await pdfFonts());
    expect(extractedLines(certificate)).toEqual(expect.arrayContaining([longName, longCoach]));
    const register = await renderRegisterPdf(
      {
        ...internationalRegister,
        rows: [{ ...internationalRegister.rows[0]!, athleteName: longName, signedOffByName: longCoach }],
      },
      await pdfFonts(),
    );
    // The register may wrap a long name over the row's two lines; every word must be there, uncut.
    const text = execFileSync("pdftotext", ["-layout", writePdf(register), "-"], { encoding: "utf8" });
    expect(text).not.toContain("…");
    for (const word of [...longName.split(" "), ...longCoach.split(" ")]) expect(text).toContain(word);
  });

  it("tells the reader of a clearance certificate that its page can also say suspended", async () => {
    const fonts = await pdfFonts();
    const text = (bytes: Uint8Array) => extractedLines(bytes).join(" ");
    expect(text(await renderCertificatePdf({ ...international, kind: "clearance" }, fonts))).toContain(
      "whether it is valid, expired, suspended or revoked",
    );
    expect(text(await renderCertificatePdf(international, fonts))).toContain("whether it is valid, expired or revoked.");
  });

  it("stamps a certificate that is not valid as it is printed, saying why: suspended, expired, revoked", async () => {
    const fonts = await pdfFonts();
    // -raw: in content order, so the rotated stamp comes back as one word.
    const text = async (input: CertificatePdfInput) =>
      execFileSync("pdftotext", ["-raw", writePdf(await renderCertificatePdf(input, fonts)), "-"], { encoding: "utf8" });
    const suspendedClearance = await text({ ...international, kind: "clearance", status: "suspended" });
    expect(suspendedClearance).toContain("SUSPENDED");
    expect(suspendedClearance).toContain("Suspended by a coach: not valid while the suspension stands.");
    const valid = await text({ ...international, kind: "clearance" });
    for (const word of ["SUSPENDED", "EXPIRED", "REVOKED"]) expect(valid).not.toContain(word);
    // A suspension stops the clearance, not the module passes it stands on.
    expect(await text({ ...international, kind: "module", status: "suspended" })).not.toContain("SUSPENDED");
    // expiresOn is the first day the pass no longer counts, so that is the day it expired.
    const expiredModule = await text({ ...international, status: "expired" });
    expect(expiredModule).toContain("EXPIRED");
    expect(expiredModule).toContain("Expired on 20 November 2027: no longer valid. Ask a coach about renewing it.");
    const expiredClearance = await text({ ...international, kind: "clearance", status: "expired" });
    expect(expiredClearance).toContain("Rig with a coach standing by until it is renewed.");
    const revoked = await text({ ...international, kind: "clearance", status: "revoked" });
    expect(revoked).toContain("REVOKED");
    expect(revoked).not.toContain("SUSPENDED");
  });

  it("draws the certificate and the register exactly as whole faces would", async () => {
    const fonts = await pdfFonts();
    const render = async (wholeFaces: boolean) => {
      reference.wholeFaces = wholeFaces;
      try {
        return [
          pagePictures(await renderCertificatePdf(international, fonts)),
          pagePictures(await renderRegisterPdf(internationalRegister, fonts)),
        ];
      } finally {
        reference.wholeFaces = false;
      }
    };
    const [subsetCertificate, subsetRegister] = await render(false);
    const [wholeCertificate, wholeRegister] = await render(true);
    expect(subsetCertificate).toHaveLength(1);
    expect(subsetCertificate![0]!.equals(wholeCertificate![0]!)).toBe(true);
    expect(subsetRegister).toHaveLength(1);
    expect(subsetRegister![0]!.equals(wholeRegister![0]!)).toBe(true);
  });

  it("lays out each character as fontkit's layout engine does with every feature off", async () => {
    const fonts = await pdfFonts();
    const ignorable: number[] = [];
    for (let codePoint = 0; codePoint <= 0x10ffff; codePoint += 1) if (isDefaultIgnorable(codePoint)) ignorable.push(codePoint);
    expect(ignorable).toContain(0xad);
    expect(ignorable).toContain(0x200d);
    for (const bytes of [fonts.regular, fonts.bold]) {
      const engine = fontkit.create(bytes);
      const plain = plainFontkit.create(bytes);
      const ids = (font: typeof engine, character: string) =>
        font
          .layout(character, plainFeatures)
          .glyphs.map((glyph) => glyph.id)
          .join(",");
      // Mapped and default-ignorable code points.
      const codePoints = [...engine.characterSet, ...ignorable];
      const differing = codePoints.filter(
        (codePoint) => ids(engine, String.fromCodePoint(codePoint)) !== ids(plain, String.fromCodePoint(codePoint)),
      );
      expect(differing).toEqual([]);
      // A few unmapped ones (fraction slash, an emoji, private use, the last), each against a fresh engine:
      // fontkit's engine labels .notdef with the first character that asked for it, so after an unmapped
      // ignorable one (the soft hyphen) it would draw an emoji as a space; "the character alone" is the
      // engine's answer before any such label, and plainFontkit gives it every time (the .notdef box).
      const unmapped = [0x2044, 0x1f600, 0xe000, 0x10ffff].filter(
        (codePoint) => ids(fontkit.create(bytes), String.fromCodePoint(codePoint)) !== ids(plain, String.fromCodePoint(codePoint)),
      );
      expect(unmapped).toEqual([]);
    }
  });

  it("draws every character Inter maps from small subsets exactly as the whole font does", async () => {
    const fonts = await pdfFonts();
    for (const bytes of [fonts.regular, fonts.bold]) {
      // Controls, spaces and the default-ignorable characters (soft hyphen, zero-width space…) draw
      // nothing, so they cannot show a lost glyph; embedPlainFont leaves the last out altogether (above).
      const characters = fontkit
        .create(bytes)
        .characterSet.filter((codePoint) => codePoint > 0x20 && !(codePoint >= 0x7f && codePoint <= 0xa0) && !isDefaultIgnorable(codePoint))
        .map((codePoint) => String.fromCodePoint(codePoint));
      expect(characters.length).toBeGreaterThan(2000);
      // One line of 40 characters a page. With a font of its own on each page, every subset is a few
      // KB, as on a certificate: small subsets are where fontkit wrote the short glyph offsets that lost
      // letters. One string a line: the per-character encoding must place glyphs as the whole font does.
      const perPage = 40;
      const lines = (ownFontEachPage: boolean, embed: typeof embedPlainFont) => async () => {
        const document = await PDFDocument.create();
        let font: PDFFont | null = null;
        for (let start = 0; start < characters.length; start += perPage) {
          if (ownFontEachPage || !font) font = await embed(document, bytes);
          document.addPage([600, 24]).drawText(characters.slice(start, start + perPage).join(" "), { x: 8, y: 8, size: 10, font });
        }
        return document.save();
      };
      const [subset, whole] = await Promise.all(
        [lines(true, embedPlainFont), lines(false, embedWholeFace)].map(async (render) => pagePictures(await render())),
      );
      expect(subset).toHaveLength(Math.ceil(characters.length / perPage));
      expect(whole).toHaveLength(subset!.length);
      const differing = subset!.flatMap((page, index) => (page.equals(whole![index]!) ? [] : [index]));
      expect(differing).toEqual([]);
      // Not blank pages agreeing: the letters are there.
      expect(inkedShare(subset![0]!, 600, 24)).toBeGreaterThan(0.02);
    }
  });
});
