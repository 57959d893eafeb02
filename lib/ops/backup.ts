import fs from "node:fs";
import path from "node:path";
import type { Sequelize } from "sequelize";

/**
 * A consistent hot copy of the live database with SQLite's `VACUUM INTO`: it reads one snapshot (WAL
 * readers never block the writer), so writes may go on while it runs. Operations code, not application
 * code: this is the one place that uses SQLite-only SQL.
 */
export async function backupDatabase(sequelize: Sequelize, targetDir: string, now = new Date()): Promise<string> {
  fs.mkdirSync(targetDir, { recursive: true });
  const stamp = now.toISOString().replace(/[:.]/g, "-");
  const file = path.join(targetDir, `slipway-${stamp}.sqlite`);
  if (fs.existsSync(file)) throw new Error(`${file} already exists`);
  await sequelize.query("VACUUM INTO ?", { replacements: [file] });
  return file;
}

/** `PRAGMA integrity_check` on a database: "ok" when sound. */
export async function integrityCheck(sequelize: Sequelize): Promise<string> {
  const [rows] = await sequelize.query("PRAGMA integrity_check");
  return (rows as { integrity_check: string }[]).map((row) => row.integrity_check).join("; ");
}
