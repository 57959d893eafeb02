import path from "node:path";
import sqlite3 from "sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { closeDatabase, getSequelize, writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { databaseVersion, versionedReadCache } from "@/lib/data/read-cache";
import { seedDemoClub } from "@/lib/seed/demo-club";
import { AuditEvent, Club } from "@/models";

const dataDir = createTempDataDir("read-cache");

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

async function writeAuditEvent(label: string): Promise<void> {
  const club = await Club.findOne();
  await writeTransaction((transaction) =>
    AuditEvent.create(
      { clubId: club!.id, actorId: null, action: "test.cache", subjectType: "test", subjectId: label, details: {} },
      { transaction },
    ),
  );
}

/** Commits a row through a connection of its own, as another process (a restore, a seed) would. */
function writeFromAnotherConnection(): Promise<void> {
  return new Promise((resolve, reject) => {
    const other = new sqlite3.Database(path.join(dataDir, "slipway.sqlite"), (openError) => {
      if (openError) return reject(openError);
      other.run("UPDATE clubs SET updated_at = datetime('now', '+1 second') WHERE id = (SELECT MIN(id) FROM clubs)", (runError) => {
        other.close(() => (runError ? reject(runError) : resolve()));
      });
    });
  });
}

describe("the database version", () => {
  it("stays the same across reads and moves on with each committed write, from this process or another", async () => {
    const first = await databaseVersion();
    await Club.findAll();
    expect(await databaseVersion()).toBe(first);
    await writeAuditEvent("a");
    const afterWrite = await databaseVersion();
    expect(afterWrite).not.toBe(first);
    await writeFromAnotherConnection();
    expect(await databaseVersion()).not.toBe(afterWrite);
  });

  it("does not move on when a write transaction fails and rolls back", async () => {
    const before = await databaseVersion();
    await expect(writeTransaction(async () => Promise.reject(new Error("refused")))).rejects.toThrow("refused");
    expect(await databaseVersion()).toBe(before);
  });
});

describe("versionedReadCache", () => {
  it("computes once per key until a write commits, and shares a computation between concurrent reads", async () => {
    const cache = versionedReadCache<{ run: number }>(8);
    let runs = 0;
    const compute = async () => ({ run: ++runs });
    const [a, b] = await Promise.all([cache.read("k", compute), cache.read("k", compute)]);
    expect(a).toBe(b);
    expect(runs).toBe(1);
    expect(await cache.read("k", compute)).toBe(a);
    expect(await cache.read("other", compute)).toEqual({ run: 2 });
    await writeAuditEvent("b");
    expect(await cache.read("k", compute)).toEqual({ run: 3 });
  });

  it("runs one computation at a time per key: reads after a write wait for the running one and share the next", async () => {
    const cache = versionedReadCache<{ run: number; events: number }>(8);
    let runs = 0;
    let running = 0;
    let mostAtOnce = 0;
    let releaseFirst!: () => void;
    const firstMayFinish = new Promise<void>((resolve) => (releaseFirst = resolve));
    const compute = async () => {
      const run = ++runs;
      running += 1;
      mostAtOnce = Math.max(mostAtOnce, running);
      const events = await AuditEvent.count({ where: { action: "test.cache" } });
      if (run === 1) await firstMayFinish;
      running -= 1;
      return { run, events };
    };
    const before = await AuditEvent.count({ where: { action: "test.cache" } });
    const first = cache.read("k", compute);
    await new Promise((resolve) => setTimeout(resolve, 20));
    await writeAuditEvent("during");
    // Three reads after the write, while the first computation (from before it) still runs.
    const later = Promise.all([cache.read("k", compute), cache.read("k", compute), cache.read("k", compute)]);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(runs).toBe(1);
    releaseFirst();
    expect(await first).toEqual({ run: 1, events: before });
    const [a, b, c] = await later;
    expect(a).toEqual({ run: 2, events: before + 1 });
    expect(b).toBe(a);
    expect(c).toBe(a);
    expect(runs).toBe(2);
    expect(mostAtOnce).toBe(1);
  });

  it("does not keep a failed computation", async () => {
    const cache = versionedReadCache<{ ok: boolean }>(8);
    await expect(cache.read("k", () => Promise.reject(new Error("database busy")))).rejects.toThrow("database busy");
    expect(await cache.read("k", async () => ({ ok: true }))).toEqual({ ok: true });
  });

  it("keeps at most `max` entries", async () => {
    const cache = versionedReadCache<{ key: string }>(2);
    let runs = 0;
    const compute = (key: string) => async () => {
      runs += 1;
      return { key };
    };
    await cache.read("a", compute("a"));
    await cache.read("b", compute("b"));
    await cache.read("c", compute("c"));
    expect(runs).toBe(3);
    await cache.read("a", compute("a")); // "a" was the least recently used: computed again
    expect(runs).toBe(4);
  });
});
