import { describe, expect, it } from "vitest";
import { PDFDocument } from "pdf-lib";
import { pdfFonts } from "@/lib/pdf/fonts";
import { registerRowsPerPage, renderRegisterPdf, type RegisterPdfInput } from "@/lib/pdf/register";

/** Invented rows, as many as asked for. */
function register(rowCount: number): RegisterPdfInput {
  return {
    clubName: "Invented Test Rowing Club",
    filterSummary: "All modules",
    generatedOn: "2026-12-02",
    rows: Array.from({ length: rowCount }, (_, index) => ({
      serial: `TST-2026-${String(index + 1).padStart(4, "0")}`,
      athleteName: `Sample Rower ${index + 1}`,
      title: "Setting the inboard",
      signedOffByName: "Sample Coach",
      issuedOn: "2026-11-20",
      expiresOn: "2027-11-20",
      status: "Valid",
    })),
  };
}

describe("a long register", () => {
  it("gives the event loop a turn after every page and while saving, so other requests are answered meanwhile", async () => {
    const fonts = await pdfFonts();
    const pageCount = 60;
    // Count the turns the event loop gets while the register renders: one setImmediate callback per turn.
    let turns = 0;
    let rendering = true;
    const countTurn = () => {
      if (!rendering) return;
      turns += 1;
      setImmediate(countTurn);
    };
    setImmediate(countTurn);
    const bytes = await renderRegisterPdf(register(registerRowsPerPage * pageCount), fonts);
    rendering = false;
    expect((await PDFDocument.load(bytes)).getPageCount()).toBe(pageCount);
    // Each page after the first yields once; saving yields again every few objects.
    expect(turns).toBeGreaterThanOrEqual(pageCount);
  });
});
