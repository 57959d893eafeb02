import { closeDatabase, getSequelize } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { seedDemoClub, demoClub } from "@/lib/seed/demo-club";
import { seedDemoCertification } from "@/lib/seed/demo-certification";
import { databaseFile } from "@/lib/env";

async function main() {
  const sequelize = getSequelize();
  await migrateToLatest(sequelize);
  const { created } = await seedDemoClub(sequelize);
  console.log(`${demoClub.name}: ${created} new members seeded into ${databaseFile()}.`);
  const { staged } = await seedDemoCertification(sequelize);
  console.log(`${demoClub.name}: ${staged} athletes staged with quizzes, sign-offs and certificates.`);
  await closeDatabase();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
