import { closeDatabase, getSequelize } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { seedDemoClub, demoClub } from "@/lib/seed/demo-club";
import { seedDemoFleet } from "@/lib/seed/demo-fleet";
import { databaseFile } from "@/lib/env";

async function main() {
  const sequelize = getSequelize();
  await migrateToLatest(sequelize);
  const { created } = await seedDemoClub(sequelize);
  console.log(`${demoClub.name}: ${created} new members seeded into ${databaseFile()}.`);
  const fleet = await seedDemoFleet(sequelize);
  console.log(`${demoClub.name}: ${fleet.boats} new boats and ${fleet.oarSets} new oar sets seeded.`);
  await closeDatabase();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
