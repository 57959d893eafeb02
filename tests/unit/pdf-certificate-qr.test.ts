import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";
import QRCode from "qrcode";
import { pdfFonts } from "@/lib/pdf/fonts";
import { a4Portrait, qrCodeBox, qrMarginModules, renderCertificatePdf } from "@/lib/pdf/certificate";

const workDir = fs.mkdtempSync(path.join(os.tmpdir(), "slipway-pdf-qr-"));
afterAll(() => fs.rmSync(workDir, { recursive: true, force: true }));

const verifyUrl = "http://127.0.0.1:3000/verify/qr-test-code-0123456789";
const dpi = 216;

describe("certificate QR code", () => {
  it("is drawn with the modules of the verification address's QR code, in a white margin", async () => {
    const bytes = await renderCertificatePdf(
      {
        kind: "clearance",
        clubName: "Test Club",
        athleteName: "Test Rower",
        title: "Rigging clearance",
        lines: ["Setting the inboard"],
        coachName: "Test Coach",
        issuedOn: "2026-11-20",
        expiresOn: "2027-11-20",
        serial: "TST-2026-0002",
        verifyUrl,
        logo: null,
        status: "valid",
      },
      await pdfFonts(),
    );
    const file = path.join(workDir, "certificate.pdf");
    fs.writeFileSync(file, bytes);
    execFileSync("pdftoppm", ["-r", String(dpi), "-gray", "-singlefile", file, path.join(workDir, "page")]);
    const pgm = fs.readFileSync(path.join(workDir, "page.pgm"));
    const header = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(pgm.subarray(0, 40).toString("latin1"))!;
    const width = Number(header[1]);
    const pixels = pgm.subarray(header[0].length);
    const pixelsPerPt = dpi / 72;
    const darkAt = (xPt: number, yPt: number): boolean => {
      const column = Math.round(xPt * pixelsPerPt);
      const row = Math.round((a4Portrait.height - yPt) * pixelsPerPt);
      return pixels[row * width + column]! < 128;
    };

    // Sample the centre of every module, the white margin included.
    const { modules } = QRCode.create(verifyUrl, { errorCorrectionLevel: "M" });
    const count = modules.size + 2 * qrMarginModules;
    const modulePt = qrCodeBox.size / count;
    const expected: boolean[][] = [];
    const drawn: boolean[][] = [];
    for (let row = 0; row < count; row += 1) {
      expected.push([]);
      drawn.push([]);
      for (let column = 0; column < count; column += 1) {
        const inCode =
          row >= qrMarginModules && column >= qrMarginModules && row < count - qrMarginModules && column < count - qrMarginModules;
        expected[row]!.push(inCode && Boolean(modules.get(row - qrMarginModules, column - qrMarginModules)));
        drawn[row]!.push(darkAt(qrCodeBox.x + (column + 0.5) * modulePt, qrCodeBox.y + qrCodeBox.size - (row + 0.5) * modulePt));
      }
    }
    expect(drawn).toEqual(expected);
    // No picture left over: the code is vector squares, not an image pdf-lib re-encodes.
    const images = execFileSync("pdfimages", ["-list", file], { encoding: "utf8" }).trim().split("\n");
    expect(images.slice(2)).toEqual([]);
  });
});
