import { PDFDocument, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import type { FontBytes } from "@/lib/pdf/fonts";
import { embedPlainFont, fitText, textWidth, wrapTextLines } from "@/lib/pdf/text";
import { pageLabel, paginate, rowsPerPage } from "@/lib/pdf/pagination";

/** A4 landscape in PDF points: the register's columns need the width. */
export const a4Landscape = { width: 841.89, height: 595.28 } as const;

export interface RegisterPdfRow {
  serial: string;
  athleteName: string;
  title: string;
  signedOffByName: string;
  issuedOn: string;
  expiresOn: string;
  status: string;
}

export interface RegisterPdfInput {
  clubName: string;
  /** e.g. "All modules · valid · issued 2026-01-01 to 2026-12-31" */
  filterSummary: string;
  generatedOn: string;
  rows: readonly RegisterPdfRow[];
}

const ink = rgb(0.09, 0.12, 0.16);
const muted = rgb(0.28, 0.33, 0.39);
const river = rgb(0.082, 0.259, 0.31);
const rule = rgb(0.75, 0.79, 0.83);
const stripe = rgb(0.95, 0.97, 0.975);

const margin = { left: 36, right: 36, top: 34, bottom: 40 };
const titleBlockHeight = 46;
const columnHeaderHeight = 20;
const rowHeight = 22;
const cellSize = 8.5;
/** Two lines of this size fit a row. */
const wrappedCellSize = 7;

interface Column {
  header: string;
  width: number;
  value: (row: RegisterPdfRow) => string;
}

const columns: Column[] = [
  { header: "Serial", width: 76, value: (row) => row.serial },
  { header: "Athlete", width: 122, value: (row) => row.athleteName },
  { header: "Certificate", width: 190, value: (row) => row.title },
  { header: "Signed off by", width: 108, value: (row) => row.signedOffByName },
  { header: "Issued", width: 62, value: (row) => row.issuedOn },
  { header: "Expires", width: 62, value: (row) => row.expiresOn },
  { header: "Status", width: 56, value: (row) => row.status },
];
const signatureWidth = a4Landscape.width - margin.left - margin.right - columns.reduce((sum, column) => sum + column.width, 0);

/** Rows that fit on every page under the repeated title block and column header. */
export const registerRowsPerPage = rowsPerPage({
  pageHeight: a4Landscape.height,
  top: margin.top,
  bottom: margin.bottom,
  headerHeight: titleBlockHeight + columnHeaderHeight,
  rowHeight,
});

function drawHeader(page: PDFPage, input: RegisterPdfInput, regular: PDFFont, bold: PDFFont): number {
  const { width, height } = a4Landscape;
  let y = height - margin.top - 14;
  page.drawText(fitText(bold, `${input.clubName}: induction register`, 14, 520), {
    x: margin.left,
    y,
    size: 14,
    font: bold,
    color: river,
  });
  const printed = `Printed ${input.generatedOn}`;
  page.drawText(printed, {
    x: width - margin.right - textWidth(regular, printed, 9),
    y: y + 2,
    size: 9,
    font: regular,
    color: muted,
  });
  y -= 16;
  page.drawText(fitText(regular, input.filterSummary, 9, width - margin.left - margin.right), {
    x: margin.left,
    y,
    size: 9,
    font: regular,
    color: muted,
  });
  y = height - margin.top - titleBlockHeight;
  page.drawRectangle({
    x: margin.left,
    y: y - columnHeaderHeight,
    width: width - margin.left - margin.right,
    height: columnHeaderHeight,
    color: river,
  });
  let x = margin.left;
  for (const column of [...columns, { header: "Signature", width: signatureWidth }]) {
    page.drawText(column.header, { x: x + 4, y: y - 13.5, size: 8.5, font: bold, color: rgb(1, 1, 1) });
    x += column.width;
  }
  return y - columnHeaderHeight;
}

/**
 * One cell on one line; a text too wide for it (a long name or title) goes onto two smaller lines
 * rather than being cut, and only what does not fit even then ends in an ellipsis.
 */
function drawCell(page: PDFPage, font: PDFFont, text: string, x: number, rowTop: number, maxWidth: number): void {
  if (textWidth(font, text, cellSize) <= maxWidth) {
    page.drawText(text, { x, y: rowTop - 14.5, size: cellSize, font, color: ink });
    return;
  }
  const lines = wrapTextLines(font, text, wrappedCellSize, maxWidth, 2);
  const baselines = lines.length === 1 ? [rowTop - 14] : [rowTop - 9.5, rowTop - 18];
  lines.forEach((line, index) => page.drawText(line, { x, y: baselines[index]!, size: wrappedCellSize, font, color: ink }));
}

/**
 * The paper induction register: A4 landscape pages, the title block and column header repeated on
 * every page, "Page n of m" in the footer, and an empty signature cell on each row. Fonts are embedded
 * once for the whole document (a 500-row register renders well under a second).
 */
export async function renderRegisterPdf(input: RegisterPdfInput, fonts: FontBytes): Promise<Uint8Array> {
  const document = await PDFDocument.create();
  const regular = await embedPlainFont(document, fonts.regular);
  const bold = await embedPlainFont(document, fonts.bold);
  document.setTitle(`${input.clubName}: induction register`);
  document.setCreator("Slipway");
  document.setProducer("Slipway (pdf-lib)");

  const pages = paginate(input.rows.length, registerRowsPerPage);
  const tableWidth = a4Landscape.width - margin.left - margin.right;
  for (const slice of pages) {
    // A page at a time, then the event loop has a turn: a club's whole register (thousands of rows)
    // would otherwise hold every other request of the server for seconds.
    if (slice.pageNumber > 1) await yieldToEventLoop();
    const page = document.addPage([a4Landscape.width, a4Landscape.height]);
    let y = drawHeader(page, input, regular, bold);
    if (input.rows.length === 0) {
      page.drawText("No certificates match these filters.", {
        x: margin.left + 4,
        y: y - 15,
        size: 10,
        font: regular,
        color: muted,
      });
    }
    for (let index = slice.start; index < slice.end; index += 1) {
      const row = input.rows[index]!;
      if ((index - slice.start) % 2 === 1)
        page.drawRectangle({
          x: margin.left,
          y: y - rowHeight,
          width: tableWidth,
          height: rowHeight,
          color: stripe,
        });
      let x = margin.left;
      for (const column of columns) {
        drawCell(page, regular, column.value(row), x + 4, y, column.width - 8);
        x += column.width;
      }
      page.drawLine({
        start: { x: x + 6, y: y - 16 },
        end: { x: x + signatureWidth - 6, y: y - 16 },
        thickness: 0.5,
        color: rule,
      });
      page.drawLine({
        start: { x: margin.left, y: y - rowHeight },
        end: { x: margin.left + tableWidth, y: y - rowHeight },
        thickness: 0.5,
        color: rule,
      });
      y -= rowHeight;
    }
    const label = pageLabel(slice.pageNumber, pages.length);
    page.drawText(label, {
      x: a4Landscape.width - margin.right - textWidth(regular, label, 9),
      y: margin.bottom - 20,
      size: 9,
      font: regular,
      color: muted,
    });
    page.drawText("Signature: the athlete signs on the line to confirm the entry.", {
      x: margin.left,
      y: margin.bottom - 20,
      size: 8,
      font: regular,
      color: muted,
    });
  }
  // Saving pauses for the event loop every few objects (each page is a couple of them), for the same reason.
  return document.save({ objectsPerTick: registerObjectsPerTick });
}

/** How many PDF objects pdf-lib writes between turns of the event loop while saving a register. */
const registerObjectsPerTick = 40;

function yieldToEventLoop(): Promise<void> {
  return new Promise((resolve) => setImmediate(resolve));
}
