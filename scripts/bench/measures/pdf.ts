import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { fixed, median, type Row } from "../stats";
import type { BenchContext } from "./context";

interface Timed {
  times: number[];
  bytes: number;
}

const run = promisify(execFile);

/** Runs scripts/bench/pdf-timing.ts in a fresh Node process (see there why), once for both figures. */
function pdfTimings(context: BenchContext): Promise<{ certificate: Timed; register: Timed }> {
  context.memo.pdf ??= (async () => {
    context.log("PDFs in a process of their own (scripts/bench/pdf-timing.ts): 20 certificates, 3 registers of 500 rows, after warm-ups");
    const tsx = path.join(process.cwd(), "node_modules", ".bin", "tsx");
    const script = path.join(process.cwd(), "scripts", "bench", "pdf-timing.ts");
    const { stdout } = await run(tsx, ["--conditions=react-server", script], { cwd: process.cwd(), timeout: 120_000 });
    const last = stdout.trim().split("\n").at(-1) ?? "";
    return JSON.parse(last) as { certificate: Timed; register: Timed };
  })();
  return context.memo.pdf;
}

/** Time to render one certificate PDF (mean of 20 after 5 warm-up renders): ≤ 30 ms. */
export async function certificatePdf(context: BenchContext): Promise<Row> {
  const { certificate } = await pdfTimings(context);
  const { times, bytes } = certificate;
  const mean = times.reduce((sum, time) => sum + time, 0) / times.length;
  context.raw.certificate = certificate;
  return {
    figure: "Certificate PDF, per certificate",
    value: `${fixed(mean, 1)} ms mean (median ${fixed(median(times), 1)}, slowest ${fixed(Math.max(...times), 1)}; ${fixed(bytes / 1024, 0)} KB)`,
    baseline: "—",
    ratio: "—",
    target: "≤ 30 ms",
    result: mean <= 30 ? "pass" : "fail",
  };
}

/** Time to render the induction register with 500 rows (median of 3 after a warm-up): ≤ 1 s. */
export async function registerPdf(context: BenchContext): Promise<Row> {
  const { register } = await pdfTimings(context);
  const middle = median(register.times);
  context.raw.register = register;
  return {
    figure: "Register PDF, 500 rows",
    value: `${fixed(middle, 0)} ms (${fixed(register.bytes / 1024, 0)} KB)`,
    baseline: "—",
    ratio: "—",
    target: "≤ 1 s",
    result: middle <= 1000 ? "pass" : "fail",
  };
}
