/**
 * Times the PDF renderers in a process of their own, started by measures/pdf.ts. In the bench's own
 * process, after the load tests (its heap holding the data set and the load results), single renders took
 * up to 81 ms and the mean was 29 ms; the same renders alone averaged 16 ms (2026-12-03, AMD EPYC, 2
 * cores). Prints one JSON line: `{ certificate: { times, bytes }, register: { times, bytes } }`.
 */
import { performance } from "node:perf_hooks";
import { demoClub } from "@/lib/seed/demo-club";
import { pdfFonts } from "@/lib/pdf/fonts";
import { renderCertificatePdf, type CertificatePdfInput } from "@/lib/pdf/certificate";
import { renderRegisterPdf, type RegisterPdfInput } from "@/lib/pdf/register";

const pdfRuns = { certificateWarmUps: 5, certificate: 20, registerWarmUps: 1, register: 3 } as const;

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
    status: "valid",
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

/** Renders `warmUps` times untimed (modules load, V8 optimises), then times `runs` renders. */
async function timeRuns(render: () => Promise<Uint8Array>, warmUps: number, runs: number): Promise<{ times: number[]; bytes: number }> {
  let bytes = 0;
  for (let run = 0; run < warmUps; run += 1) bytes = (await render()).byteLength;
  const times: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const started = performance.now();
    await render();
    times.push(performance.now() - started);
  }
  return { times, bytes };
}

async function main(): Promise<void> {
  const fonts = await pdfFonts();
  let index = 0;
  const certificate = await timeRuns(
    () => renderCertificatePdf(sampleCertificate(index++), fonts),
    pdfRuns.certificateWarmUps,
    pdfRuns.certificate,
  );
  const register = await timeRuns(() => renderRegisterPdf(sampleRegister(500), fonts), pdfRuns.registerWarmUps, pdfRuns.register);
  process.stdout.write(`${JSON.stringify({ certificate, register })}\n`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
