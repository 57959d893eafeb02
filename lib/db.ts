import "server-only";
import sqlite3 from "sqlite3";
import { Sequelize, type Transaction } from "sequelize";
import { Mutex } from "async-mutex";
import { databaseFile, sqliteSynchronous } from "@/lib/env";

type OpenCallback = (err: Error | null) => void;

/**
 * sqlite3 wrapped so that every connection Sequelize opens (it opens one per transaction) waits on a
 * locked database instead of failing at once, and uses WAL so readers never block the writer.
 */
function configuredSqlite(): typeof sqlite3 {
  const synchronous = sqliteSynchronous();
  class ConfiguredDatabase extends sqlite3.Database {
    constructor(filename: string, mode?: number, callback?: OpenCallback) {
      super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, (err: Error | null) => {
        if (err) {
          callback?.(err);
          return;
        }
        this.configure("busyTimeout", 5000);
        this.exec(`PRAGMA journal_mode=WAL; PRAGMA synchronous=${synchronous};`, (pragmaErr) =>
          callback?.(pragmaErr ?? null),
        );
      });
    }
  }
  return { ...sqlite3, Database: ConfiguredDatabase } as typeof sqlite3;
}

interface DbGlobal {
  slipwaySequelize?: Sequelize;
  slipwayReadConnection?: Promise<SqliteConnection>;
  slipwayWriteLock?: Mutex;
  slipwayCommittedWrites?: number;
  slipwayOpenStatementGroup?: PendingStatement[];
}
const globalStore = globalThis as unknown as DbGlobal;

/** A value bound to a `?` of a plain statement. */
export type SqlValue = string | number | null;

/** The parts of Sequelize's SQLite connection manager that the write connection hooks into. */
interface SqliteConnection {
  close(callback?: (err: Error | null) => void): void;
  run(sql: string, values: readonly SqlValue[], callback: (this: { changes: number }, err: Error | null) => void): void;
  all(sql: string, values: readonly SqlValue[], callback: (err: Error | null, rows: unknown[]) => void): void;
  serialize(callback?: () => void): void;
}

interface SqliteConnectionManager {
  getConnection(options?: { uuid?: string; type?: string }): Promise<SqliteConnection>;
  releaseConnection(connection: SqliteConnection, force?: boolean): void;
  destroyConnection(connection: SqliteConnection): Promise<void>;
}

const writerUuid = "slipway-writer";
let claimWriter = false;

/**
 * Sequelize's SQLite dialect opens a new database connection for every transaction (file open, WAL and
 * busy-timeout set-up, foreign keys) and closes it afterwards: about half the cost of a small write.
 * Writes already run one at a time through the write queue, so they can share one long-lived connection:
 * the transaction that `writeTransaction` starts claims it, every other transaction (migrations, tests)
 * gets its own as before. A connection Sequelize destroys (a failed commit) is replaced on the next write.
 */
function keepOneWriteConnection(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as SqliteConnectionManager;
  const getConnection = manager.getConnection.bind(manager);
  const releaseConnection = manager.releaseConnection.bind(manager);
  const destroyConnection = manager.destroyConnection.bind(manager);
  let writer: SqliteConnection | undefined;
  let opening: Promise<SqliteConnection> | undefined;
  manager.getConnection = (options) => {
    if (!claimWriter) return getConnection(options);
    claimWriter = false;
    if (writer) return Promise.resolve(writer);
    opening ??= getConnection({ ...options, uuid: writerUuid }).then(
      (connection) => {
        writer = connection;
        opening = undefined;
        return connection;
      },
      (error: unknown) => {
        opening = undefined;
        throw error;
      },
    );
    return opening;
  };
  manager.releaseConnection = (connection, force) => {
    if (connection === writer && force !== true) return; // stays open for the next write
    releaseConnection(connection, force);
  };
  manager.destroyConnection = async (connection) => {
    if (connection !== writer) return destroyConnection(connection);
    writer = undefined;
    // Sequelize re-labels a transaction's connection with the transaction id; put back the key it is kept under.
    (connection as SqliteConnection & { uuid?: string }).uuid = writerUuid;
    releaseConnection(connection, true);
  };
}

function createSequelize(): Sequelize {
  const sequelize = new Sequelize({
    dialect: "sqlite",
    storage: databaseFile(),
    dialectModule: configuredSqlite(),
    logging: false,
    define: { underscored: true },
  });
  keepOneWriteConnection(sequelize);
  return sequelize;
}

/** The one Sequelize instance of this process (cached on globalThis so dev reloads reuse it). */
export function getSequelize(): Sequelize {
  globalStore.slipwaySequelize ??= createSequelize();
  return globalStore.slipwaySequelize;
}

function writeLock(): Mutex {
  globalStore.slipwayWriteLock ??= new Mutex();
  return globalStore.slipwayWriteLock;
}

/**
 * Runs a write transaction through the process's single write queue. SQLite allows one writer; without
 * the queue, concurrent Sequelize transactions fail with SQLITE_BUSY. Every write goes through here.
 */
export async function writeTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  closeStatementGroup();
  return writeLock().runExclusive(async () => {
    const result = await claimingWriter(() => getSequelize().transaction((transaction) => work(transaction)));
    countCommit();
    return result;
  });
}

/** A statement waiting for the next group commit (see writeStatement). */
interface PendingStatement {
  sql: string;
  values: readonly SqlValue[];
  resolve: (changes: number) => void;
  reject: (error: unknown) => void;
}

function runOn(connection: SqliteConnection, sql: string, values: readonly SqlValue[] = []): Promise<number> {
  return new Promise<number>((resolve, reject) => {
    connection.run(sql, values, function (err) {
      if (err) reject(err);
      else resolve(this.changes);
    });
  });
}

/**
 * One statement written through the same queue and connection as `writeTransaction`, for the busiest
 * single-row write (the quiz submission). Statements that arrive while the queue is busy are committed
 * together, in one transaction, when their turn comes (a group commit): with synchronous=FULL every
 * commit waits for the disk (an fsync, 0.5–1.5 ms on the project machines), so ten submissions in flight
 * no longer queue for ten fsyncs. A group takes only statements that arrived before any later write
 * transaction was queued, so writes still happen in the order they were asked for. A lone statement commits by itself, without BEGIN and COMMIT. Either
 * way each promise resolves only once its statement is committed, with how many rows it changed; a
 * statement refused by a constraint is rejected alone (SQLite undoes that statement, not the
 * transaction); any other failure rolls the group back and rejects all of it, none of which is stored.
 */
export function writeStatement(sql: string, values: readonly SqlValue[]): Promise<number> {
  return new Promise<number>((resolve, reject) => {
    const open = globalStore.slipwayOpenStatementGroup;
    if (open) {
      open.push({ sql, values, resolve, reject });
      return;
    }
    // The first statement of a group asks for a turn; later ones join it until the turn comes.
    const group: PendingStatement[] = [{ sql, values, resolve, reject }];
    globalStore.slipwayOpenStatementGroup = group;
    void commitStatementGroup(group);
  });
}

/** Later statements start a group of their own, behind whatever write is queued now (order is kept). */
function closeStatementGroup(): void {
  globalStore.slipwayOpenStatementGroup = undefined;
}

async function commitStatementGroup(group: PendingStatement[]): Promise<void> {
  await writeLock().runExclusive(async () => {
    if (globalStore.slipwayOpenStatementGroup === group) closeStatementGroup();
    let connection: SqliteConnection;
    try {
      const manager = getSequelize().connectionManager as unknown as SqliteConnectionManager;
      connection = await claimingWriter(() => manager.getConnection({}));
    } catch (error) {
      for (const statement of group) statement.reject(error);
      return;
    }
    if (group.length === 1) {
      const [statement] = group as [PendingStatement];
      await runOn(connection, statement.sql, statement.values).then(
        (changes) => {
          countCommit();
          statement.resolve(changes);
        },
        statement.reject,
      );
      return;
    }
    const outcomes: ({ changes: number } | { error: unknown })[] = [];
    try {
      await runOn(connection, "BEGIN IMMEDIATE");
      for (const statement of group) {
        outcomes.push(
          await runOn(connection, statement.sql, statement.values).then(
            (changes) => ({ changes }),
            (error: unknown) => {
              // A constraint failure undoes that statement only; any other error (I/O, a full disk) may
              // have ended the transaction, so it fails the whole group.
              if ((error as { code?: string }).code === "SQLITE_CONSTRAINT") return { error };
              throw error;
            },
          ),
        );
      }
      await runOn(connection, "COMMIT");
    } catch (error) {
      // BEGIN or COMMIT failed: nothing of the group is stored (SQLite may have rolled back already).
      await runOn(connection, "ROLLBACK").catch(() => undefined);
      for (const statement of group) statement.reject(error);
      return;
    }
    countCommit();
    group.forEach((statement, index) => {
      const outcome = outcomes[index]!;
      if ("error" in outcome) statement.reject(outcome.error);
      else statement.resolve(outcome.changes);
    });
  });
}

/**
 * The hot reads' own connection (WAL: it sees every committed write, and reads beside the writer and
 * beside Sequelize's connection). Not Sequelize's read connection: Sequelize runs each of its statements
 * serialized, that is only once nothing else is running on that connection, so plain reads started in
 * parallel there kept its model queries (the roster) waiting for seconds while submissions ran.
 */
function readConnection(): Promise<SqliteConnection> {
  globalStore.slipwayReadConnection ??= new Promise<SqliteConnection>((resolve, reject) => {
    const { Database } = configuredSqlite();
    const connection: SqliteConnection = new Database(databaseFile(), undefined, (err) => {
      if (err) {
        globalStore.slipwayReadConnection = undefined;
        reject(err);
      } else {
        // One statement at a time, queued by sqlite3 itself: in parallel mode every waiting statement
        // held one of libuv's four threads, and the writer's and Sequelize's work queued behind them.
        connection.serialize();
        resolve(connection);
      }
    });
  });
  return globalStore.slipwayReadConnection;
}

/**
 * One read straight through sqlite3 on the read connection, outside any transaction, queued behind the
 * other plain reads only (not behind Sequelize's statements). `sequelize.query` cost about 0.3 ms more a
 * statement in the benchmark (its query object, hooks and an Error built for every stack); the session
 * check runs one of these on every signed-in request. Rows come back as SQLite
 * gives them, as `sequelize.query` with QueryTypes.SELECT also did.
 */
export async function readStatement<Row>(sql: string, values: readonly SqlValue[]): Promise<Row[]> {
  const connection = await readConnection();
  return new Promise<Row[]>((resolve, reject) => {
    connection.all(sql, values, (err, rows) => {
      if (err) reject(err);
      else resolve(rows as Row[]);
    });
  });
}

/**
 * Starts work whose first connection request gets the write connection. Sequelize asks for a
 * connection synchronously (inside transaction(), or getConnection itself), which consumes the flag.
 * Should a later Sequelize ask later, the flag is cleared here and the work simply opens its own
 * connection as before (slower, still correct). Call only while holding the write lock.
 */
function claimingWriter<T>(start: () => T): T {
  claimWriter = true;
  try {
    return start();
  } finally {
    claimWriter = false;
  }
}

function countCommit(): void {
  globalStore.slipwayCommittedWrites = committedWrites() + 1;
}

/** How many write transactions this process has committed (part of the read caches' version). */
export function committedWrites(): number {
  return globalStore.slipwayCommittedWrites ?? 0;
}

/** Closes the connection (tests and scripts). */
export async function closeDatabase(): Promise<void> {
  const instance = globalStore.slipwaySequelize;
  const reader = globalStore.slipwayReadConnection;
  globalStore.slipwaySequelize = undefined;
  globalStore.slipwayReadConnection = undefined;
  if (reader) {
    const connection = await reader.catch(() => null);
    if (connection) await new Promise<void>((resolve, reject) => connection.close((err) => (err ? reject(err) : resolve())));
  }
  if (instance) await instance.close();
}
