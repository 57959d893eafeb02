import type { Sequelize } from "sequelize";
import { seedClubMembers, type SeedMember } from "@/lib/seed/club-members";

/**
 * A second invented club for tests only (route-guard and cross-club checks): seeded by scripts/seed.ts
 * when SLIPWAY_SEED_SECOND_CLUB=1 (scripts/e2e-server.sh sets it) and by integration tests. Never part
 * of the demo.
 */
export const secondClub = { name: "Brackwater Test Club", slug: "brackwater-test" };
export const secondClubPassword = "brackwater-test-only";

export const secondClubMembers: SeedMember[] = [
  { email: "admin@brackwater.example", name: "Petra Vance", role: "admin" },
  { email: "coach@brackwater.example", name: "Orrin Sallow", role: "coach" },
  { email: "athlete@brackwater.example", name: "Tamsin Rook", role: "athlete" },
];

/** Creates the second club and its three members when missing (idempotent, matched by e-mail). */
export function seedSecondClub(sequelize: Sequelize): Promise<{ created: number }> {
  return seedClubMembers(sequelize, secondClub, secondClubMembers, secondClubPassword);
}
