import type { Sequelize } from "sequelize";
import { hashPassword } from "@/lib/auth/password";
import { initModels, Club, User } from "@/models";
import type { DemoMember } from "@/lib/seed/demo-club";

/**
 * A second invented club for tests only (route-guard and cross-club checks): seeded by scripts/seed.ts
 * when SLIPWAY_SEED_SECOND_CLUB=1 (scripts/e2e-server.sh sets it) and by integration tests. Never part
 * of the demo.
 */
export const secondClub = { name: "Brackwater Test Club", slug: "brackwater-test" };
export const secondClubPassword = "brackwater-test-only";

export const secondClubMembers: DemoMember[] = [
  { email: "admin@brackwater.example", name: "Petra Vance", role: "admin" },
  { email: "coach@brackwater.example", name: "Orrin Sallow", role: "coach" },
  { email: "athlete@brackwater.example", name: "Tamsin Rook", role: "athlete" },
];

/** Creates the second club and its three members when missing (idempotent, matched by e-mail). */
export async function seedSecondClub(sequelize: Sequelize): Promise<{ created: number }> {
  initModels(sequelize);
  const passwordHash = await hashPassword(secondClubPassword);
  return sequelize.transaction(async (transaction) => {
    const [club] = await Club.findOrCreate({ where: { slug: secondClub.slug }, defaults: { ...secondClub, settings: {} }, transaction });
    let created = 0;
    for (const member of secondClubMembers) {
      const [, wasCreated] = await User.findOrCreate({
        where: { email: member.email },
        defaults: { ...member, clubId: club.id, passwordHash },
        transaction,
      });
      if (wasCreated) created += 1;
    }
    return { created };
  });
}
