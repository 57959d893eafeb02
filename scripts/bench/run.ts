/**
 * `npm run bench`: builds the app, generates a large invented club in a temporary data dir, serves it
 * with `next start` on 127.0.0.1, measures pages (Lighthouse) and API routes (autocannon), and writes a
 * markdown table to bench-out/last.md. It reports and does not gate: failed targets still exit 0; a
 * crash exits 1. Every run is bounded (fixed Lighthouse runs, fixed-length load tests) and cleans up.
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { demoMembers, demoPassword } from "@/lib/seed/demo-club";
import { generateDataset } from "./dataset";
import { openLighthouse, type LighthouseSession } from "./lighthouse";
import { buildApp, startServer, type RunningServer } from "./server";
import { signIn } from "./session";
import { markdownTable, type Row } from "./stats";
import { removeStaticLesson, staticLessonPath, writeStaticLesson } from "./static-lesson";
import type { BenchContext } from "./measures/context";
import { lessonCls, lessonLcp, lessonScript, lessonTbt, referencePages } from "./measures/pages";
import { matrixUnderWrites, quizSubmit, rosterPaths, rosterRoute, rosterUnderWrites, trivialRoute } from "./measures/api";
import { certificatePdf, registerPdf } from "./measures/pdf";

const settings = {
  athletes: 1000,
  benchAthletes: 20,
  // Enough for the warm-up (8,000) and every submit round to run its full time at ~1,000 req/s (4 rounds × 5 s).
  submitPoolSize: 30000,
  writePoolSize: 9000,
  lighthouseRuns: 5,
  loadSeconds: 10,
  apiRounds: 4,
  roundSeconds: 5,
  connections: 10,
  lessonPath: "/learn/setting-inboard",
  minimalPath: "/",
};

/** The figures in table order, by group: one small function each, returning its rows (or an "n/a" row). */
const measureGroups: Record<"pages" | "api" | "pdf", ((context: BenchContext) => Promise<Row | Row[]>)[]> = {
  pages: [lessonLcp, lessonScript, lessonTbt, lessonCls, referencePages],
  api: [
    trivialRoute,
    quizSubmit,
    ...rosterPaths.map((rosterPath) => (context: BenchContext) => rosterRoute(context, rosterPath)),
    rosterUnderWrites,
    matrixUnderWrites,
  ],
  pdf: [certificatePdf, registerPdf],
};

/** `--only=pages,pdf` runs some groups (while working on one figure); the default runs them all. */
function selectedMeasures(argv: readonly string[]): ((context: BenchContext) => Promise<Row | Row[]>)[] {
  const only = argv.find((argument) => argument.startsWith("--only="))?.slice("--only=".length);
  if (!only) return Object.values(measureGroups).flat();
  const groups = only.split(",").map((group) => group.trim());
  for (const group of groups) {
    if (!(group in measureGroups)) throw new Error(`--only: unknown group "${group}" (pages, api, pdf)`);
  }
  return groups.flatMap((group) => measureGroups[group as keyof typeof measureGroups]);
}

const root = process.cwd();
const outDir = path.join(root, "bench-out");

function log(message: string): void {
  console.log(`[bench ${new Date().toISOString().slice(11, 19)}] ${message}`);
}

const cleanups: (() => Promise<void> | void)[] = [];
let cleaning: Promise<void> | undefined;

/** Stops the server and Chromium, deletes the static page and the temporary folders; safe to call twice. */
function cleanUp(): Promise<void> {
  cleaning ??= (async () => {
    for (const task of cleanups.reverse()) {
      try {
        await task();
      } catch (error) {
        console.error("[bench] clean-up step failed:", error);
      }
    }
  })();
  return cleaning;
}

function tempDir(label: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), `slipway-bench-${label}-`));
  cleanups.push(() => fs.rmSync(dir, { recursive: true, force: true }));
  return dir;
}

function commit(): string {
  try {
    return execFileSync("git", ["rev-parse", "--short", "HEAD"], { cwd: root, encoding: "utf8" }).trim();
  } catch {
    return "unknown";
  }
}

function machine(): string {
  const cpu = os.cpus()[0]?.model.trim() ?? "unknown CPU";
  return `${os.cpus().length} cores (${cpu}), ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}, Chromium at /usr/bin/chromium`;
}

async function main(): Promise<void> {
  const skipBuild = process.argv.includes("--no-build");
  fs.mkdirSync(outDir, { recursive: true });
  for (const file of fs.readdirSync(outDir)) {
    if (/^lighthouse-.*\.json$/.test(file)) fs.rmSync(path.join(outDir, file)); // reports of an earlier run
  }
  const serverLog = fs.createWriteStream(path.join(outDir, "server.log"));
  cleanups.push(() => new Promise<void>((resolve) => serverLog.end(resolve)));
  const started = Date.now();
  const loadAtStart = os.loadavg()[0]!;

  if (skipBuild) {
    if (!fs.existsSync(path.join(root, ".next", "BUILD_ID"))) throw new Error("--no-build needs an existing build (.next/BUILD_ID)");
    log("using the existing build (--no-build)");
  } else {
    log("next build (output in bench-out/server.log)");
    await buildApp(tempDir("build"), serverLog);
  }

  const dataDir = tempDir("data");
  process.env.SLIPWAY_DATA_DIR = dataDir;
  log(`generating ${settings.athletes} athletes with history in every module into ${dataDir}`);
  const dataset = await generateDataset(settings);
  log(
    `${dataset.athletes} athletes × ${dataset.modules.length} modules (${dataset.modules.join(", ")}): ` +
      `${dataset.lessonReads} lesson reads, ${dataset.submittedAttempts} submitted attempts, ` +
      `${dataset.submitPool.length + dataset.writePool.length} open attempts for the load tests, in ${dataset.seconds.toFixed(1)} s`,
  );

  // BENCH_CPU_PROFILE=1: the server writes V8 CPU profiles (bench-out/cpu-profile/*.cpuprofile) when it stops.
  const serverNodeArgs = process.env.BENCH_CPU_PROFILE === "1" ? ["--cpu-prof", `--cpu-prof-dir=${path.join(outDir, "cpu-profile")}`] : [];
  let server: RunningServer = await startServer(dataDir, serverLog, serverNodeArgs);
  const stopServer = () => server.stop();
  cleanups.push(stopServer);
  log(`next start on ${server.baseUrl} (PID ${server.pid})`);

  const athleteEmail = demoMembers.find((member) => member.role === "athlete")!.email;
  const coachEmail = demoMembers.find((member) => member.role === "coach")!.email;
  const athleteCookie = await signIn(server.baseUrl, athleteEmail, demoPassword);
  const coachCookie = await signIn(server.baseUrl, coachEmail, demoPassword);
  const benchCookies = new Map<string, string>();
  for (const email of dataset.benchEmails) benchCookies.set(email, await signIn(server.baseUrl, email, dataset.password));
  log(`signed in ${athleteEmail}, ${coachEmail} and ${benchCookies.size} bench athletes`);

  cleanups.push(removeStaticLesson);
  const characters = await writeStaticLesson(server.baseUrl, settings.lessonPath, athleteCookie);
  log(`wrote ${staticLessonPath} (${characters} characters of the lesson's text)`);
  const probe = await fetch(`${server.baseUrl}${staticLessonPath}`);
  await probe.arrayBuffer();
  if (probe.status === 404) {
    // Public files are listed when the server starts: restart it so that it serves the new file.
    log("restarting the server so that it serves the new public file");
    await server.stop();
    server = await startServer(dataDir, serverLog, serverNodeArgs);
    log(`next start on ${server.baseUrl} (PID ${server.pid})`);
    const again = await fetch(`${server.baseUrl}${staticLessonPath}`);
    await again.arrayBuffer();
    if (!again.ok) throw new Error(`${staticLessonPath} is not served (status ${again.status})`);
  }

  let lighthouse: Promise<LighthouseSession> | undefined;
  const context: BenchContext = {
    baseUrl: server.baseUrl,
    outDir,
    dataset,
    athleteCookie,
    coachCookie,
    benchCookies,
    lessonPath: settings.lessonPath,
    staticLessonPath,
    minimalPath: settings.minimalPath,
    lighthouseRuns: settings.lighthouseRuns,
    loadSeconds: settings.loadSeconds,
    apiRounds: settings.apiRounds,
    roundSeconds: settings.roundSeconds,
    connections: settings.connections,
    lighthouse() {
      if (!lighthouse) {
        lighthouse = openLighthouse();
        cleanups.push(async () => (await lighthouse!).close());
      }
      return lighthouse;
    },
    log,
    memo: {},
    raw: {},
  };

  const rows: Row[] = [];
  for (const measure of selectedMeasures(process.argv)) {
    const result = await measure(context);
    rows.push(...(Array.isArray(result) ? result : [result]));
  }
  if (lighthouse) await (await lighthouse).close();

  const date = new Date().toISOString().slice(0, 10);
  const failed = rows.filter((row) => row.result === "fail").map((row) => row.figure);
  const markdown = [
    `# Slipway benchmark, ${date}`,
    "",
    `Commit ${commit()} · ${machine()} · 1-minute load average ${loadAtStart.toFixed(1)} at the start, ${os.loadavg()[0]!.toFixed(1)} at the end ` +
      `(above ${os.cpus().length} means other work shared the cores and the figures are lower than the machine can do).`,
    "",
    `Data: the demo club plus ${dataset.athletes} invented athletes with history in all ${dataset.modules.length} modules ` +
      `(${dataset.lessonReads} lesson reads, ${dataset.submittedAttempts} submitted attempts; generated in ${dataset.seconds.toFixed(1)} s). ` +
      `Pages: Lighthouse 12 mobile defaults (simulated throttling), median of ${settings.lighthouseRuns} runs taken in turns, signed in as a demo athlete. ` +
      `APIs: autocannon, ${settings.connections} connections; the trivial route and quiz submit in ${settings.apiRounds} alternating rounds of ${settings.roundSeconds} s, the roster ${settings.loadSeconds} s a run; each submission to its own fresh attempt. KB = 1,024 bytes.`,
    "",
    markdownTable(rows),
    "",
    failed.length === 0 ? "All targets met." : `Targets missed: ${failed.join("; ")}.`,
    "",
  ].join("\n");
  fs.writeFileSync(path.join(outDir, "last.md"), markdown);
  fs.writeFileSync(path.join(outDir, "last.json"), JSON.stringify({ date, settings, rows, raw: context.raw }, null, 2));
  console.log(`\n${markdown}`);
  log(`written to bench-out/last.md in ${((Date.now() - started) / 1000).toFixed(0)} s`);
}

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    console.error(`\n[bench] ${signal}: stopping the server and cleaning up`);
    void cleanUp().finally(() => process.exit(130));
  });
}

main()
  .then(() => cleanUp())
  .then(() => process.exit(0))
  .catch(async (error: unknown) => {
    console.error("[bench] crashed:", error);
    await cleanUp();
    process.exit(1);
  });
