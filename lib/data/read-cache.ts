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

/**
 * A read that is costly for a large club (the coach's matrix computes every athlete's standing), kept
 * until the database changes: entries are keyed by `key` and the database version, so any committed
 * write makes the next read compute afresh. Concurrent reads of the same key share one computation; a
 * failed one is not kept. Bounded: the least recently used of `max` entries goes first.
 */
export function versionedReadCache<T extends object>(max: number) {
  const entries = new LRUCache<string, Promise<T>>({ max });
  return {
    async read(key: string, compute: () => Promise<T>): Promise<T> {
      const versionedKey = `${key}@${await databaseVersion()}`;
      const kept = entries.get(versionedKey);
      if (kept) return kept;
      const pending = compute();
      entries.set(versionedKey, pending);
      pending.catch(() => {
        if (entries.get(versionedKey) === pending) entries.delete(versionedKey);
      });
      return pending;
    },
    clear(): void {
      entries.clear();
    },
  };
}
