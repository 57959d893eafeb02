import fs from "node:fs";
import path from "node:path";
import { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { closeDatabase, getSequelize, writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { seedDemoClub } from "@/lib/seed/demo-club";
import { backupDatabase, integrityCheck } from "@/lib/ops/backup";
import { AuditEvent, Club } from "@/models";

const dataDir = createTempDataDir("backup");

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

async function countIn(file: string): Promise<number> {
  const copy = new Sequelize({ dialect: "sqlite", storage: file, logging: false });
  try {
    expect(await integrityCheck(copy)).toBe("ok");
    const [rows] = await copy.query("SELECT COUNT(*) AS n FROM audit_events");
    return (rows as { n: number }[])[0]!.n;
  } finally {
    await copy.close();
  }
}

describe("hot backup", () => {
  it("copies a consistent snapshot while writes go on, and the copy restores", async () => {
    const club = (await Club.findOne())!;
    let stop = false;
    let written = 0;
    const writer = (async () => {
      while (!stop) {
        await writeTransaction(async (transaction) => {
          await AuditEvent.create(
            { clubId: club.id, actorId: null, action: "test.load", subjectType: "test", subjectId: String(written) },
            { transaction },
          );
        });
        written += 1;
      }
    })();
    await new Promise((resolve) => setTimeout(resolve, 150));
    const before = await AuditEvent.count();
    const file = await backupDatabase(getSequelize(), path.join(dataDir, "backups"));
    const after = await AuditEvent.count();
    stop = true;
    await writer;

    const copied = await countIn(file);
    expect(written).toBeGreaterThan(0);
    expect(copied).toBeGreaterThanOrEqual(before);
    expect(copied).toBeLessThanOrEqual(after);

    // With writes stopped, a copy holds exactly what the live database holds.
    const quiet = await backupDatabase(getSequelize(), path.join(dataDir, "backups"), new Date(Date.now() + 1000));
    expect(await countIn(quiet)).toBe(await AuditEvent.count());

    // Restore as documented: stop the server, put the copy in place of slipway.sqlite, remove -wal/-shm.
    const restoredDir = path.join(dataDir, "restored");
    fs.mkdirSync(restoredDir);
    fs.copyFileSync(quiet, path.join(restoredDir, "slipway.sqlite"));
    expect(await countIn(path.join(restoredDir, "slipway.sqlite"))).toBe(await AuditEvent.count());
  });
});
