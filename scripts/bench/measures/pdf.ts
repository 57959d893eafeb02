import { performance } from "node:perf_hooks";
import { demoClub } from "@/lib/seed/demo-club";
import { pdfFonts } from "@/lib/pdf/fonts";
import { renderCertificatePdf, type CertificatePdfInput } from "@/lib/pdf/certificate";
import { renderRegisterPdf, type RegisterPdfInput } from "@/lib/pdf/register";
import { fixed, median, type Row } from "../stats";
import type { BenchContext } from "./context";

const moduleTitles = ["Measuring overall length", "Setting the inboard", "Changing boats", "Securing and checking", "Cleaning the grips"];

/** Invented sample data for the renderers (the same shapes the certificate and register routes pass). */
function sampleCertificate(index: number): CertificatePdfInput {
  return {
    kind: "module",
    clubName: demoClub.name,
    athleteName: `Sample Rower ${index + 1}`,
    title: moduleTitles[index % moduleTitles.length]!,
    lines: ["Measures overall length from the blade tip along the shaft", "Seats the collar in a click and tightens its screws"],
    coachName: "Sample Coach",
    issuedOn: "2026-11-20",
    expiresOn: "2027-11-20",
    serial: `LRR-2026-${String(index + 1).padStart(4, "0")}`,
    verifyUrl: "http://127.0.0.1:3000/verify/bench-sample-code-not-real",
    logo: null,
    revoked: false,
  };
}

function sampleRegister(rowCount: number): RegisterPdfInput {
  return {
    clubName: demoClub.name,
    filterSummary: "All modules · all statuses",
    generatedOn: "2026-12-02",
    rows: Array.from({ length: rowCount }, (_, index) => ({
      serial: `LRR-2026-${String(index + 1).padStart(4, "0")}`,
      athleteName: `Sample Rower ${index + 1}`,
      title: moduleTitles[index % moduleTitles.length]!,
      signedOffByName: "Sample Coach",
      issuedOn: "2026-11-20",
      expiresOn: "2027-11-20",
      status: "Valid",
    })),
  };
}

async function timeRuns(render: () => Promise<Uint8Array>, runs: number): Promise<{ times: number[]; bytes: number }> {
  const first = await render(); // warm-up: fonts and modules load on the first call
  const times: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const started = performance.now();
    await render();
    times.push(performance.now() - started);
  }
  return { times, bytes: first.byteLength };
}

/** Time to render one certificate PDF (mean of 20 after a warm-up): ≤ 30 ms. */
export async function certificatePdf(context: BenchContext): Promise<Row> {
  const figure = "Certificate PDF, per certificate";
  const target = "≤ 30 ms";
  const fonts = await pdfFonts();
  context.log("certificate PDF: renderCertificatePdf, 20 renders");
  let index = 0;
  const { times, bytes } = await timeRuns(() => renderCertificatePdf(sampleCertificate(index++), fonts), 20);
  const mean = times.reduce((sum, time) => sum + time, 0) / times.length;
  context.raw.certificate = { times, bytes };
  return { figure, value: `${fixed(mean, 1)} ms (${fixed(bytes / 1024, 0)} KB)`, baseline: "—", ratio: "—", target, result: mean <= 30 ? "pass" : "fail" };
}

/** Time to render the induction register with 500 rows (median of 3 after a warm-up): ≤ 1 s. */
export async function registerPdf(context: BenchContext): Promise<Row> {
  const figure = "Register PDF, 500 rows";
  const target = "≤ 1 s";
  const fonts = await pdfFonts();
  context.log("register PDF: renderRegisterPdf, 500 rows, 3 renders");
  const { times, bytes } = await timeRuns(() => renderRegisterPdf(sampleRegister(500), fonts), 3);
  const middle = median(times);
  context.raw.register = { times, bytes };
  return { figure, value: `${fixed(middle, 0)} ms (${fixed(bytes / 1024, 0)} KB)`, baseline: "—", ratio: "—", target, result: middle <= 1000 ? "pass" : "fail" };
}
