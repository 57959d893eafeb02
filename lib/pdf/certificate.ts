import { PDFDocument, degrees, rgb, type PDFFont, type PDFImage, type PDFPage } from "pdf-lib";
import QRCode from "qrcode";
import type { FontBytes } from "@/lib/pdf/fonts";
import { embedPlainFont, fitText, fitTextShrinking, textWidth, wrapCharacters, wrapText } from "@/lib/pdf/text";
import { formatLongDate } from "@/lib/clearance/dates";
import type { CertificateStatus } from "@/lib/certificates/status";

/** A4 in PDF points. */
export const a4Portrait = { width: 595.28, height: 841.89 } as const;

const ink = rgb(0.09, 0.12, 0.16);
const muted = rgb(0.28, 0.33, 0.39);
const river = rgb(0.082, 0.259, 0.31);
const reed = rgb(0.247, 0.478, 0.18);
const alarm = rgb(0.7, 0.149, 0.118);
const black = rgb(0, 0, 0);

/** Where the QR code sits, in points from the page's bottom left, including its one-module white margin. */
export const qrCodeBox = { x: 56, y: 92, size: 104 } as const;
/** White modules around the code. The page around it is white as well. */
export const qrMarginModules = 1;

export interface LogoImage {
  bytes: Uint8Array;
  type: "image/png" | "image/jpeg";
}

export interface CertificatePdfInput {
  kind: "module" | "clearance";
  clubName: string;
  athleteName: string;
  /** Module title, or the clearance's title. */
  title: string;
  /** Module: the checklist items observed as met. Clearance: the module titles it stands on. */
  lines: string[];
  coachName: string;
  issuedOn: string;
  expiresOn: string;
  serial: string;
  verifyUrl: string;
  logo: LogoImage | null;
  /**
   * The certificate's status on the day the PDF is made (`certificateStatus`). Anything but valid is
   * stamped across the page with a line saying why, since the page otherwise reads as a valid pass or as
   * leave to rig unsupervised: revoked, expired, or (a clearance only) suspended by a coach.
   */
  status: CertificateStatus;
}

/** The stamp across a certificate that is no longer valid, and the line under the caution saying why. */
export function certificateStamp(
  input: Pick<CertificatePdfInput, "kind" | "status" | "expiresOn">,
): { word: string; notice: string | null } | null {
  if (input.status === "revoked") return { word: "REVOKED", notice: null };
  if (input.status === "expired") {
    const after = input.kind === "clearance" ? "Rig with a coach standing by until it is renewed." : "Ask a coach about renewing it.";
    return { word: "EXPIRED", notice: `Expired on ${formatLongDate(input.expiresOn)}: no longer valid. ${after}` };
  }
  if (input.status === "suspended" && input.kind === "clearance") {
    return {
      word: "SUSPENDED",
      notice: "Suspended by a coach: not valid while the suspension stands. Rig with a coach standing by.",
    };
  }
  return null;
}

function centred(page: PDFPage, text: string, font: PDFFont, size: number, y: number, color = ink): void {
  const width = textWidth(font, text, size);
  page.drawText(text, { x: (a4Portrait.width - width) / 2, y, size, font, color });
}

/**
 * The QR code drawn as vector squares, one filled path of the dark runs of each row. A PNG from qrcode
 * had to be encoded, decoded again by pdf-lib and deflated a second time: about 30 ms a certificate.
 * One path rather than a rectangle a run, so viewers leave no hairline seams between touching squares.
 */
function drawQrCode(page: PDFPage, text: string): void {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "M" });
  let path = "";
  for (let row = 0; row < modules.size; row += 1) {
    let column = 0;
    while (column < modules.size) {
      if (!modules.get(row, column)) {
        column += 1;
        continue;
      }
      const start = column;
      while (column < modules.size && modules.get(row, column)) column += 1;
      path += `M${start} ${row}h${column - start}v1h${start - column}z`;
    }
  }
  const modulePt = qrCodeBox.size / (modules.size + 2 * qrMarginModules);
  // SVG paths run downwards from (x, y): start at the top left corner of the first module.
  page.drawSvgPath(path, {
    x: qrCodeBox.x + qrMarginModules * modulePt,
    y: qrCodeBox.y + qrCodeBox.size - qrMarginModules * modulePt,
    scale: modulePt,
    color: black,
  });
}

async function embedLogo(document: PDFDocument, logo: LogoImage | null): Promise<PDFImage | null> {
  if (!logo) return null;
  try {
    return logo.type === "image/png" ? await document.embedPng(logo.bytes) : await document.embedJpg(logo.bytes);
  } catch {
    // A logo pdf-lib cannot read (e.g. an exotic PNG) must not stop a certificate from being issued.
    return null;
  }
}

/**
 * Slipway's certificate: one A4 page with the club (and logo), the athlete, what was certified, who
 * signed it off, the dates, the serial, and a QR code to the public verification page.
 */
export async function renderCertificatePdf(input: CertificatePdfInput, fonts: FontBytes): Promise<Uint8Array> {
  const document = await PDFDocument.create();
  const regular = await embedPlainFont(document, fonts.regular);
  const bold = await embedPlainFont(document, fonts.bold);
  const kindLabel = input.kind === "module" ? "Practical sign-off certificate" : "Rigging clearance certificate";
  document.setTitle(`${kindLabel} ${input.serial}: ${input.athleteName}`);
  document.setAuthor(input.clubName);
  document.setCreator("Slipway");
  document.setProducer("Slipway (pdf-lib)");
  document.setCreationDate(new Date(`${input.issuedOn}T12:00:00Z`));

  const page = document.addPage([a4Portrait.width, a4Portrait.height]);
  const { width, height } = a4Portrait;
  const left = 56;
  const right = width - 56;

  // The slipway motif: a deep band at the top with a thin reed line, and a frame.
  page.drawRectangle({ x: 0, y: height - 18, width, height: 18, color: river });
  page.drawRectangle({ x: 0, y: height - 22, width, height: 2, color: reed });
  page.drawRectangle({
    x: 28,
    y: 28,
    width: width - 56,
    height: height - 72,
    borderColor: river,
    borderWidth: 1,
  });

  // Club and logo.
  let headerX = left;
  const logo = await embedLogo(document, input.logo);
  if (logo) {
    const scale = Math.min(120 / logo.width, 56 / logo.height, 1);
    const logoWidth = logo.width * scale;
    const logoHeight = logo.height * scale;
    page.drawImage(logo, { x: left, y: height - 56 - logoHeight, width: logoWidth, height: logoHeight });
    headerX = left + logoWidth + 14;
  }
  page.drawText(fitText(bold, input.clubName, 16, right - headerX), {
    x: headerX,
    y: height - 80,
    size: 16,
    font: bold,
    color: river,
  });
  page.drawText("Oar rigging and care course", {
    x: headerX,
    y: height - 97,
    size: 10,
    font: regular,
    color: muted,
  });

  let y = height - 190;
  centred(page, kindLabel.toUpperCase(), bold, 13, y, river);
  y -= 52;
  centred(page, "awarded to", regular, 12, y, muted);
  y -= 40;
  const name = fitTextShrinking(bold, input.athleteName, 30, 16, right - left);
  centred(page, name.text, bold, name.size, y);
  y -= 38;
  const statement =
    input.kind === "module"
      ? "who showed a coach, hands-on and unprompted, every step of the module"
      : "who may rig their own oars without a coach standing by, within the club's limits, having passed";
  for (const line of wrapText(regular, statement, 12, right - left)) {
    centred(page, line, regular, 12, y, muted);
    y -= 17;
  }
  y -= 10;
  for (const line of wrapText(bold, input.title, 18, right - left)) {
    centred(page, line, bold, 18, y, ink);
    y -= 24;
  }

  // What was observed (module) or what the clearance stands on (clearance).
  y -= 12;
  page.drawText(input.kind === "module" ? "Observed and met:" : "Modules:", {
    x: left + 20,
    y,
    size: 10.5,
    font: bold,
    color: river,
  });
  y -= 17;
  for (const item of input.lines.slice(0, 8)) {
    const wrapped = wrapText(regular, item, 10.5, right - left - 60);
    page.drawText("✓", { x: left + 24, y, size: 10.5, font: bold, color: reed });
    for (const line of wrapped) {
      page.drawText(line, { x: left + 40, y, size: 10.5, font: regular, color: ink });
      y -= 14.5;
    }
    y -= 2;
  }

  // Who and when, in four labelled boxes.
  const boxTop = 318;
  const boxWidth = (right - left - 12) / 2;
  const details: [string, string][] = [
    ["Signed off by", input.coachName],
    ["Serial number", input.serial],
    ["Signed off on", formatLongDate(input.issuedOn)],
    ["Expires on", formatLongDate(input.expiresOn)],
  ];
  details.forEach(([label, value], index) => {
    const x = left + (index % 2) * (boxWidth + 12);
    const top = boxTop - Math.floor(index / 2) * 54;
    page.drawRectangle({
      x,
      y: top - 46,
      width: boxWidth,
      height: 46,
      borderColor: rgb(0.8, 0.84, 0.87),
      borderWidth: 0.75,
    });
    page.drawText(label, { x: x + 10, y: top - 16, size: 8.5, font: regular, color: muted });
    const fitted = fitTextShrinking(bold, value, 13, 9, boxWidth - 20);
    page.drawText(fitted.text, {
      x: x + 10,
      y: top - 35,
      size: fitted.size,
      font: bold,
      color: ink,
    });
  });

  // QR code and address of the public check.
  drawQrCode(page, input.verifyUrl);
  const qrSize = qrCodeBox.size;
  const qrY = qrCodeBox.y;
  const textX = left + qrSize + 16;
  page.drawText("Check that this certificate is still valid:", {
    x: textX,
    y: qrY + qrSize - 14,
    size: 10.5,
    font: bold,
    color: river,
  });
  let urlY = qrY + qrSize - 32;
  for (const line of wrapCharacters(regular, input.verifyUrl, 9.5, right - textX)) {
    page.drawText(line, { x: textX, y: urlY, size: 9.5, font: regular, color: ink });
    urlY -= 13;
  }
  // A clearance can also be suspended by a coach, and its page then says so.
  const states = input.kind === "clearance" ? "valid, expired, suspended or revoked" : "valid, expired or revoked";
  page.drawText(`Scan the code or type the address. The page shows whether it is ${states}.`, {
    x: textX,
    y: urlY - 6,
    size: 8,
    font: regular,
    color: muted,
    maxWidth: right - textX,
    lineHeight: 10.5,
  });

  const caution =
    "This certificate records what a coach saw on the day. The coach on duty and the club's own rules decide who goes afloat. " +
    "Before every outing, check that each collar sits in a click and every screw is tight.";
  let cautionY = 62;
  for (const line of wrapText(regular, caution, 8, right - left)) {
    page.drawText(line, { x: left, y: cautionY, size: 8, font: regular, color: muted });
    cautionY -= 10.5;
  }

  const stamp = certificateStamp(input);
  if (stamp) {
    const size = stamp.word === "SUSPENDED" ? 80 : 96;
    page.drawText(stamp.word, {
      x: width / 2 - textWidth(bold, stamp.word, size) / 2 + 40,
      y: height / 2 - 160,
      size,
      font: bold,
      color: alarm,
      opacity: 0.28,
      rotate: degrees(35),
    });
  }
  if (stamp?.notice) {
    let noticeY = cautionY - 4;
    for (const line of wrapText(bold, stamp.notice, 9, right - left)) {
      page.drawText(line, { x: left, y: noticeY, size: 9, font: bold, color: alarm });
      noticeY -= 11.5;
    }
  }

  // objectsPerTick: no pauses for the event loop between objects; a register is written in one go.
  return document.save({ objectsPerTick: Number.POSITIVE_INFINITY });
}
