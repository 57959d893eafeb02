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
  slipwayWriteLock?: Mutex;
}
const globalStore = globalThis as unknown as DbGlobal;

function createSequelize(): Sequelize {
  return new Sequelize({
    dialect: "sqlite",
    storage: databaseFile(),
    dialectModule: configuredSqlite(),
    logging: false,
    define: { underscored: true },
  });
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
  return writeLock().runExclusive(() => getSequelize().transaction((transaction) => work(transaction)));
}

/** Closes the connection (tests and scripts). */
export async function closeDatabase(): Promise<void> {
  const instance = globalStore.slipwaySequelize;
  globalStore.slipwaySequelize = undefined;
  if (instance) await instance.close();
}
