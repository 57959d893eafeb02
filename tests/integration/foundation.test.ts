import type { EventEmitter } from "node:events";
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import {
  closeDatabase,
  committedWrites,
  getSequelize,
  maxKeyedRows,
  readStatement,
  writeKeyedUpdate,
  writeStatement,
  writeTransaction,
  type KeyedUpdate,
} from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { migrateToLatest, migrateToNothing } from "@/lib/migrate";
import { seedDemoClub, demoMembers } from "@/lib/seed/demo-club";
import { acceptInvitation, authenticateWithPassword, findPendingInvitation, inviteMember, sessionUserById } from "@/lib/data/users";
import { listOutbox } from "@/lib/mail/outbox";
import { AuditEvent, Club, User } from "@/models";
import type { Actor } from "@/lib/auth/permissions";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/http/errors";

const dataDir = createTempDataDir("foundation");

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

describe("database", () => {
  it("creates the file in SLIPWAY_DATA_DIR, in WAL mode with a busy timeout", async () => {
    expect(fs.existsSync(path.join(dataDir, "slipway.sqlite"))).toBe(true);
    const [rows] = await getSequelize().query("PRAGMA journal_mode");
    expect(rows).toEqual([{ journal_mode: "wal" }]);
  });

  it("runs the migrations down and up again", async () => {
    const sequelize = getSequelize();
    await migrateToNothing(sequelize);
    const tablesAfterDown = await sequelize.getQueryInterface().showAllTables();
    expect(tablesAfterDown).not.toContain("users");
    const applied = await migrateToLatest(sequelize);
    expect(applied.length).toBeGreaterThan(0);
    expect(await sequelize.getQueryInterface().showAllTables()).toEqual(expect.arrayContaining(["clubs", "users", "invitations"]));
    await seedDemoClub(sequelize);
  });

  it("seeds the demo club idempotently", async () => {
    const again = await seedDemoClub(getSequelize());
    expect(again.created).toBe(0);
    expect(await User.count()).toBe(demoMembers.length);
    expect(await Club.count()).toBe(1);
  });

  it("queues concurrent write transactions instead of failing with SQLITE_BUSY", async () => {
    const club = await Club.findOne();
    const results = await Promise.allSettled(
      Array.from({ length: 40 }, (_, index) =>
        writeTransaction(async (transaction) => {
          const count = await AuditEvent.count({ transaction });
          await AuditEvent.create(
            {
              clubId: club!.id,
              actorId: null,
              action: "test.write",
              subjectType: "test",
              subjectId: String(index),
              details: { seen: count },
            },
            { transaction },
          );
        }),
      ),
    );
    expect(results.filter((result) => result.status === "rejected")).toHaveLength(0);
    const written = await AuditEvent.findAll({ where: { action: "test.write" } });
    expect(written).toHaveLength(40);
    // Each transaction saw every earlier one: the counts are exactly 0..39 with no duplicates.
    const seen = written.map((event) => (event.details as { seen: number }).seen).sort((a, b) => a - b);
    expect(seen).toEqual(Array.from({ length: 40 }, (_, index) => index));
  });
});

describe("the write connection", () => {
  type Connected = { connection: object };
  const connectionOf = (transaction: unknown) => (transaction as Connected).connection;

  it("keeps one connection for queued writes; other transactions get their own", async () => {
    const first = await writeTransaction(async (transaction) => connectionOf(transaction));
    const second = await writeTransaction(async (transaction) => connectionOf(transaction));
    expect(second).toBe(first);
    const unqueued = await getSequelize().transaction(async (transaction) => connectionOf(transaction));
    expect(unqueued).not.toBe(first);
  });

  it("rolls a failed write back and the next write still works on the same connection", async () => {
    const club = await Club.findOne();
    const before = await writeTransaction(async (transaction) => connectionOf(transaction));
    await expect(
      writeTransaction(async (transaction) => {
        await AuditEvent.create(
          { clubId: club!.id, actorId: null, action: "test.rolled-back", subjectType: "test", subjectId: "x", details: {} },
          { transaction },
        );
        throw new Error("work failed");
      }),
    ).rejects.toThrow("work failed");
    expect(await AuditEvent.count({ where: { action: "test.rolled-back" } })).toBe(0);
    const after = await writeTransaction(async (transaction) => connectionOf(transaction));
    expect(after).toBe(before);
  });

  it("runs lone statements through the same queue, in order with transactions, answering the rows changed", async () => {
    const club = await Club.findOne();
    const create = (index: number) =>
      writeTransaction((transaction) =>
        AuditEvent.create(
          { clubId: club!.id, actorId: null, action: "test.lone", subjectType: "test", subjectId: String(index), details: {} },
          { transaction },
        ),
      );
    const mark = (index: number) =>
      writeStatement("UPDATE audit_events SET subject_type = ? WHERE action = ? AND subject_id = ?", [
        "marked",
        "test.lone",
        String(index),
      ]);
    // Interleaved: each statement is queued after the transaction creating its row, so it finds that row.
    const outcomes = await Promise.all(Array.from({ length: 20 }, (_, index) => [create(index), mark(index)]).flat());
    expect(outcomes.filter((outcome) => outcome === 1)).toHaveLength(20);
    expect(await AuditEvent.count({ where: { action: "test.lone", subjectType: "marked" } })).toBe(20);
    expect(await writeStatement("UPDATE audit_events SET subject_type = ? WHERE action = ?", ["x", "no.such.action"])).toBe(0);
    await expect(writeStatement("UPDATE no_such_table SET x = ?", [1])).rejects.toThrow(/no such table/);
  });

  it("commits statements that queue up together in one group, each answered on its own", async () => {
    const club = await Club.findOne();
    await writeTransaction((transaction) =>
      AuditEvent.bulkCreate(
        Array.from({ length: 40 }, (_, index) => ({
          clubId: club!.id,
          actorId: null,
          action: "test.group",
          subjectType: "test",
          subjectId: String(index),
          details: {},
        })),
        { transaction },
      ),
    );
    const commitsBefore = committedWrites();
    const mark = (index: number) =>
      writeStatement("UPDATE audit_events SET subject_type = ? WHERE action = ? AND subject_id = ?", [
        "grouped",
        "test.group",
        String(index),
      ]);
    // One statement breaks a NOT NULL constraint: it alone is refused, the rest of its group is stored.
    const broken = writeStatement("UPDATE audit_events SET action = NULL WHERE action = ? AND subject_id = ?", ["test.group", "0"]);
    const outcomes = await Promise.allSettled([...Array.from({ length: 40 }, (_, index) => mark(index)), broken]);
    expect(outcomes.slice(0, 40).map((outcome) => (outcome.status === "fulfilled" ? outcome.value : outcome.reason))).toEqual(
      Array(40).fill(1),
    );
    expect(outcomes[40]).toMatchObject({ status: "rejected", reason: { code: "SQLITE_CONSTRAINT" } });
    expect(await AuditEvent.count({ where: { action: "test.group", subjectType: "grouped" } })).toBe(40);
    // The first statement commits alone (nothing was queued yet); the other 40 wait for it and go together.
    expect(committedWrites() - commitsBefore).toBeLessThanOrEqual(2);
  });

  describe("keyed updates", () => {
    // Sets an event's subject only while it is still "open", as a quiz submission stores a grade once.
    const markEvent: KeyedUpdate = {
      table: "audit_events",
      key: "id",
      columns: ["subject_type", "subject_id"],
      condition: "target.subject_type = 'open'",
    };

    async function openEvents(action: string, count: number): Promise<number[]> {
      const club = await Club.findOne();
      const created = await writeTransaction((transaction) =>
        AuditEvent.bulkCreate(
          Array.from({ length: count }, (_, index) => ({
            clubId: club!.id,
            actorId: null,
            action,
            subjectType: "open",
            subjectId: String(index),
            details: {},
          })),
          { transaction },
        ),
      );
      return created.map((event) => event.id);
    }

    const subjects = (action: string) =>
      readStatement<{ subjectType: string; subjectId: string }>(
        "SELECT subject_type AS subjectType, subject_id AS subjectId FROM audit_events WHERE action = ? ORDER BY id",
        [action],
      );

    it("merges updates that queue up together into a few statements, each answered on its own", async () => {
      const ids = await openEvents("test.keyed", 40);
      // sqlite3 reports each statement the write connection runs.
      const writer = (await writeTransaction(async (transaction) => connectionOf(transaction))) as EventEmitter;
      const updates: string[] = [];
      const trace = (sql: string) => {
        if (sql.startsWith("UPDATE audit_events")) updates.push(sql);
      };
      writer.on("trace", trace);
      const commitsBefore = committedWrites();
      const outcomes = await Promise.all(ids.map((id, index) => writeKeyedUpdate(markEvent, id, ["marked", `m${index}`])));
      writer.off("trace", trace);
      // The trace shows each statement with its values: every row once, at most maxKeyedRows to a statement.
      const rowsPerStatement = updates.map((sql) => sql.match(/'marked'/g)?.length ?? 0);
      expect(rowsPerStatement.reduce((sum, rows) => sum + rows, 0)).toBe(40);
      expect(Math.max(...rowsPerStatement)).toBe(maxKeyedRows);
      expect(updates.length).toBeLessThanOrEqual(1 + Math.ceil(39 / maxKeyedRows));
      expect(outcomes).toEqual(Array(40).fill(true));
      expect(await subjects("test.keyed")).toEqual(ids.map((_, index) => ({ subjectType: "marked", subjectId: `m${index}` })));
      // One group commit, or two if the first update got its turn before the others queued up.
      expect(committedWrites() - commitsBefore).toBeLessThanOrEqual(2);
      // The condition holds the row now: a second update of the same rows changes nothing.
      expect(await Promise.all(ids.slice(0, 3).map((id) => writeKeyedUpdate(markEvent, id, ["again", "x"])))).toEqual([
        false,
        false,
        false,
      ]);
      expect(await writeKeyedUpdate(markEvent, -1, ["missing", "x"])).toBe(false);
    });

    it("lets the first of two updates of one row win, as it would alone", async () => {
      const [id] = await openEvents("test.keyed-twice", 1);
      // A slow transaction first, so that both updates queue up in one group behind it.
      const blocker = writeTransaction(() => new Promise((resolve) => setTimeout(resolve, 50)));
      const [first, second] = await Promise.all([
        writeKeyedUpdate(markEvent, id!, ["first", "1"]),
        writeKeyedUpdate(markEvent, id!, ["second", "2"]),
        blocker,
      ]);
      expect([first, second]).toEqual([true, false]);
      expect(await subjects("test.keyed-twice")).toEqual([{ subjectType: "first", subjectId: "1" }]);
    });

    it("rejects only the row that breaks a constraint and stores the rest of its batch", async () => {
      const ids = await openEvents("test.keyed-broken", maxKeyedRows);
      const blocker = writeTransaction(() => new Promise((resolve) => setTimeout(resolve, 50)));
      // subject_type is NOT NULL: the third row's update is refused, the statement it was merged into is retried row by row.
      const outcomes = await Promise.allSettled(
        ids.map((id, index) => writeKeyedUpdate(markEvent, id, [index === 2 ? null : "kept", String(index)])),
      );
      await blocker;
      expect(outcomes[2]).toMatchObject({ status: "rejected", reason: { code: "SQLITE_CONSTRAINT" } });
      expect(outcomes.filter((outcome) => outcome.status === "fulfilled" && outcome.value === true)).toHaveLength(maxKeyedRows - 1);
      expect((await subjects("test.keyed-broken")).map((row) => row.subjectType)).toEqual(
        ids.map((_, index) => (index === 2 ? "open" : "kept")),
      );
    });

    it("keeps the order of plain statements and keyed updates queued between them", async () => {
      const [id] = await openEvents("test.keyed-order", 1);
      const blocker = writeTransaction(() => new Promise((resolve) => setTimeout(resolve, 50)));
      const results = await Promise.all([
        writeKeyedUpdate(markEvent, id!, ["step", "1"]),
        writeStatement("UPDATE audit_events SET subject_type = 'open', subject_id = subject_id || '+2' WHERE id = ?", [id!]),
        writeKeyedUpdate(markEvent, id!, ["step", "1+2+3"]),
        blocker,
      ]);
      expect(results.slice(0, 3)).toEqual([true, 1, true]);
      expect(await subjects("test.keyed-order")).toEqual([{ subjectType: "step", subjectId: "1+2+3" }]);
    });

    it("refuses a wrong number of values and a name that is not plain SQL, before anything is queued", async () => {
      await expect(writeKeyedUpdate(markEvent, 1, ["only one"])).rejects.toThrow(/2 values expected, 1 given/);
      const unsafe: KeyedUpdate = { table: "audit_events; DROP TABLE users", key: "id", columns: ["subject_type"] };
      await expect(writeKeyedUpdate(unsafe, 1, ["x"])).rejects.toThrow(/not a plain SQL name/);
      expect(await User.count()).toBe(demoMembers.length);
    });
  });

  it("reads with readStatement on the read connection: committed writes at once, bound values, SQL errors thrown", async () => {
    const select = "SELECT subject_id AS subjectId FROM audit_events WHERE action = ? ORDER BY subject_id";
    expect(await readStatement(select, ["test.read"])).toEqual([]);
    const club = await Club.findOne();
    await writeTransaction((transaction) =>
      AuditEvent.create(
        { clubId: club!.id, actorId: null, action: "test.read", subjectType: "test", subjectId: "r1", details: {} },
        { transaction },
      ),
    );
    await writeStatement("UPDATE audit_events SET subject_id = ? WHERE action = ?", ["r2", "test.read"]);
    expect(await readStatement(select, ["test.read"])).toEqual([{ subjectId: "r2" }]);
    // A value is bound, never spliced into the SQL: this one matches nothing and breaks nothing.
    expect(await readStatement(select, ["test.read' OR '1'='1"])).toEqual([]);
    await expect(readStatement("SELECT * FROM no_such_table", [])).rejects.toThrow(/no such table/);
  });

  it("keeps plain reads off Sequelize's connection, so a model query never waits behind them", async () => {
    // Sequelize starts a statement only when nothing else runs on its connection: had the 400 reads
    // shared it, the count would have finished after the last of them.
    const finished: string[] = [];
    // Each read counts to 20,000, so that 400 of them take a while on their connection.
    const slowRead = "WITH RECURSIVE c(x) AS (SELECT 1 UNION ALL SELECT x + 1 FROM c WHERE x < 20000) SELECT COUNT(*) AS n FROM c";
    const reads = Array.from({ length: 400 }, () => readStatement(slowRead, []).then(() => finished.push("read")));
    const model = User.count().then(() => finished.push("model"));
    await Promise.all([...reads, model]);
    expect(finished.indexOf("model")).toBeLessThan(finished.length / 2);
  });

  it("replaces the connection when Sequelize destroys it (a commit that failed)", async () => {
    const club = await Club.findOne();
    const old = await writeTransaction(async (transaction) => connectionOf(transaction));
    const manager = getSequelize().connectionManager as unknown as { destroyConnection(connection: object): Promise<void> };
    await manager.destroyConnection(old);
    const fresh = await writeTransaction(async (transaction) => {
      await AuditEvent.create(
        { clubId: club!.id, actorId: null, action: "test.after-destroy", subjectType: "test", subjectId: "y", details: {} },
        { transaction },
      );
      return connectionOf(transaction);
    });
    expect(fresh).not.toBe(old);
    expect(await AuditEvent.count({ where: { action: "test.after-destroy" } })).toBe(1);
  });
});

describe("accounts and invitations", () => {
  async function actorFor(email: string): Promise<Actor> {
    const user = await User.findOne({ where: { email } });
    return { id: user!.id, clubId: user!.clubId, role: user!.role, name: user!.name, email: user!.email };
  }

  it("authenticates the demo admin and refuses a wrong password or unknown account", async () => {
    expect(await authenticateWithPassword("ADMIN@lantern-reach.example", "lantern-reach-demo")).toMatchObject({ role: "admin" });
    expect(await authenticateWithPassword("admin@lantern-reach.example", "wrong-password-here")).toBeNull();
    expect(await authenticateWithPassword("nobody@lantern-reach.example", "lantern-reach-demo")).toBeNull();
  });

  it("ends sessions whose token version is stale or whose user is deactivated", async () => {
    const user = await User.findOne({ where: { email: "kit@lantern-reach.example" } });
    expect(await sessionUserById(user!.id, user!.tokenVersion)).not.toBeNull();
    expect(await sessionUserById(user!.id, user!.tokenVersion + 1)).toBeNull();
    await writeTransaction((transaction) => user!.update({ status: "deactivated" }, { transaction }));
    expect(await sessionUserById(user!.id, user!.tokenVersion)).toBeNull();
    expect(await authenticateWithPassword("kit@lantern-reach.example", "lantern-reach-demo")).toBeNull();
  });

  it("lets only admins invite, mails the link, and accepts it once", async () => {
    const admin = await actorFor("admin@lantern-reach.example");
    const coach = await actorFor("coach.tobias@lantern-reach.example");
    await expect(inviteMember(coach, { email: "x@lantern-reach.example", name: "X", role: "athlete" })).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    const taken = inviteMember(admin, { email: "ada@lantern-reach.example", name: "Ada", role: "athlete" });
    await expect(taken).rejects.toBeInstanceOf(ConflictError);
    // The refusal names the field, so the invitation form marks the e-mail input.
    await expect(taken).rejects.toMatchObject({ fieldErrors: { email: ["Already a member."] } });

    await inviteMember(admin, { email: "Rowan.New@lantern-reach.example", name: "Rowan New", role: "athlete" });
    const before = Date.now();
    const [mail] = await listOutbox();
    expect(mail?.to).toBe("rowan.new@lantern-reach.example");
    // The outbox list shows when each message was written (the JSON transport stores no date).
    expect(Math.abs(Date.parse(mail!.sentAt) - before)).toBeLessThan(60_000);
    const token = /\/invite\/(\S+)/.exec(mail!.text)?.[1];
    expect(token).toBeTruthy();
    expect(await findPendingInvitation(token!)).toMatchObject({ email: "rowan.new@lantern-reach.example", role: "athlete" });

    await expect(acceptInvitation(token!, "Rowan New", "password123")).rejects.toBeInstanceOf(ValidationError);
    await acceptInvitation(token!, "Rowan New", "oarlock heron tidewater");
    expect(await authenticateWithPassword("rowan.new@lantern-reach.example", "oarlock heron tidewater")).toMatchObject({
      name: "Rowan New",
    });
    await expect(acceptInvitation(token!, "Rowan New", "oarlock heron tidewater")).rejects.toBeInstanceOf(NotFoundError);
    expect(await findPendingInvitation(token!)).toBeNull();
    expect(await AuditEvent.count({ where: { action: "member.invited" } })).toBe(1);
  });

  it("withdraws an open invitation to the same address when the admin invites it again", async () => {
    const admin = await actorFor("admin@lantern-reach.example");
    const first = await inviteMember(admin, { email: "Zoe.Marsh@lantern-reach.example", name: "Zoe Marsh", role: "coach" });
    expect(first.replaced).toBe(false);
    const [firstMail] = await listOutbox();
    const firstToken = /\/invite\/(\S+)/.exec(firstMail!.text)![1]!;

    // The second try (another role, the address in other capitals) is the one that counts.
    const second = await inviteMember(admin, { email: "zoe.marsh@lantern-reach.example", name: "Zoe Marsh", role: "athlete" });
    expect(second.replaced).toBe(true);
    const secondMail = (await listOutbox()).find((mail) => !mail.text.includes(firstToken));
    const secondToken = /\/invite\/(\S+)/.exec(secondMail!.text)![1]!;
    expect(await findPendingInvitation(firstToken)).toBeNull();
    expect(await findPendingInvitation(secondToken)).toMatchObject({ email: "zoe.marsh@lantern-reach.example", role: "athlete" });
    await expect(acceptInvitation(firstToken, "Zoe Marsh", "oarlock heron tidewater")).rejects.toBeInstanceOf(NotFoundError);
    await acceptInvitation(secondToken, "Zoe Marsh", "oarlock heron tidewater");
    expect(await authenticateWithPassword("zoe.marsh@lantern-reach.example", "oarlock heron tidewater")).toMatchObject({ role: "athlete" });

    const audits = (await AuditEvent.findAll({ where: { action: "member.invited" }, order: [["id", "ASC"]] })).filter(
      (audit) => (audit.details as Record<string, unknown>).email === "zoe.marsh@lantern-reach.example",
    );
    expect(audits.map((audit) => (audit.details as Record<string, unknown>).replacedOpenInvitations ?? 0)).toEqual([0, 1]);
  });
});
