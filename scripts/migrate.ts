import { getSequelize, closeDatabase } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { databaseFile } from "@/lib/env";

async function main() {
  const applied = await migrateToLatest(getSequelize());
  console.log(applied.length ? `Applied ${applied.join(", ")} to ${databaseFile()}` : `Database ${databaseFile()} is up to date.`);
  await closeDatabase();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
