import "server-only";
import { LRUCache } from "lru-cache";
import { QueryTypes } from "sequelize";
import { committedWrites, getSequelize } from "@/lib/db";

/**
 * The database's version as this process sees it: the number of write transactions it has committed,
 * and SQLite's `data_version` on the read connection, which changes whenever another connection commits
 * (the write connection, or another process such as a restore). Equal versions mean equal data.
 */
export async function databaseVersion(): Promise<string> {
  const [row] = await getSequelize().query<{ data_version: number }>("PRAGMA data_version", { type: QueryTypes.SELECT });
  return `${committedWrites()}:${row?.data_version ?? 0}`;
}

/** The last computation of a key: the database version it was started at, and whether it still runs. */
interface Computation<T> {
  version: string;
  result: Promise<T>;
  running: boolean;
}

/**
 * A read that is costly for a large club (the coach's matrix computes every athlete's standing), kept
 * until the database changes: entries are keyed by `key` and the database version, so any committed
 * write makes the next read compute afresh. Concurrent reads of the same key share one computation; a
 * failed one is not kept. Bounded: the least recently used of `max` entries goes first.
 *
 * While writes run, the version moves on between most reads. A read that finds an older version's
 * computation still running waits for it and then shares **one** fresh computation with every read
 * that arrived meanwhile, so at most one computation per key runs at a time (one more waits). Each read
 * still sees every write committed before it asked: the computation it gets starts after it arrived.
 * (Before, every read after a write started its own: in the benchmark ten coaches' requests beside
 * running submissions computed the matrix ten times over, at a p95 of 2 s.)
 */
export function versionedReadCache<T extends object>(max: number) {
  const computations = new LRUCache<string, Computation<T>>({ max });
  const waiting = new Map<string, Promise<T>>();

  async function read(key: string, compute: () => Promise<T>): Promise<T> {
    const version = await databaseVersion();
    const last = computations.get(key);
    if (last && last.version === version) return last.result;
    if (last?.running) {
      let next = waiting.get(key);
      if (!next) {
        next = last.result
          .catch(() => undefined)
          .then(() => {
            waiting.delete(key);
            return read(key, compute);
          });
        waiting.set(key, next);
      }
      return next;
    }
    const computation: Computation<T> = { version, result: compute(), running: true };
    computations.set(key, computation);
    computation.result.then(
      () => {
        computation.running = false;
      },
      () => {
        computation.running = false;
        if (computations.get(key) === computation) computations.delete(key);
      },
    );
    return computation.result;
  }

  return {
    read,
    clear(): void {
      computations.clear();
      waiting.clear();
    },
  };
}
