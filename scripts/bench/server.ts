import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

const root = process.cwd();
const nextBin = path.join(root, "node_modules", "next", "dist", "bin", "next");

/** The environment of every child process: no telemetry, production mode. */
function childEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  return { ...process.env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", ...extra };
}

/** Runs `next build` once, with the data dir pointing at a throwaway folder so the build creates nothing in ./data. */
export async function buildApp(buildDataDir: string, log: fs.WriteStream): Promise<void> {
  const child = spawn(process.execPath, [nextBin, "build"], {
    cwd: root,
    env: childEnv({ SLIPWAY_DATA_DIR: buildDataDir }),
    stdio: ["ignore", "pipe", "pipe"],
  });
  child.stdout.pipe(log, { end: false });
  child.stderr.pipe(log, { end: false });
  const code = await new Promise<number | null>((resolve, reject) => {
    child.once("error", reject);
    child.once("exit", resolve);
  });
  if (code !== 0) throw new Error(`next build failed with exit code ${code}; see ${log.path.toString()}`);
}

/** A TCP port on 127.0.0.1 that was free a moment ago. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const address = probe.address();
      const port = typeof address === "object" && address ? address.port : 0;
      probe.close(() => (port ? resolve(port) : reject(new Error("no free port"))));
    });
  });
}

export interface RunningServer {
  baseUrl: string;
  port: number;
  pid: number;
  stop(): Promise<void>;
}

async function waitForHealth(baseUrl: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited with code ${child.exitCode} before it was healthy`);
    try {
      const response = await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`the server did not answer /api/health within ${timeoutMs} ms`);
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/**
 * Starts the production server (`next start`) on 127.0.0.1 and a free port, on the given data dir, and
 * waits for /api/health. The server is stopped by its own PID (SIGTERM, then SIGKILL after 5 s).
 * `nodeArgs` go to its node process (e.g. `--cpu-prof` when looking into a figure).
 */
export async function startServer(dataDir: string, log: fs.WriteStream, nodeArgs: string[] = []): Promise<RunningServer> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [...nodeArgs, nextBin, "start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: childEnv({ SLIPWAY_DATA_DIR: dataDir, PORT: String(port), SLIPWAY_BASE_URL: baseUrl }),
    stdio: ["ignore", "pipe", "pipe"],
  });
  child.stdout?.pipe(log, { end: false });
  child.stderr?.pipe(log, { end: false });
  const pid = child.pid;
  if (!pid) throw new Error("next start did not start");
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));

  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null || !isAlive(pid)) return;
    process.kill(pid, "SIGTERM");
    const stopped = await Promise.race([exited.then(() => true), new Promise<boolean>((r) => setTimeout(() => r(false), 5000))]);
    if (!stopped && isAlive(pid)) {
      process.kill(pid, "SIGKILL");
      await exited;
    }
  };

  try {
    await waitForHealth(baseUrl, child, 60_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, port, pid, stop };
}
