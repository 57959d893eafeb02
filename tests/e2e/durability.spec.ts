import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import sqlite3 from "sqlite3";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { apiSession } from "./support/api-session";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

const modules = ["overall-length", "setting-inboard", "changing-boats", "secure-and-check", "grip-cleaning"];

function query<T>(file: string, sql: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, (openError) => {
      if (openError) return reject(openError);
      db.all<T>(sql, params, (error, rows) => {
        db.close();
        if (error) reject(error);
        else resolve(rows);
      });
    });
  });
}

test("200 concurrent submissions, then all 200 replayed: 200 stored results, no duplicates, no 5xx", async ({ baseURL }) => {
  test.setTimeout(120_000);
  // 40 athletes × 5 modules: one open attempt per athlete and module at a time gives 200 distinct attempts.
  const sessions = await Promise.all(Array.from({ length: 40 }, (_, index) => apiSession(baseURL!, loadAthleteEmail(index + 1))));
  const attempts: { session: APIRequestContext; attemptId: string }[] = [];
  for (const session of sessions) {
    for (const slug of modules) {
      const response = await session.post(`/api/modules/${slug}/attempts`);
      expect(response.status()).toBe(201);
      attempts.push({ session, attemptId: ((await response.json()) as { attemptId: string }).attemptId });
    }
  }
  expect(new Set(attempts.map((entry) => entry.attemptId)).size).toBe(200);

  // A submission that never got an answer (the connection was reset: on a busy machine a kept-alive
  // socket can close just as it is reused) is sent again, as the quiz page lets the athlete do (it keeps
  // the answers and takes a 409's stored result as done): the attempt id is the idempotency key. Such a resend may find its first try stored (409); that counts
  // only for resent requests, and no attempt may be stored twice either way.
  const resent = new Set<string>();
  async function submit(session: APIRequestContext, attemptId: string) {
    for (let tries = 1; ; tries += 1) {
      try {
        return await session.post(`/api/attempts/${attemptId}/submit`, { data: { answers: { q1: "1" } } });
      } catch (error) {
        if (tries >= 3 || !/socket hang up|ECONNRESET|EPIPE/.test(String(error))) throw error;
        resent.add(attemptId);
      }
    }
  }
  const submitAll = () => Promise.all(attempts.map(({ session, attemptId }) => submit(session, attemptId)));
  const first = await submitAll();
  expect(first.filter((response) => response.status() >= 500)).toHaveLength(0);
  expect(
    first.map((response, index) => (response.status() === 409 && resent.has(attempts[index]!.attemptId) ? 200 : response.status())),
  ).toEqual(Array(200).fill(200));
  expect(resent.size).toBeLessThan(10);
  const replayed = await submitAll();
  expect(replayed.filter((response) => response.status() >= 500)).toHaveLength(0);
  expect(replayed.map((response) => response.status())).toEqual(Array(200).fill(409));

  const file = path.join(process.cwd(), ".e2e-data", "slipway.sqlite");
  const ids = attempts.map((entry) => entry.attemptId);
  const rows = await query<{ id: string; submitted_at: string | null }>(
    file,
    `SELECT id, submitted_at FROM quiz_attempts WHERE id IN (${ids.map(() => "?").join(",")})`,
    ids,
  );
  expect(rows).toHaveLength(200);
  expect(rows.filter((row) => row.submitted_at !== null)).toHaveLength(200);
  await Promise.all(sessions.map((session) => session.dispose()));
});

test.describe("crash safety", () => {
  const port = 3160;
  const dataDir = path.join(process.cwd(), ".e2e-crash-data");
  const file = path.join(dataDir, "slipway.sqlite");
  const baseURL = `http://127.0.0.1:${port}`;

  function startServer(): ChildProcess {
    return spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(port)], {
      env: { ...process.env, SLIPWAY_DATA_DIR: dataDir, PORT: String(port), NEXT_TELEMETRY_DISABLED: "1" },
      stdio: "ignore",
    });
  }

  async function waitForHealth(): Promise<void> {
    for (let tries = 0; tries < 200; tries += 1) {
      try {
        const response = await fetch(`${baseURL}/api/health`);
        if (response.ok) return;
      } catch {
        // not up yet
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    throw new Error("the server did not come up");
  }

  function killHard(server: ChildProcess): Promise<void> {
    return new Promise((resolve) => {
      server.once("exit", () => resolve());
      server.kill("SIGKILL");
    });
  }

  test("kill -9 twenty times during a submission load: integrity ok and every acknowledged submission kept", async () => {
    test.setTimeout(240_000);
    fs.rmSync(dataDir, { recursive: true, force: true });
    const seeded = spawnSync("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/seed.ts"], {
      env: { ...process.env, SLIPWAY_DATA_DIR: dataDir, SLIPWAY_SEED_LOAD_ATHLETES: "6" },
      encoding: "utf8",
    });
    expect(seeded.status, seeded.stderr).toBe(0);

    let server = startServer();
    await waitForHealth();
    const sessions = await Promise.all(Array.from({ length: 6 }, (_, index) => apiSession(baseURL, loadAthleteEmail(index + 1))));
    const acknowledged = new Set<string>();

    for (let round = 0; round < 20; round += 1) {
      if (round > 0) {
        server = startServer();
        await waitForHealth();
      }
      let running = true;
      let acknowledgedThisRound = 0;
      const workers = sessions.map(async (session, index) => {
        let turn = 0;
        while (running) {
          try {
            const slug = modules[(index + turn) % modules.length]!;
            turn += 1;
            const opened = await session.post(`/api/modules/${slug}/attempts`);
            if (!opened.ok()) continue;
            const { attemptId } = (await opened.json()) as { attemptId: string };
            const submitted = await session.post(`/api/attempts/${attemptId}/submit`, { data: { answers: {} } });
            if (submitted.status() === 200) {
              acknowledged.add(attemptId);
              acknowledgedThisRound += 1;
            }
          } catch {
            return; // the server died under us
          }
        }
      });
      // Kill while the load runs: once this round has written something, after a varying extra delay.
      for (let waited = 0; acknowledgedThisRound === 0 && waited < 10_000; waited += 50) {
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
      await new Promise((resolve) => setTimeout(resolve, (round * 97) % 400));
      await killHard(server);
      running = false;
      await Promise.all(workers);

      const [integrity] = await query<{ integrity_check: string }>(file, "PRAGMA integrity_check");
      expect(integrity?.integrity_check, `round ${round + 1}`).toBe("ok");
      const ids = [...acknowledged];
      const kept = await query<{ n: number }>(
        file,
        `SELECT COUNT(*) AS n FROM quiz_attempts WHERE submitted_at IS NOT NULL AND id IN (${ids.map(() => "?").join(",") || "''"})`,
        ids,
      );
      expect(kept[0]?.n, `round ${round + 1}: acknowledged submissions kept`).toBe(ids.length);
    }
    expect(acknowledged.size).toBeGreaterThan(20);
    await Promise.all(sessions.map((session) => session.dispose()));
    fs.rmSync(dataDir, { recursive: true, force: true });
  });
});
