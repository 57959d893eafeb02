import fs from "node:fs";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { demoClub } from "@/lib/seed/demo-club";
import { fixed, median, notAvailable, type Row } from "../stats";
import type { BenchContext } from "./context";

/**
 * The PDF figures are found at run time, so the bench works before and after the certificate and
 * register features are merged: every module under these folders is imported and searched for an
 * exported function whose name matches. To measure a renderer with another name or input, change the
 * patterns or the sample inputs below; nothing else in the bench needs to change.
 */
const searchFolders = ["lib/certificates", "lib/certification", "lib/pdf", "lib/register"];
const certificatePattern = /^(render|build|create|make|generate)?Certificate(Pdf|PDF|Document)(Bytes)?$/;
const registerPattern = /^(render|build|create|make|generate)?(Induction)?Register(Pdf|PDF|Document)(Bytes)?$/;

type Renderer = (...args: unknown[]) => unknown;

interface Found {
  name: string;
  file: string;
  fn: Renderer;
}

async function findRenderer(pattern: RegExp): Promise<Found | null> {
  const root = process.cwd();
  for (const folder of searchFolders) {
    const dir = path.join(root, folder);
    if (!fs.existsSync(dir)) continue;
    const files = fs.readdirSync(dir).filter((file) => /\.tsx?$/.test(file) && !/\.(test|spec|d)\.tsx?$/.test(file));
    for (const file of files.sort()) {
      let exports: Record<string, unknown>;
      try {
        exports = (await import(path.join(dir, file))) as Record<string, unknown>;
      } catch (error) {
        console.warn(`[bench] skipped ${folder}/${file}: it failed to import (${error instanceof Error ? error.message : String(error)})`);
        continue;
      }
      for (const [name, value] of Object.entries(exports)) {
        if (typeof value === "function" && pattern.test(name)) return { name, file: `${folder}/${file}`, fn: value as Renderer };
      }
    }
  }
  return null;
}

function pdfBytes(output: unknown): Uint8Array | null {
  const candidate =
    output instanceof Uint8Array || output instanceof ArrayBuffer
      ? output
      : typeof output === "object" && output !== null
        ? ((output as Record<string, unknown>).bytes ?? (output as Record<string, unknown>).pdf)
        : null;
  if (candidate instanceof ArrayBuffer) return new Uint8Array(candidate);
  if (!(candidate instanceof Uint8Array)) return null;
  return Buffer.from(candidate.subarray(0, 5)).toString("latin1") === "%PDF-" ? candidate : null;
}

async function timeRenders(found: Found, input: unknown, runs: number): Promise<{ times: number[]; bytes: number }> {
  const first = pdfBytes(await found.fn(input)); // warm-up: fonts and modules load on the first call
  if (!first) throw new Error("it did not return PDF bytes");
  const times: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const started = performance.now();
    await found.fn(input);
    times.push(performance.now() - started);
  }
  return { times, bytes: first.byteLength };
}

const issuedAt = new Date("2026-11-20T10:30:00Z");
const moduleTitles = ["Overall length", "Setting the inboard", "Changing boats", "Secure and check", "Grip cleaning"];

/** Invented sample data with the field names a renderer is likely to use; extra fields are ignored. */
function sampleCertificate(index: number) {
  const athleteName = `Sample Rower ${index + 1}`;
  return {
    athleteName,
    name: athleteName,
    athlete: { name: athleteName, email: `rower.${index + 1}@lantern-reach.example` },
    clubName: demoClub.name,
    club: { name: demoClub.name },
    title: "Adjustable oars: rig unsupervised",
    moduleTitles,
    modules: moduleTitles.map((title) => ({ title })),
    coachName: "Sample Coach",
    signedOffBy: "Sample Coach",
    issuedAt,
    issuedOn: "2026-11-20",
    validUntil: new Date("2027-11-20T10:30:00Z"),
    serial: `SLW-2026-${String(index + 1).padStart(6, "0")}`,
    verificationCode: "BENCH-0000-TEST",
    verifyUrl: "http://127.0.0.1/verify/BENCH-0000-TEST",
  };
}

function sampleRegister(rowCount: number) {
  const rows = Array.from({ length: rowCount }, (_, index) => ({
    ...sampleCertificate(index),
    email: `rower.${index + 1}@lantern-reach.example`,
    module: moduleTitles[index % moduleTitles.length],
    moduleTitle: moduleTitles[index % moduleTitles.length],
    passedAt: issuedAt,
    signedOffAt: issuedAt,
    status: "cleared",
  }));
  return { clubName: demoClub.name, club: { name: demoClub.name }, generatedAt: issuedAt, rows, entries: rows, members: rows, athletes: rows };
}

function failedCall(figure: string, found: Found, error: unknown, target: string): Row {
  const reason = error instanceof Error ? error.message : String(error);
  return notAvailable(figure, `found ${found.name}() in ${found.file} but it did not take the bench's sample input (${reason}); adapt scripts/bench/measures/pdf.ts`, target);
}

/** Time to render one certificate PDF (mean of 20 after a warm-up): ≤ 30 ms. */
export async function certificatePdf(context: BenchContext): Promise<Row> {
  const figure = "Certificate PDF, per certificate";
  const target = "≤ 30 ms";
  const found = await findRenderer(certificatePattern);
  if (!found) return notAvailable(figure, "feature not merged yet", target);
  context.log(`certificate PDF: ${found.name}() from ${found.file}, 20 renders`);
  try {
    const { times, bytes } = await timeRenders(found, sampleCertificate(0), 20);
    const mean = times.reduce((sum, time) => sum + time, 0) / times.length;
    context.raw.certificate = { renderer: `${found.file}#${found.name}`, times, bytes };
    return { figure, value: `${fixed(mean, 1)} ms (${found.name}, ${fixed(bytes / 1024, 0)} KB)`, baseline: "—", ratio: "—", target, result: mean <= 30 ? "pass" : "fail" };
  } catch (error) {
    return failedCall(figure, found, error, target);
  }
}

/** Time to render the induction register with 500 rows (median of 3 after a warm-up): ≤ 1 s. */
export async function registerPdf(context: BenchContext): Promise<Row> {
  const figure = "Register PDF, 500 rows";
  const target = "≤ 1 s";
  const found = await findRenderer(registerPattern);
  if (!found) return notAvailable(figure, "feature not merged yet", target);
  context.log(`register PDF: ${found.name}() from ${found.file}, 500 rows, 3 renders`);
  try {
    const { times, bytes } = await timeRenders(found, sampleRegister(500), 3);
    const middle = median(times);
    context.raw.register = { renderer: `${found.file}#${found.name}`, times, bytes };
    return { figure, value: `${fixed(middle, 0)} ms (${found.name}, ${fixed(bytes / 1024, 0)} KB)`, baseline: "—", ratio: "—", target, result: middle <= 1000 ? "pass" : "fail" };
  } catch (error) {
    return failedCall(figure, found, error, target);
  }
}
