import path from "node:path";
import { Sequelize } from "sequelize";
import { closeDatabase, getSequelize } from "@/lib/db";
import { backupDatabase, integrityCheck } from "@/lib/ops/backup";
import { dataDir } from "@/lib/env";

/** npm run backup [target-dir]: hot copy of the live database, checked before it is reported. */
async function main() {
  const targetDir = path.resolve(process.argv[2] ?? path.join(dataDir(), "backups"));
  const file = await backupDatabase(getSequelize(), targetDir);
  await closeDatabase();
  const copy = new Sequelize({ dialect: "sqlite", storage: file, logging: false });
  const result = await integrityCheck(copy);
  await copy.close();
  if (result !== "ok") throw new Error(`The copy failed its integrity check: ${result}`);
  console.log(`Backup written to ${file} (integrity check: ok).`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
