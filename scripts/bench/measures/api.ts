import { describeStatuses, runLoad, type LoadResult } from "../load";
import { fixed, notAvailable, type Row } from "../stats";
import { attemptQueue, type BenchContext } from "./context";

export const trivialPath = "/api/bench/ping";
/** The roster routes the bench knows; each one missing from this build prints "n/a (route not present)". */
export const rosterPaths = ["/api/roster", "/api/roster/matrix"];
/** Connections sending submissions while the roster is read, for "roster p95 while writes run". */
const writerConnections = 5;

function summary(result: LoadResult): string {
  const base = `${fixed(result.requestsPerSecond, 0)} req/s, p50 ${fixed(result.p50Ms, 1)} ms, p99 ${fixed(result.p99Ms, 1)} ms`;
  return allOk(result) ? base : `${base} (${describeStatuses(result.statuses)}, ${result.errors} errors)`;
}

function allOk(result: LoadResult): boolean {
  return result.responses > 0 && result.errors === 0 && Object.keys(result.statuses).every((status) => status === "200");
}

async function pause(): Promise<void> {
  await new Promise((resolve) => setTimeout(resolve, 1000));
}

function trivial(context: BenchContext): Promise<LoadResult> {
  context.memo.trivial ??= (async () => {
    context.log(`autocannon ${context.connections} connections, ${context.loadSeconds} s: GET ${trivialPath}`);
    const result = await runLoad({ baseUrl: context.baseUrl, connections: context.connections, durationSeconds: context.loadSeconds, request: { method: "GET", path: trivialPath } });
    context.raw.trivial = result;
    await pause();
    return result;
  })();
  return context.memo.trivial;
}

function rosterLoad(context: BenchContext, path: string, durationSeconds = context.loadSeconds): Promise<LoadResult> {
  return runLoad({
    baseUrl: context.baseUrl,
    connections: context.connections,
    durationSeconds,
    request: { method: "GET", path, headers: { Cookie: context.coachCookie } },
  });
}

function submitRequests(context: BenchContext, pool: typeof context.dataset.submitPool) {
  const queue = attemptQueue(pool, context.benchCookies);
  // autocannon builds one request ahead on every connection: keep a margin so the pool never runs dry.
  const maxRequests = queue.size - 2 * context.connections - 10;
  const request = () => {
    const next = queue.take();
    return { method: "POST" as const, path: next.path, headers: { Cookie: next.cookie, "Content-Type": "application/json" }, body: next.body };
  };
  return { request, maxRequests };
}

/** The trivial route (no database, no session): the framework's own cost per request, the baseline of the API rows. */
export async function trivialRoute(context: BenchContext): Promise<Row> {
  const result = await trivial(context);
  return { figure: `Trivial route GET ${trivialPath}`, value: summary(result), baseline: "—", ratio: "—", target: "reference", result: allOk(result) ? "report" : "fail" };
}

/** Quiz submissions, each to a fresh open attempt: ≥ 0.5 × the trivial route's req/s and p99 ≤ 150 ms. */
export async function quizSubmit(context: BenchContext): Promise<Row> {
  const baseline = await trivial(context);
  const { request, maxRequests } = submitRequests(context, context.dataset.submitPool);
  context.log(`autocannon ${context.connections} connections, ≤ ${context.loadSeconds} s, ≤ ${maxRequests} attempts: POST /api/attempts/{id}/submit`);
  const result = await runLoad({ baseUrl: context.baseUrl, connections: context.connections, durationSeconds: context.loadSeconds, maxRequests, request });
  context.raw.submit = result;
  await pause();
  const ratio = result.requestsPerSecond / baseline.requestsPerSecond;
  return {
    figure: "Quiz submit POST /api/attempts/{id}/submit",
    value: summary(result),
    baseline: `${fixed(baseline.requestsPerSecond, 0)} req/s (trivial)`,
    ratio: `${fixed(ratio, 2)}×`,
    target: "≥ 0.5 × trivial, p99 ≤ 150 ms",
    result: allOk(result) && ratio >= 0.5 && result.p99Ms <= 150 ? "pass" : "fail",
  };
}

async function routeExists(context: BenchContext, path: string): Promise<boolean> {
  const response = await fetch(`${context.baseUrl}${path}`, { headers: { Cookie: context.coachCookie } });
  await response.arrayBuffer();
  return response.status !== 404;
}

/** What each roster route answers, for the figure's name: the list API pages, the matrix is the whole club. */
const rosterScope: Record<string, string> = {
  "/api/roster": "coach, first page: 100 athletes",
  "/api/roster/matrix": "coach, every athlete × module; kept until the next write",
};

/** A roster route read by a demo coach (1,000+ athletes in the club); reported against the trivial route. */
export async function rosterRoute(context: BenchContext, path: string): Promise<Row> {
  const figure = `Roster GET ${path} (${rosterScope[path] ?? "coach"})`;
  if (!(await routeExists(context, path))) return notAvailable(figure, "route not present");
  const baseline = await trivial(context);
  context.log(`autocannon ${context.connections} connections, ${context.loadSeconds} s: GET ${path}`);
  const run = rosterLoad(context, path);
  if (path === rosterPaths[0]) context.memo.roster = run;
  const result = await run;
  context.raw[`roster ${path}`] = result;
  await pause();
  return {
    figure,
    value: summary(result),
    baseline: `${fixed(baseline.requestsPerSecond, 0)} req/s (trivial)`,
    ratio: `${fixed(result.requestsPerSecond / baseline.requestsPerSecond, 2)}×`,
    target: "report",
    result: allOk(result) ? "report" : "fail",
  };
}

/** A roster route read while submissions are written at the same time (their own pool of attempts). */
async function readsBesideWrites(context: BenchContext, path: string) {
  // Each run beside writes takes its own half of the write pool: an attempt is submitted only once.
  const half = Math.floor(context.dataset.writePool.length / 2);
  const part = path === rosterPaths[0] ? context.dataset.writePool.slice(0, half) : context.dataset.writePool.slice(half);
  const { request, maxRequests } = submitRequests(context, part);
  context.log(`autocannon: GET ${path} from ${context.connections} connections while ${writerConnections} connections submit, ${context.loadSeconds} s`);
  const [reads, writes] = await Promise.all([
    rosterLoad(context, path),
    runLoad({ baseUrl: context.baseUrl, connections: writerConnections, durationSeconds: context.loadSeconds, maxRequests, request }),
  ]);
  await pause();
  const value =
    `p95 ${fixed(reads.p95Ms, 1)} ms (${fixed(reads.requestsPerSecond, 0)} req/s, beside ${fixed(writes.requestsPerSecond, 0)} submits/s` +
    `${allOk(writes) ? "" : `, writes ${describeStatuses(writes.statuses)}`}` +
    `${writes.seconds < reads.seconds - 1 ? `, writes stopped after ${fixed(writes.seconds, 1)} s: pool used up` : ""})`;
  return { reads, writes, value };
}

/** Roster p95 while submissions are written at the same time: ≤ 100 ms. */
export async function rosterUnderWrites(context: BenchContext): Promise<Row> {
  const path = rosterPaths[0]!;
  const figure = `Roster GET ${path} p95 while submissions run (${rosterScope[path]})`;
  if (!(await routeExists(context, path))) return notAvailable(figure, "route not present", "≤ 100 ms");
  const alone = await (context.memo.roster ?? rosterLoad(context, path));
  const { reads, writes, value } = await readsBesideWrites(context, path);
  context.raw.rosterUnderWrites = { reads, writes };
  return {
    figure,
    value,
    baseline: `p95 ${fixed(alone.p95Ms, 1)} ms (no writes)`,
    ratio: `${fixed(reads.p95Ms / alone.p95Ms, 2)}×`,
    target: "≤ 100 ms",
    result: allOk(reads) && allOk(writes) && reads.p95Ms <= 100 ? "pass" : "fail",
  };
}

/**
 * The coach's matrix while submissions run: every write moves the database version on, so the kept
 * matrix is computed afresh about once per write. Reported (no target) so the cache does not hide that.
 */
export async function matrixUnderWrites(context: BenchContext): Promise<Row> {
  const path = rosterPaths[1]!;
  const figure = `Roster GET ${path} p95 while submissions run`;
  if (!(await routeExists(context, path))) return notAvailable(figure, "route not present");
  const { reads, writes, value } = await readsBesideWrites(context, path);
  context.raw.matrixUnderWrites = { reads, writes };
  return { figure, value, baseline: "—", ratio: "—", target: "report", result: allOk(reads) && allOk(writes) ? "report" : "fail" };
}
