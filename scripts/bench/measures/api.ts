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

/** A roster route read by a demo coach (1,000+ athletes in the club); reported against the trivial route. */
export async function rosterRoute(context: BenchContext, path: string): Promise<Row> {
  const figure = `Roster GET ${path} (coach)`;
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

/** Roster p95 while submissions are written at the same time (their own pool of attempts): ≤ 100 ms. */
export async function rosterUnderWrites(context: BenchContext): Promise<Row> {
  const path = rosterPaths[0]!;
  const figure = `Roster GET ${path} p95 while submissions run`;
  if (!(await routeExists(context, path))) return notAvailable(figure, "route not present", "≤ 100 ms");
  const alone = await (context.memo.roster ?? rosterLoad(context, path));
  const { request, maxRequests } = submitRequests(context, context.dataset.writePool);
  context.log(`autocannon: GET ${path} from ${context.connections} connections while ${writerConnections} connections submit, ${context.loadSeconds} s`);
  const [reads, writes] = await Promise.all([
    rosterLoad(context, path),
    runLoad({ baseUrl: context.baseUrl, connections: writerConnections, durationSeconds: context.loadSeconds, maxRequests, request }),
  ]);
  context.raw.rosterUnderWrites = { reads, writes };
  await pause();
  return {
    figure,
    value:
      `p95 ${fixed(reads.p95Ms, 1)} ms (${fixed(reads.requestsPerSecond, 0)} req/s, beside ${fixed(writes.requestsPerSecond, 0)} submits/s` +
      `${allOk(writes) ? "" : `, writes ${describeStatuses(writes.statuses)}`}` +
      `${writes.seconds < reads.seconds - 1 ? `, writes stopped after ${fixed(writes.seconds, 1)} s: pool used up` : ""})`,
    baseline: `p95 ${fixed(alone.p95Ms, 1)} ms (no writes)`,
    ratio: `${fixed(reads.p95Ms / alone.p95Ms, 2)}×`,
    target: "≤ 100 ms",
    result: allOk(reads) && allOk(writes) && reads.p95Ms <= 100 ? "pass" : "fail",
  };
}
