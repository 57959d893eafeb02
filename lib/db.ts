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
        this.exec(`PRAGMA journal_mode=WAL; PRAGMA synchronous=${synchronous};`, (pragmaErr) => callback?.(pragmaErr ?? null));
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
  slipwayOpenStatementGroup?: PendingWrite[];
}
const globalStore = globalThis as unknown as DbGlobal;

/** A value bound to a `?` of a plain statement. */
export type SqlValue = string | number | null;

/** A statement sqlite3 has prepared once, run again with new values (see preparedOn). */
interface PreparedStatement {
  run(values: readonly SqlValue[], callback: (this: { changes: number }, err: Error | null) => void): void;
  all(values: readonly SqlValue[], callback: (err: Error | null, rows: unknown[]) => void): void;
  finalize(callback?: (err: Error | null) => void): void;
}

/** The parts of a sqlite3 connection used here (Sequelize's write connection, or the read connection). */
interface SqliteConnection {
  close(callback?: (err: Error | null) => void): void;
  prepare(sql: string, callback: (err: Error | null) => void): PreparedStatement;
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
    await finalizePrepared(connection);
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

/**
 * A single-row UPDATE by key, as `writeKeyedUpdate` takes it. Every name is a constant of the code
 * (checked against a plain identifier pattern); only values are bound.
 */
export interface KeyedUpdate {
  table: string;
  /** The column the row is found by (its primary key). */
  key: string;
  /** The columns set, in the order of the values passed. */
  columns: readonly string[];
  /** An extra condition on the row, written against the alias `target` (e.g. "target.submitted_at IS NULL"). */
  condition?: string;
}

/** A keyed update waiting for the next group commit; resolves to whether its row was changed. */
interface PendingKeyedUpdate {
  update: KeyedUpdate;
  key: SqlValue;
  values: readonly SqlValue[];
  resolve: (changes: number) => void;
  reject: (error: unknown) => void;
}

type PendingWrite = PendingStatement | PendingKeyedUpdate;

/** Prepared statements kept per connection, by SQL text (the SQL given here is always a constant). */
const preparedStatements = new WeakMap<SqliteConnection, Map<string, Promise<PreparedStatement>>>();
/** More distinct statements than the code has is a bug; the oldest is finalized rather than kept. */
const maxPreparedPerConnection = 64;

/**
 * The statement for `sql` on this connection, prepared on first use and then reused: sqlite3 otherwise
 * prepares and finalizes a new statement on every call, two more trips to its worker thread than the
 * run itself (70 against 34 µs a read on the project machine). sqlite3 queues the calls made on one
 * statement and binds each call's values afresh. A statement that fails to prepare is not kept.
 */
function preparedOn(connection: SqliteConnection, sql: string): Promise<PreparedStatement> {
  let statements = preparedStatements.get(connection);
  if (!statements) {
    statements = new Map();
    preparedStatements.set(connection, statements);
  }
  let statement = statements.get(sql);
  if (!statement) {
    const kept = statements;
    statement = new Promise<PreparedStatement>((resolve, reject) => {
      const prepared = connection.prepare(sql, (err) => (err ? reject(err) : resolve(prepared)));
    });
    statement.catch(() => kept.delete(sql));
    if (kept.size >= maxPreparedPerConnection) {
      const [oldestSql, oldest] = kept.entries().next().value!;
      kept.delete(oldestSql);
      void oldest.then(
        (unused) => unused.finalize(),
        () => undefined,
      );
    }
    kept.set(sql, statement);
  }
  return statement;
}

/** Finalizes a connection's prepared statements: SQLite refuses to close a connection that has any. */
async function finalizePrepared(connection: SqliteConnection): Promise<void> {
  const statements = preparedStatements.get(connection);
  preparedStatements.delete(connection);
  if (!statements) return;
  await Promise.all(
    [...statements.values()].map((statement) =>
      statement.then(
        (prepared) => new Promise<void>((resolve) => prepared.finalize(() => resolve())),
        () => undefined,
      ),
    ),
  );
}

async function runOn(connection: SqliteConnection, sql: string, values: readonly SqlValue[] = []): Promise<number> {
  const statement = await preparedOn(connection, sql);
  return new Promise<number>((resolve, reject) => {
    statement.run(values, function (err) {
      if (err) reject(err);
      else resolve(this.changes);
    });
  });
}

/**
 * One statement written through the same queue and connection as `writeTransaction`. Statements that
 * arrive while the queue is busy are committed together, in one transaction, when their turn comes (a
 * group commit): with synchronous=FULL every commit waits for the disk (an fsync), so ten writes in
 * flight do not queue for ten fsyncs. A group takes only statements that arrived before any later
 * write transaction was queued, so writes still happen in the order they were asked for. A lone
 * statement commits by itself, without BEGIN and COMMIT. Either way each promise resolves only once its
 * statement is committed, with how many rows it changed; a statement refused by a constraint is
 * rejected alone (SQLite undoes that statement, not the transaction); any other failure rolls the group
 * back and rejects all of it, none of which is stored.
 */
export function writeStatement(sql: string, values: readonly SqlValue[]): Promise<number> {
  return new Promise<number>((resolve, reject) => queueWrite({ sql, values, resolve, reject }));
}

/**
 * `UPDATE table SET columns = values WHERE key = key [AND condition]` through the same group commit as
 * writeStatement, for the busiest write (the quiz submission); resolves to whether the row changed.
 * Keyed updates of the same kind that queue up next to each other run as **one** statement
 * (`UPDATE … FROM (VALUES …) … RETURNING key`, up to `maxKeyedRows` rows). Under load every trip to
 * sqlite3's worker thread waits for the main thread to be free: in the benchmark a group of five
 * single-row UPDATEs took 6–9 ms to commit for 0.3 ms of disk, and the requests waiting on it left the
 * main thread idle. The same key twice goes into separate statements, in order, so the first one wins
 * as it would alone. A batch refused by a constraint is retried row by row, so that only the offending
 * row is rejected.
 */
export function writeKeyedUpdate(update: KeyedUpdate, key: SqlValue, values: readonly SqlValue[]): Promise<boolean> {
  if (values.length !== update.columns.length) {
    return Promise.reject(new Error(`${update.table}: ${update.columns.length} values expected, ${values.length} given`));
  }
  return new Promise<number>((resolve, reject) => queueWrite({ update, key, values, resolve, reject })).then((changes) => changes === 1);
}

function queueWrite(write: PendingWrite): void {
  const open = globalStore.slipwayOpenStatementGroup;
  if (open) {
    open.push(write);
    return;
  }
  // The first statement of a group asks for a turn; later ones join it until the turn comes.
  const group: PendingWrite[] = [write];
  globalStore.slipwayOpenStatementGroup = group;
  void commitStatementGroup(group);
}

/** Later statements start a group of their own, behind whatever write is queued now (order is kept). */
function closeStatementGroup(): void {
  globalStore.slipwayOpenStatementGroup = undefined;
}

/** Rows in one merged keyed update: at most this many statement shapes are prepared per kind. */
export const maxKeyedRows = 8;
const sqlName = /^[a-z_][a-z0-9_]*$/;
const keyedSql = new WeakMap<KeyedUpdate, string[]>();

/** The merged statement for `rows` rows of this kind (built once per size). */
function keyedUpdateSql(update: KeyedUpdate, rows: number): string {
  let bySize = keyedSql.get(update);
  if (!bySize) {
    for (const name of [update.table, update.key, ...update.columns]) {
      if (!sqlName.test(name)) throw new Error(`not a plain SQL name: ${name}`);
    }
    bySize = [];
    keyedSql.set(update, bySize);
  }
  bySize[rows] ??= [
    `UPDATE ${update.table} AS target SET`,
    update.columns.map((column, index) => `${column} = batch.column${index + 2}`).join(", "),
    `FROM (VALUES ${Array.from({ length: rows }, () => `(${Array.from({ length: update.columns.length + 1 }, () => "?").join(", ")})`).join(", ")}) AS batch`,
    `WHERE target.${update.key} = batch.column1${update.condition ? ` AND (${update.condition})` : ""}`,
    `RETURNING ${update.key} AS changed_key`, // RETURNING cannot name the alias, and batch has no such column
  ].join(" ");
  return bySize[rows]!;
}

/** One statement of a group: a plain statement, or keyed updates merged into one. */
type GroupStep = { statement: PendingStatement } | { batch: PendingKeyedUpdate[] };

/** Merges runs of keyed updates of one kind (distinct keys, ≤ maxKeyedRows) and keeps the order. */
function planGroup(group: readonly PendingWrite[]): GroupStep[] {
  const steps: GroupStep[] = [];
  for (const write of group) {
    if (!("update" in write)) {
      steps.push({ statement: write });
      continue;
    }
    const last = steps.at(-1);
    if (
      last &&
      "batch" in last &&
      last.batch[0]!.update === write.update &&
      last.batch.length < maxKeyedRows &&
      !last.batch.some((queued) => String(queued.key) === String(write.key))
    ) {
      last.batch.push(write);
    } else {
      steps.push({ batch: [write] });
    }
  }
  return steps;
}

type Outcome = { changes: number } | { error: unknown };

function isConstraintError(error: unknown): boolean {
  return (error as { code?: string }).code === "SQLITE_CONSTRAINT";
}

/** A constraint failure undoes that statement only; any other error (I/O, a full disk) fails the group. */
function constraintOutcome(error: unknown): Outcome {
  if (isConstraintError(error)) return { error };
  throw error;
}

async function allOn(connection: SqliteConnection, sql: string, values: readonly SqlValue[]): Promise<unknown[]> {
  const statement = await preparedOn(connection, sql);
  return new Promise<unknown[]>((resolve, reject) => {
    statement.all(values, (err, rows) => (err ? reject(err) : resolve(rows)));
  });
}

async function runBatch(connection: SqliteConnection, batch: readonly PendingKeyedUpdate[]): Promise<Outcome[]> {
  const update = batch[0]!.update;
  const rows = await allOn(
    connection,
    keyedUpdateSql(update, batch.length),
    batch.flatMap((write) => [write.key, ...write.values]),
  ).catch((error: unknown) => (isConstraintError(error) && batch.length > 1 ? null : Promise.reject(error)));
  if (rows === null) {
    // One row broke a constraint, so the whole statement was undone: find it by running them singly.
    const outcomes: Outcome[] = [];
    for (const write of batch)
      outcomes.push(...(await runBatch(connection, [write]).catch((error: unknown) => [constraintOutcome(error)])));
    return outcomes;
  }
  // Compared as text: SQLite may hand back a key bound as "7" as the integer 7 of the column.
  const changed = new Set((rows as { changed_key: SqlValue }[]).map((row) => String(row.changed_key)));
  return batch.map((write) => ({ changes: changed.has(String(write.key)) ? 1 : 0 }));
}

async function runStep(connection: SqliteConnection, step: GroupStep): Promise<Outcome[]> {
  if ("statement" in step) {
    return [await runOn(connection, step.statement.sql, step.statement.values).then((changes) => ({ changes }), constraintOutcome)];
  }
  return runBatch(connection, step.batch);
}

function settle(writes: readonly PendingWrite[], outcomes: readonly Outcome[]): void {
  writes.forEach((write, index) => {
    const outcome = outcomes[index]!;
    if ("error" in outcome) write.reject(outcome.error);
    else write.resolve(outcome.changes);
  });
}

async function commitStatementGroup(group: PendingWrite[]): Promise<void> {
  await writeLock().runExclusive(async () => {
    if (globalStore.slipwayOpenStatementGroup === group) closeStatementGroup();
    let connection: SqliteConnection;
    try {
      const manager = getSequelize().connectionManager as unknown as SqliteConnectionManager;
      connection = await claimingWriter(() => manager.getConnection({}));
    } catch (error) {
      for (const write of group) write.reject(error);
      return;
    }
    const steps = planGroup(group);
    const ordered = steps.flatMap((step): PendingWrite[] => ("statement" in step ? [step.statement] : step.batch));
    if (steps.length === 1) {
      // One statement is its own transaction.
      try {
        const outcomes = await runStep(connection, steps[0]!);
        countCommit();
        settle(ordered, outcomes);
      } catch (error) {
        for (const write of ordered) write.reject(error);
      }
      return;
    }
    const outcomes: Outcome[] = [];
    try {
      await runOn(connection, "BEGIN IMMEDIATE");
      for (const step of steps) outcomes.push(...(await runStep(connection, step)));
      await runOn(connection, "COMMIT");
    } catch (error) {
      // BEGIN or COMMIT failed: nothing of the group is stored (SQLite may have rolled back already).
      await runOn(connection, "ROLLBACK").catch(() => undefined);
      for (const write of ordered) write.reject(error);
      return;
    }
    countCommit();
    settle(ordered, outcomes);
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
  return (await allOn(await readConnection(), sql, values)) as Row[];
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
    if (connection) {
      await finalizePrepared(connection);
      await new Promise<void>((resolve, reject) => connection.close((err) => (err ? reject(err) : resolve())));
    }
  }
  if (instance) {
    const manager = instance.connectionManager as unknown as { connections?: Record<string, SqliteConnection> };
    await Promise.all(Object.values(manager.connections ?? {}).map(finalizePrepared));
    await instance.close();
  }
}
