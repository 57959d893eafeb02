import { closeDatabase, getSequelize } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { seedDemoClub, demoClub } from "@/lib/seed/demo-club";
import { seedSecondClub, secondClub } from "@/lib/seed/second-club";
import { seedDemoFleet } from "@/lib/seed/demo-fleet";
import { seedDemoCertification } from "@/lib/seed/demo-certification";
import { databaseFile } from "@/lib/env";
import { seedLoadAthletes } from "@/lib/seed/load-athletes";
import { seedDemoInvitations } from "@/lib/seed/demo-invitations";

async function main() {
  const sequelize = getSequelize();
  await migrateToLatest(sequelize);
  const { created } = await seedDemoClub(sequelize);
  console.log(`${demoClub.name}: ${created} new members seeded into ${databaseFile()}.`);
  // Test-only: numbered athletes in a separate invented club for the load and crash tests.
  const loadAthletes = Number(process.env.SLIPWAY_SEED_LOAD_ATHLETES ?? "0");
  if (loadAthletes > 0) await seedLoadAthletes(sequelize, loadAthletes);
  if (process.env.SLIPWAY_SEED_SECOND_CLUB === "1") {
    const second = await seedSecondClub(sequelize);
    console.log(`${secondClub.name} (tests only): ${second.created} new members.`);
  }
  const fleet = await seedDemoFleet(sequelize);
  console.log(`${demoClub.name}: ${fleet.boats} new boats and ${fleet.oarSets} new oar sets seeded.`);
  const invitations = await seedDemoInvitations(sequelize);
  console.log(`${demoClub.name}: ${invitations.created} unanswered invitations seeded.`);
  const { staged } = await seedDemoCertification(sequelize);
  console.log(`${demoClub.name}: ${staged} athletes staged with quizzes, sign-offs and certificates.`);
  await closeDatabase();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
