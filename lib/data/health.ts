import "server-only";
import { getSequelize } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { User } from "@/models";

export interface DatabaseHealth {
  ok: boolean;
  database: "reachable" | "unreachable";
  checkedAt: string;
}

/** A real round trip to the database: migrations applied and a count answered. */
export async function databaseHealth(): Promise<DatabaseHealth> {
  const checkedAt = new Date().toISOString();
  try {
    await databaseReady();
    await getSequelize().authenticate();
    await User.count();
    return { ok: true, database: "reachable", checkedAt };
  } catch (error) {
    console.error("Health check failed", error);
    return { ok: false, database: "unreachable", checkedAt };
  }
}
